import { beforeEach, describe, expect, it } from 'vitest';
import { SiteNormal, SiteReading } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { siteNormalsSchema, siteWeatherSchema } from '../../server/schemas/weather';
import { plantWindowsSchema } from '../../server/schemas/windows';
import { createPlant, resetDatabase, roleFixture, signedIn, type Client } from '../helpers/api';
import { csvOf, days, readingsPath, seasonal, uploadImport, weatherPath } from '../helpers/readings';

beforeEach(resetDatabase);

const put = (c: Client, path: string, body: object) => c.agent.put(path).set('x-csrf-token', c.token).send(body);

async function setUp() {
  const f = await roleFixture();
  const client = await signedIn(f.people.grower.email);
  return { f, client, readings: readingsPath(f.group.id, f.site.id), weather: weatherPath(f.group.id, f.site.id) };
}

describe('GET …/weather', () => {
  it('gives the season’s running degree-days, the usual year, the missing days and the latest reading', async () => {
    const { client, readings, weather } = await setUp();
    // March 2026 with a gap of three days (10–12 March).
    const march = days('2026-03-01', 31, seasonal).filter((d) => d.date < '2026-03-10' || d.date > '2026-03-12');
    await uploadImport(client, readings, csvOf(march)).expect(200);
    const body = siteWeatherSchema.parse((await client.get(`${weather}?season=2026&base=5`)).body);
    expect(body).toMatchObject({ season: 2026, start: '2026-01-01', end: '2026-12-31', base: 5, latestReading: '2026-03-31', readingDays: 28 });
    expect(body.normals.source).toBe('built-in');
    expect(body.degreeDays.season).toHaveLength(365);
    expect(body.degreeDays.normal).toHaveLength(365);
    expect(body.degreeDays.isReading.slice(59, 62)).toEqual([1, 1, 1]); // 1–3 March
    // Before March and after the last reading nothing was read; the March gap shows as its own range.
    expect(body.missing.ranges).toContainEqual({ from: '2026-01-01', to: '2026-02-28' });
    expect(body.missing.ranges).toContainEqual({ from: '2026-03-10', to: '2026-03-12' });
    // Running totals never fall.
    expect(body.degreeDays.season.every((v, i, all) => i === 0 || v >= all[i - 1]!)).toBe(true);
  });

  it('counts winter chill from 1 October', async () => {
    const { client, readings, weather } = await setUp();
    // A cold, even autumn: every hour between 0 and 7.2 °C counts; 16 hours at 1–5 °C weigh 1 Utah unit each.
    await uploadImport(client, readings, csvOf(days('2025-10-01', 30, () => ({ tmin: 2, tmax: 6 })))).expect(200);
    const body = siteWeatherSchema.parse((await client.get(`${weather}?season=2025`)).body);
    expect(body.chill).toMatchObject({ from: '2025-10-01', to: '2026-02-28' });
    expect(body.chill.dailyHours.length).toBeGreaterThanOrEqual(30);
    expect(body.chill.dailyHours[29]).toBe(30 * 24);
  });

  it('answers 400 for a base the chart does not offer', async () => {
    const { client, weather } = await setUp();
    const res = await client.get(`${weather}?base=7`);
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.issues?.[0]?.path).toBe('query.base');
  });
});

