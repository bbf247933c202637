import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { startStationFake } from '../../scripts/lib/station-fake';
import { inventedDay } from '../../scripts/lib/invented-weather';

// The server reads STATION_URL when its modules load, so the fake starts first and the app is
// imported after it: the route under test talks to this fake over loopback, as `npm start` does.
const FIXED_NOW = () => new Date('2026-06-10T12:00:00Z');
let fake = await startStationFake();
const fixedFake = await startStationFake({ now: FIXED_NOW });
process.env.STATION_URL = fake.url;
process.env.STATION_TIMEOUT_MS = '2000';

const { addDays, todayIn } = await import('../../server/care');
const { HttpStationFeed, StationUnavailableError, StationUnknownError } = await import('../../server/lib/station-feed');
const { Site, SiteReading } = await import('../../server/models');
const { errorEnvelopeSchema } = await import('../../server/schemas/error');
const { stationPullSchema } = await import('../../server/schemas/weather');
const { createSite, resetDatabase, roleFixture, signedIn } = await import('../helpers/api');
const { readingsPath, weatherPath } = await import('../helpers/readings');
const pullJob = await import('../../worker/jobs/pull-station-readings');

afterAll(async () => {
  await fake.close();
  await fixedFake.close();
});
beforeEach(resetDatabase);

describe('HttpStationFeed against the local fake', () => {
  const feed = new HttpStationFeed(fixedFake.url, 2000);

  it('reads a station’s days in °C, the same values every time', async () => {
    const first = await feed.fetchDays('TEST-01', '2026-05-01', '2026-05-03');
    expect(first.map((d) => d.date)).toEqual(['2026-05-01', '2026-05-02', '2026-05-03']);
    const expected = inventedDay('station:TEST-01', '2026-05-02', { latitude: 51.5 });
    expect(first[1]).toEqual({ date: '2026-05-02', tminC: expected.tmin, tmaxC: expected.tmax, rainMm: expected.rain });
    expect(await feed.fetchDays('TEST-01', '2026-05-01', '2026-05-03')).toEqual(first);
    expect(first.every((d) => d.tminC! <= d.tmaxC!)).toBe(true);
  });

  it('serves nothing for days that have not ended at the station', async () => {
    const days = await feed.fetchDays('TEST-01', '2026-06-08', '2026-06-12');
    expect(days.map((d) => d.date)).toEqual(['2026-06-08', '2026-06-09']);
  });

  it('says so when the station is unknown', async () => {
    await expect(feed.fetchDays('NOPE', '2026-05-01', '2026-05-02')).rejects.toBeInstanceOf(StationUnknownError);
  });

  it('says the service is unavailable when nothing listens', async () => {
    const down = await startStationFake();
    await down.close();
    await expect(new HttpStationFeed(down.url, 2000).fetchDays('TEST-01', '2026-05-01', '2026-05-02')).rejects.toBeInstanceOf(StationUnavailableError);
  });
});

async function linkedSite(stationId = 'TEST-01') {
  const f = await roleFixture();
  const client = await signedIn(f.people.grower.email);
  const put = (body: object) => client.agent.put(weatherPath(f.group.id, f.site.id, '/station')).set('x-csrf-token', client.token).send(body);
  expect((await put({ stationId })).body).toEqual({ stationId });
  return { f, client, put, pull: () => client.post(readingsPath(f.group.id, f.site.id, '/station-pull')) };
}

describe('POST …/readings/station-pull ("Fetch missing days")', () => {
  it('fills the days the site lacks up to yesterday, keeping the days it has', async () => {
    const { f, pull } = await linkedSite();
    const yesterday = addDays(todayIn('Europe/London'), -1);
    const typedIn = addDays(yesterday, -10);
    await SiteReading.create({ siteId: f.site.id, date: typedIn, tminC: -5, tmaxC: -1, rainMm: null, source: 'manual' });
    const res = await pull();
    expect(res.status).toBe(200);
    const body = stationPullSchema.parse(res.body);
    expect(body).toMatchObject({ stationId: 'TEST-01', to: yesterday });
    const rows = await SiteReading.findAll({ where: { siteId: f.site.id }, raw: true });
    expect(body.added).toBe(rows.length - 1);
    expect(rows.find((r) => r.date === typedIn)).toMatchObject({ source: 'manual', tminC: -5 });
    expect(rows.filter((r) => r.source === 'station')).toHaveLength(366 - 1);
    expect((await pull()).body).toMatchObject({ added: 0 });
  });

  it('answers 503 with a clear message when the station service is down, and writes nothing', async () => {
    const { pull } = await linkedSite();
    await fake.close();
    try {
      const res = await pull();
      expect(res.status).toBe(503);
      const { error } = errorEnvelopeSchema.parse(res.body);
      expect(error).toMatchObject({ code: 'UNAVAILABLE', message: 'The weather-station service could not be reached. Nothing was written; try again later.' });
      expect(await SiteReading.count()).toBe(0);
    } finally {
      fake = await startStationFake({ port: fake.port });
    }
  });

  it('answers 422 for a station the service does not know', async () => {
    const { pull } = await linkedSite('NO-SUCH-STATION');
    const res = await pull();
    expect(res.status).toBe(422);
    expect(errorEnvelopeSchema.parse(res.body).error.message).toMatch(/does not know station "NO-SUCH-STATION"/);
    expect(await SiteReading.count()).toBe(0);
  });

  it('answers 400 for a station id with spaces, and unlinks with null', async () => {
    const { f, put } = await linkedSite();
    expect((await put({ stationId: 'two words' })).status).toBe(400);
    expect((await put({ stationId: null })).body).toEqual({ stationId: null });
    expect((await Site.findByPk(f.site.id))?.stationId).toBeNull();
  });
});

describe('worker job pull-station-readings', () => {
  it('pulls for every linked site, carries on past a failing one, and adds nothing on a second run', async () => {
    const { f } = await linkedSite();
    const unknown = await createSite(f.group, 'Far field');
    await unknown.update({ stationId: 'UNKNOWN-9' });
    const log: string[] = [];
    const feed = new HttpStationFeed(fixedFake.url, 2000);
    const first = await pullJob.run({ db: Site.sequelize!, now: FIXED_NOW, feed, log: (msg) => log.push(msg) });
    expect(first).toMatchObject({ sites: 2, failed: 1 });
    expect(first.added).toBe(await SiteReading.count({ where: { siteId: f.site.id } }));
    expect(await SiteReading.count({ where: { siteId: unknown.id } })).toBe(0);
    expect(log).toEqual(['station pull failed']);
    expect(await SiteReading.max('date', { where: { siteId: f.site.id } })).toBe('2026-06-09');
    expect((await pullJob.run({ db: Site.sequelize!, now: FIXED_NOW, feed })).added).toBe(0);
  });
});
