import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import {
  carePlanResponseSchema, daylightResponseSchema, degreeDaysResponseSchema, ladderResponseSchema, stoneFruitCheckResponseSchema,
} from '../../server/schemas/tools';
import { testApp } from '../helpers/api';

// The tools are public: every call here goes without a session cookie and without a CSRF token,
// as an outside checker would make it.
const post = (path: string, body: unknown) => request(testApp()).post(`/api/tools/${path}`).send(body as object);
const get = (path: string) => request(testApp()).get(`/api/tools/${path}`);

async function expect400(res: request.Response, path?: string) {
  expect(res.status).toBe(400);
  const { error } = errorEnvelopeSchema.parse(res.body);
  expect(error.code).toBe('VALIDATION_FAILED');
  if (path) expect(error.issues?.map((i) => i.path)).toContain(path);
}

const zalomDay = { date: '2026-05-01', tmin: 50, tmax: 82 };
const dd = (body: object) => post('degree-days', { unit: 'F', lower: 55, upper: 90, ...body });

describe('POST /api/tools/degree-days', () => {
  // Zalom et al. 1983 (UC DANR Leaflet 21373) Table 7, via degree-days.md §2.2 rows 1–4: Tn 50 °F,
  // Tx 82 °F, next morning's Tn 45 °F, TL 55 °F, TU 90 °F, horizontal cutoff.
  it.each([
    ['single-sine', 11.85],
    ['single-triangle', 11.39],
    ['double-sine', 11.31],
    ['double-triangle', 10.62],
  ])('matches Zalom 1983 Table 7 for %s (%s °F·days)', async (method, expected) => {
    const res = await dd({ method, days: [zalomDay, { date: '2026-05-02', tmin: 45, tmax: 60 }] });
    expect(res.status).toBe(200);
    const body = degreeDaysResponseSchema.parse(res.body);
    expect(body.days[0]).toEqual({ date: '2026-05-01', dd: expected, cumulative: expected });
  });

  // UC IPM calculator, Esparto-A 2020-02-27 (degree-days.md §2.3): Tn 43, Tx 77, TL 50, TU 70 °F.
  it.each([
    ['horizontal', 10.0],
    ['vertical', 4.0],
    ['intermediate', 8.62],
  ])('matches the UC IPM single-sine value with the %s cutoff', async (cutoff, expected) => {
    const res = await post('degree-days', { unit: 'F', method: 'single-sine', cutoff, lower: 50, upper: 70, days: [{ date: '2020-02-27', tmin: 43, tmax: 77 }] });
    expect(degreeDaysResponseSchema.parse(res.body).total).toBe(expected);
  });

  it('applies the horizontal cutoff when none is named', async () => {
    const res = await post('degree-days', { unit: 'F', method: 'single-sine', lower: 50, upper: 70, days: [{ date: '2020-02-27', tmin: 43, tmax: 77 }] });
    expect(res.body.total).toBe(10);
  });

  // degree-days.md §2.2 row 17 (computed, numeric integration agrees): 6/22 °C, TL 10, no TU → 4.8720.
  it('applies no cutoff without an upper threshold', async () => {
    const res = await post('degree-days', { unit: 'C', method: 'single-sine', cutoff: 'vertical', lower: 10, days: [{ date: '2026-06-01', tmin: 6, tmax: 22 }] });
    expect(res.body.total).toBe(4.87);
  });

  // McMaster & Wilhelm 1997 Table 1, method 1: Tx 8, Tn −2, base 0 °C → 3.0.
  it('averages first for the average method', async () => {
    const res = await post('degree-days', { unit: 'C', method: 'average', lower: 0, days: [{ date: '2026-03-01', tmin: -2, tmax: 8 }] });
    expect(res.body.total).toBe(3);
  });

  it('answers days in date order with a running total rounded to 2 decimals', async () => {
    const res = await dd({ method: 'single-sine', days: [{ date: '2026-05-03', tmin: 50, tmax: 82 }, zalomDay, { date: '2026-05-02', tmin: 38, tmax: 50 }] });
    const body = degreeDaysResponseSchema.parse(res.body);
    expect(body.days.map((d) => d.date)).toEqual(['2026-05-01', '2026-05-02', '2026-05-03']);
    expect(body.days.map((d) => d.cumulative)).toEqual([11.85, 11.85, 23.71]);
    expect(body.total).toBe(23.71);
  });

  it('takes the next morning only from the next calendar day, so a gap falls back to the day’s own minimum', async () => {
    const res = await dd({ method: 'double-sine', days: [zalomDay, { date: '2026-05-05', tmin: 45, tmax: 60 }] });
    expect(res.body.days[0].dd).toBe(11.85); // the single-sine value: no 2 May to borrow from
  });

  it('accepts an empty list of days', async () => {
    const res = await dd({ method: 'average', days: [] });
    expect(degreeDaysResponseSchema.parse(res.body)).toEqual({ total: 0, days: [] });
  });

  it('sets no session cookie: the tool keeps nothing', async () => {
    const res = await dd({ method: 'average', days: [zalomDay] });
    expect(res.status).toBe(200);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('answers 400 when a minimum is above its maximum, naming the row', async () => {
    await expect400(await dd({ method: 'single-sine', days: [zalomDay, { date: '2026-05-02', tmin: 70, tmax: 60 }] }), 'days.1.tmin');
  });

  it('answers 400 when the upper threshold is not above the lower', async () => {
    await expect400(await post('degree-days', { unit: 'C', method: 'single-sine', lower: 10, upper: 10, days: [zalomDay] }), 'upper');
  });

  it('answers 400 for more than 1,000 days', async () => {
    const days = Array.from({ length: 1001 }, (_, i) => ({ date: new Date(Date.UTC(2020, 0, 1 + i)).toISOString().slice(0, 10), tmin: 5, tmax: 15 }));
    await expect400(await dd({ method: 'average', days }), 'days');
  });

  it('answers 400 for an impossible date and for a date given twice', async () => {
    await expect400(await dd({ method: 'average', days: [{ date: '2026-02-30', tmin: 1, tmax: 2 }] }), 'days.0.date');
    await expect400(await dd({ method: 'average', days: [zalomDay, zalomDay] }), 'days.1.date');
  });

  it('answers 400 for an unknown method, unit or cutoff', async () => {
    await expect400(await dd({ method: 'quadruple-sine', days: [zalomDay] }), 'method');
    await expect400(await post('degree-days', { unit: 'K', method: 'average', lower: 5, days: [zalomDay] }), 'unit');
    await expect400(await dd({ method: 'average', cutoff: 'diagonal', days: [zalomDay] }), 'cutoff');
  });

  it.each([
    ['an array', '[]'],
    ['a string', '"x"'],
    ['a number', '42'],
    ['null', 'null'],
    ['broken JSON', '{"unit": "C",'],
  ])('answers 400 when the body is %s', async (_name, raw) => {
    const res = await request(testApp()).post('/api/tools/degree-days').set('content-type', 'application/json').send(raw);
    await expect400(res);
  });
});

const stone = (body: object) => post('stone-fruit-check', { latitude: 52.4, ...body });

describe('POST /api/tools/stone-fruit-check', () => {
  // RHS silver leaf profile (care-rules.md §3 PR-2/PR-3, §9 item 25): spores from September to May,
  // so an established plum is only "ok" to cut in June, July and August.
  it.each([
    ['01', 'avoid'], ['02', 'avoid'], ['03', 'caution'], ['04', 'caution'], ['05', 'caution'], ['06', 'ok'],
    ['07', 'ok'], ['08', 'ok'], ['09', 'caution'], ['10', 'caution'], ['11', 'avoid'], ['12', 'avoid'],
  ])('judges a cut on an established plum on the 15th of month %s as %s', async (month, verdict) => {
    const res = await stone({ type: 'plum', date: `2026-${month}-15`, ageYears: 10 });
    const body = stoneFruitCheckResponseSchema.parse(res.body);
    expect(body).toMatchObject({ applies: true, verdict });
  });

  it('gives the rules with their sources and the next safe dates for a winter plum (RHS, care-rules.md PR-1)', async () => {
    const body = stoneFruitCheckResponseSchema.parse((await stone({ type: 'plum', date: '2026-01-15' })).body);
    expect(body.verdict).toBe('avoid');
    expect(body.rules.find((r) => r.code === 'PR-1')?.source).toMatch(/RHS/);
    expect(body.rules.find((r) => r.code === 'PR-2')?.message).toMatch(/September to May/);
    expect(body.nextSafe).toEqual({ from: '2026-06-01', to: '2026-08-31' });
  });

  // RHS sweet cherry advice (care-rules.md PR-5, §9 item 28): established trees late July to 31 August.
  it('allows an established sweet cherry only from late July', async () => {
    expect((await stone({ type: 'cherry-sweet', date: '2026-07-25', ageYears: 8 })).body.verdict).toBe('ok');
    const early = stoneFruitCheckResponseSchema.parse((await stone({ type: 'cherry-sweet', date: '2026-07-10', ageYears: 8 })).body);
    expect(early.verdict).toBe('caution');
    expect(early.nextSafe?.from).toBe('2026-07-21');
  });

  it('moves the months for a southern site: January is summer there', async () => {
    expect((await stone({ type: 'plum', date: '2026-01-15', latitude: -37.8 })).body.verdict).toBe('ok');
  });

  it('adds a caution on a wet day and the silver-leaf cut in summer (RHS: 10–15 cm beyond the stain)', async () => {
    const body = stoneFruitCheckResponseSchema.parse((await stone({ type: 'plum', date: '2026-07-15', wet: true, symptoms: ['silver-leaf'] })).body);
    expect(body.verdict).toBe('caution');
    expect(body.rules.map((r) => r.code)).toEqual(expect.arrayContaining(['PR-11', 'PR-13']));
    expect(body.rules.find((r) => r.code === 'PR-13')?.message).toMatch(/10–15 cm/);
  });

  it('says it does not apply to a type that is not stone fruit', async () => {
    const body = stoneFruitCheckResponseSchema.parse((await stone({ type: 'apple', date: '2026-01-15' })).body);
    expect(body).toMatchObject({ applies: false, verdict: 'ok' });
    expect(body.nextSafe).toBeUndefined();
  });

  it('answers 400 for an unknown type, an impossible date, a latitude out of range and an unknown symptom', async () => {
    await expect400(await stone({ type: 'banana', date: '2026-01-15' }), 'type');
    await expect400(await stone({ type: 'plum', date: '2026-13-01' }), 'date');
    await expect400(await stone({ type: 'plum', date: '2026-01-15', latitude: 91 }), 'latitude');
    await expect400(await stone({ type: 'plum', date: '2026-01-15', symptoms: ['rust'] }), 'symptoms.0');
    await expect400(await stone({ type: 'plum', date: '2026-01-15', ageYears: -1 }), 'ageYears');
  });

  it('answers 400 for a body that is not an object', async () => {
    await expect400(await post('stone-fruit-check', []));
  });
});

describe('POST /api/tools/ladder', () => {
  // HSE INDG455 one-in-four rule (safety.md §8 T01, T03, T04): 3 m → foot 0.75 m out, 3.09 m along
  // the stiles, 75.96°.
  it('plans a ladder to a 3 m support by the one-in-four rule', async () => {
    const body = ladderResponseSchema.parse((await post('ladder', { supportHeightM: 3 })).body);
    expect(body).toMatchObject({ footDistanceM: 0.75, ladderLengthM: 3.09, angleDeg: 75.96 });
    expect(body.highestRungNote).toMatch(/top three rungs/);
    expect(body.cautions.length).toBeGreaterThan(3);
  });

  it('puts the foot 1.00 m out for a 4 m support (safety.md T02) and says a leaning ladder is the wrong tool', async () => {
    const body = ladderResponseSchema.parse((await post('ladder', { supportHeightM: 4 })).body);
    expect(body.footDistanceM).toBe(1);
    expect(body.cautions[0]).toMatch(/wrong tool/);
  });

  it('writes the notes in feet when asked, keeping the numbers in metres', async () => {
    const body = ladderResponseSchema.parse((await post('ladder', { supportHeightM: 3, unit: 'ft' })).body);
    expect(body.footDistanceM).toBe(0.75);
    expect(body.cautions[0]).toMatch(/2\.5 ft/);
  });

  it.each([[0], [-1], ['3'], [null], [31]])('answers 400 for a height of %j', async (supportHeightM) => {
    await expect400(await post('ladder', { supportHeightM }), 'supportHeightM');
  });
});

const plan = (body: object) => post('care-plan', { type: 'plum', latitude: 52.4, longitude: -1.9, season: 2026, ...body });

describe('POST /api/tools/care-plan', () => {
  // RHS plum pruning (care-rules.md §2.3, PR-3): established plums are pruned June to August.
  it('lists a plum’s windows with the summer pruning window from the RHS', async () => {
    const body = carePlanResponseSchema.parse((await plan({ on: '2026-07-15' })).body);
    const prune = body.windows.find((w) => w.task === 'stone-fruit-prune');
    expect(prune).toMatchObject({ opens: '2026-06-01', closes: '2026-08-31', state: 'open', basis: 'calendar' });
    expect(prune?.source).toMatch(/RHS/);
    expect(Object.keys(prune ?? {}).sort()).toEqual(['basis', 'closes', 'opens', 'reason', 'source', 'state', 'task']);
  });

  it('judges states on today (UTC) when no date is given', async () => {
    const body = carePlanResponseSchema.parse((await plan({})).body);
    const today = new Date().toISOString().slice(0, 10);
    for (const w of body.windows) expect(w.state === 'upcoming').toBe(today < w.opens);
  });

  it('rests a degree-day window on readings once the readings reach its trigger', async () => {
    // A warm run of days from 1 January through July: the apple triggers are all reached by readings.
    const days = Array.from({ length: 212 }, (_, i) => ({ date: new Date(Date.UTC(2026, 0, 1 + i)).toISOString().slice(0, 10), tmin: 10, tmax: 24 }));
    const body = carePlanResponseSchema.parse((await post('care-plan', { type: 'apple', form: 'espalier', latitude: 52.4, longitude: -1.9, season: 2026, on: '2026-07-31', days })).body);
    expect(body.windows.some((w) => w.basis === 'readings')).toBe(true);
  });

  it('answers 400 for an unknown type, a bad season, a latitude out of range, a bad reading and an impossible date', async () => {
    await expect400(await plan({ type: 'banana' }), 'type');
    await expect400(await plan({ season: 1700 }), 'season');
    await expect400(await plan({ season: '2026' }), 'season');
    await expect400(await plan({ latitude: -95 }), 'latitude');
    await expect400(await plan({ days: [{ date: '2026-03-01', tmin: 9, tmax: 3 }] }), 'days.0.tmin');
    await expect400(await plan({ on: '2026-02-29' }), 'on');
  });
});

describe('GET /api/tools/daylight', () => {
  // Check value 30 of degree-days.md §7: Washington DC, 2025-01-13, UTC−5 → sunrise 07:26, sunset
  // 17:08 (±2 min; a newspaper column quoting USNO).
  it('gives sun times in the zone asked for, with the offset', async () => {
    const body = daylightResponseSchema.parse((await get('daylight?lat=38.8951&lon=-77.0364&date=2025-01-13&tz=America/New_York')).body);
    const minutes = (iso: string | null) => Number(iso?.slice(11, 13)) * 60 + Number(iso?.slice(14, 16));
    expect(body.sunrise).toMatch(/^2025-01-13T\d{2}:\d{2}:00-05:00$/);
    expect(Math.abs(minutes(body.sunrise) - (7 * 60 + 26))).toBeLessThanOrEqual(2);
    expect(Math.abs(minutes(body.sunset) - (17 * 60 + 8))).toBeLessThanOrEqual(2);
    expect(minutes(body.sunset) - minutes(body.finishLadderWorkBy)).toBe(30);
    expect(body.civilDusk).not.toBeNull();
    expect(body.dayLengthMinutes).toBeGreaterThan(9 * 60);
  });

  it('answers in UTC without a time zone', async () => {
    const body = daylightResponseSchema.parse((await get('daylight?lat=52.4&lon=-1.9&date=2026-06-21')).body);
    expect(body.sunset).toMatch(/\+00:00$/);
  });

  it.each([
    ['a latitude out of range', 'lat=95&lon=0&date=2026-06-21', 'query.lat'],
    ['a missing latitude', 'lat=&lon=0&date=2026-06-21', 'query.lat'],
    ['a longitude that is not a number', 'lat=52&lon=west&date=2026-06-21', 'query.lon'],
    ['an impossible date', 'lat=52&lon=0&date=2025-02-30', 'query.date'],
    ['an unknown time zone', 'lat=52&lon=0&date=2026-06-21&tz=Mars/Olympus', 'query.tz'],
  ])('answers 400 for %s', async (_name, query, path) => {
    await expect400(await get(`daylight?${query}`), path);
  });
});

describe('unknown tools', () => {
  it('answers 404 in the envelope, not a CSRF refusal', async () => {
    const res = await post('no-such-tool', {});
    expect(res.status).toBe(404);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('NOT_FOUND');
  });
});