describe('…/weather/normals', () => {
  const months = Array.from({ length: 12 }, (_, i) => ({ month: i + 1, tmin: 35 + i, tmax: 50 + i }));

  it('stores twelve months typed in °F as °C', async () => {
    const { f, client, weather } = await setUp();
    const body = siteNormalsSchema.parse((await put(client, `${weather}/normals`, { unit: 'F', months })).body);
    expect(body.source).toBe('manual');
    expect(body.months[0]).toEqual({ month: 1, tminC: 1.67, tmaxC: 10 });
    expect(await SiteNormal.count({ where: { siteId: f.site.id } })).toBe(12);
  });

  it('answers 400 for eleven months or a minimum above the maximum, and keeps what was there', async () => {
    const { f, client, weather } = await setUp();
    expect((await put(client, `${weather}/normals`, { months: months.slice(1) })).status).toBe(400);
    const swapped = months.map((m, i) => (i === 3 ? { ...m, tmin: 60, tmax: 50 } : m));
    const res = await put(client, `${weather}/normals`, { unit: 'F', months: swapped });
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.issues?.[0]?.path).toBe('months.3.tmin');
    expect(await SiteNormal.count({ where: { siteId: f.site.id } })).toBe(0);
  });

  it('works normals out from the site’s own seasons, and refuses while a month is short', async () => {
    const { f, client, readings, weather } = await setUp();
    await uploadImport(client, readings, csvOf(days('2025-01-01', 190, () => ({ tmin: 4, tmax: 12 })))).expect(200);
    const short = await client.post(`${weather}/normals/compute`);
    expect(short.status).toBe(422);
    expect(errorEnvelopeSchema.parse(short.body).error.message).toMatch(/July \(9 days\), August \(0 days\)/);
    await uploadImport(client, readings, csvOf(days('2025-07-10', 175, (i) => ({ tmin: 6 + (i % 2), tmax: 14 + (i % 2) })))).expect(200);
    const body = siteNormalsSchema.parse((await client.post(`${weather}/normals/compute`)).body);
    expect(body.source).toBe('computed');
    expect(body.months[0]).toEqual({ month: 1, tminC: 4, tmaxC: 12 });
    expect(body.months[8]).toEqual({ month: 9, tminC: 6.5, tmaxC: 14.5 });
    expect(await SiteNormal.count({ where: { siteId: f.site.id, source: 'computed' } })).toBe(12);
  });

  it('goes back to the built-in year when cleared', async () => {
    const { client, weather } = await setUp();
    await put(client, `${weather}/normals`, { unit: 'F', months }).expect(200);
    expect(siteNormalsSchema.parse((await client.delete(`${weather}/normals`)).body).source).toBe('built-in');
  });
});

describe('readings move the plant windows', () => {
  const thinning = async (client: Client, groupId: string, plantId: string) => {
    const body = plantWindowsSchema.parse((await client.get(`/api/groups/${groupId}/plants/${plantId}/windows?season=2026&on=2026-06-20`)).body);
    return { window: body.windows.find((w) => w.task === 'fruit-thinning')!, note: body.basisNote };
  };

  it('opens the apple-thinning window earlier after a warm spring than after a cool one', async () => {
    const { f, client, readings } = await setUp();
    const apple = await createPlant(f.group, f.site, 'Egremont Russet', 'apple');
    // Thinning opens once the June drop is over: 890 degree-days (base 5 °C) since 1 January.
    await uploadImport(client, readings, csvOf(days('2026-01-01', 151, () => ({ tmin: 0, tmax: 8 })))).expect(200);
    const cool = await thinning(client, f.group.id, apple.id);
    await uploadImport(client, readings, csvOf(days('2026-01-01', 151, () => ({ tmin: 8, tmax: 18 }))), { onExisting: 'replace' }).expect(200);
    const warm = await thinning(client, f.group.id, apple.id);
    expect(warm.window.opens < cool.window.opens).toBe(true);
    expect(warm.window).toMatchObject({ opens: '2026-06-15', state: 'open', basis: 'readings' });
    expect(cool.window).toMatchObject({ state: 'upcoming' });
    expect(warm.note).toMatch(/^Based on readings to 31 May 2026/);
  });

  it('says the windows are projected from the site’s normals when the season has no readings', async () => {
    const { f, client, weather } = await setUp();
    await put(client, `${weather}/normals`, { months: Array.from({ length: 12 }, (_, i) => ({ month: i + 1, tmin: 5, tmax: 15 })) }).expect(200);
    await SiteReading.create({ siteId: f.site.id, date: '2025-05-01', tminC: 1, tmaxC: 9, rainMm: null, source: 'manual' });
    const { note } = await thinning(client, f.group.id, f.plant.id);
    expect(note).toMatch(/Projected from the site's monthly normals — no readings for this season yet/);
  });
});
