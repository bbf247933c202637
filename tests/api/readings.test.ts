import { beforeEach, describe, expect, it } from 'vitest';
import { addDays, todayIn } from '../../server/care';
import { SiteReading } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { readingListSchema, readingSchema } from '../../server/schemas/readings';
import { resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { readingsPath } from '../helpers/readings';

beforeEach(resetDatabase);

async function setUp(role: 'owner' | 'grower' | 'viewer' = 'grower') {
  const f = await roleFixture();
  return { f, client: await signedIn(f.people[role].email), path: readingsPath(f.group.id, f.site.id) };
}

describe('POST …/readings (one day by hand)', () => {
  it('stores a day entered in °C and answers it', async () => {
    const { f, client, path } = await setUp();
    const res = await client.post(path, { date: '2026-04-10', tmin: 3.4, tmax: 14.1, rainMm: 2.5 });
    expect(res.status).toBe(201);
    expect(readingSchema.parse(res.body)).toEqual({ date: '2026-04-10', tminC: 3.4, tmaxC: 14.1, rainMm: 2.5, source: 'manual' });
    expect(await SiteReading.findOne({ where: { siteId: f.site.id, date: '2026-04-10' }, raw: true })).toMatchObject({ tminC: 3.4, tmaxC: 14.1, source: 'manual' });
  });

  it('converts a day entered in °F and stores °C', async () => {
    const { client, path } = await setUp();
    const body = readingSchema.parse((await client.post(path, { date: '2026-07-01', tmin: 50, tmax: 77, unit: 'F' })).body);
    expect([body.tminC, body.tmaxC]).toEqual([10, 25]);
  });

  it('answers 409 for a day that already has a reading, and keeps the first', async () => {
    const { f, client, path } = await setUp();
    await client.post(path, { date: '2026-04-10', tmin: 3, tmax: 14 }).expect(201);
    const res = await client.post(path, { date: '2026-04-10', tmin: 5, tmax: 15 });
    expect(res.status).toBe(409);
    expect(errorEnvelopeSchema.parse(res.body).error.issues?.[0]?.path).toBe('date');
    expect((await SiteReading.findOne({ where: { siteId: f.site.id, date: '2026-04-10' } }))?.tminC).toBe(3);
  });

  it.each([
    ['a minimum above the maximum', { date: '2026-04-10', tmin: 15, tmax: 4 }, 'tmin'],
    ['a maximum over 60 °C', { date: '2026-04-10', tmin: 15, tmax: 61 }, 'tmax'],
    ['150 °F', { date: '2026-04-10', tmin: 60, tmax: 150, unit: 'F' }, 'tmax'],
    ['an impossible date', { date: '2026-02-30', tmin: 1, tmax: 4 }, 'date'],
    ['a missing maximum', { date: '2026-04-10', tmin: 1 }, 'tmax'],
    ['negative rain', { date: '2026-04-10', tmin: 1, tmax: 4, rainMm: -1 }, 'rainMm'],
  ])('answers 400 for %s and stores nothing', async (_name, body, field) => {
    const { client, path } = await setUp();
    const res = await client.post(path, body);
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.issues?.map((i) => i.path)).toContain(field);
    expect(await SiteReading.count()).toBe(0);
  });

  it('answers 400 for a day after today at the site', async () => {
    const { client, path } = await setUp();
    const res = await client.post(path, { date: addDays(todayIn('Europe/London'), 2), tmin: 1, tmax: 4 });
    expect(res.status).toBe(400);
    expect(await SiteReading.count()).toBe(0);
  });
});

describe('GET …/readings', () => {
  it('lists the days in a range, oldest first, with the newest date held', async () => {
    const { f, client, path } = await setUp('viewer');
    for (const date of ['2026-03-01', '2026-03-02', '2026-05-01']) {
      await SiteReading.create({ siteId: f.site.id, date, tminC: 1, tmaxC: 9, rainMm: null, source: 'upload' });
    }
    const body = readingListSchema.parse((await client.get(`${path}?from=2026-03-01&to=2026-03-31`)).body);
    expect(body.items.map((r) => r.date)).toEqual(['2026-03-01', '2026-03-02']);
    expect(body.latestReading).toBe('2026-05-01');
  });

  it('answers 400 when the range runs backwards', async () => {
    const { client, path } = await setUp('viewer');
    expect((await client.get(`${path}?from=2026-03-10&to=2026-03-01`)).status).toBe(400);
  });

  it('answers 404 for a site of another group', async () => {
    const f = await roleFixture();
    const outsider = await signedIn(f.people.outsider.email);
    expect((await outsider.get(readingsPath(f.otherGroup.id, f.site.id))).status).toBe(404);
  });
});

describe('PUT and DELETE …/readings/:date', () => {
  it('corrects a day (in °F) and marks it as entered by hand', async () => {
    const { f, client, path } = await setUp();
    await SiteReading.create({ siteId: f.site.id, date: '2026-03-01', tminC: 1, tmaxC: 9, rainMm: null, source: 'upload' });
    const res = await client.agent.put(`${path}/2026-03-01`).set('x-csrf-token', client.token).send({ tmin: 41, tmax: 59, unit: 'F' });
    expect(res.status).toBe(200);
    expect(readingSchema.parse(res.body)).toEqual({ date: '2026-03-01', tminC: 5, tmaxC: 15, rainMm: null, source: 'manual' });
  });

  it('answers 404 when correcting a day with no reading', async () => {
    const { client, path } = await setUp();
    const res = await client.agent.put(`${path}/2026-03-01`).set('x-csrf-token', client.token).send({ tmin: 1, tmax: 5 });
    expect(res.status).toBe(404);
  });

  it('deletes a day, then answers 404 for it', async () => {
    const { f, client, path } = await setUp('owner');
    await SiteReading.create({ siteId: f.site.id, date: '2026-03-01', tminC: 1, tmaxC: 9, rainMm: null, source: 'upload' });
    expect((await client.delete(`${path}/2026-03-01`)).status).toBe(204);
    expect(await SiteReading.count()).toBe(0);
    expect((await client.delete(`${path}/2026-03-01`)).status).toBe(404);
  });

  it('answers 400 for a date that is not a date', async () => {
    const { client, path } = await setUp();
    expect((await client.delete(`${path}/yesterday`)).status).toBe(400);
  });
});
