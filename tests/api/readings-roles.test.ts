import { beforeEach, describe, expect, it } from 'vitest';
import { Site, SiteNormal, SiteReading } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { resetDatabase, roleFixture, signedIn, type Client } from '../helpers/api';
import { readingsPath, uploadImport, uploadPreview, weatherPath } from '../helpers/readings';

// DESIGN.md §2: the grower edits weather data, so owners and growers may change readings, normals
// and the station link; helpers and viewers only read them. An outsider gets 404.
type Who = 'owner' | 'grower' | 'helper' | 'viewer' | 'outsider';
type Fixture = Awaited<ReturnType<typeof roleFixture>>;
type Res = { status: number; body: unknown };

interface Action { name: string; writes: boolean; call: (c: Client, f: Fixture) => Promise<Res> }

const csv = 'date,tmin,tmax\n2026-05-01,6,15\n';
const months = Array.from({ length: 12 }, (_, i) => ({ month: i + 1, tmin: 2, tmax: 12 }));
const r = (f: Fixture, rest = '') => readingsPath(f.group.id, f.site.id, rest);
const w = (f: Fixture, rest = '') => weatherPath(f.group.id, f.site.id, rest);
const put = (c: Client, path: string, body: object) => c.agent.put(path).set('x-csrf-token', c.token).send(body);

const actions: Action[] = [
  { name: 'list readings', writes: false, call: (c, f) => c.get(r(f)) },
  { name: 'read the season', writes: false, call: (c, f) => c.get(w(f)) },
  { name: 'read the normals', writes: false, call: (c, f) => c.get(w(f, '/normals')) },
  { name: 'add a day', writes: true, call: (c, f) => c.post(r(f), { date: '2026-05-02', tmin: 5, tmax: 14 }) },
  { name: 'correct a day', writes: true, call: (c, f) => put(c, r(f, '/2026-04-01'), { tmin: 1, tmax: 3 }) },
  { name: 'delete a day', writes: true, call: (c, f) => c.delete(r(f, '/2026-04-01')) },
  { name: 'preview an upload', writes: true, call: (c, f) => uploadPreview(c, r(f), csv) },
  { name: 'import an upload', writes: true, call: (c, f) => uploadImport(c, r(f), csv) },
  { name: 'save normals', writes: true, call: (c, f) => put(c, w(f, '/normals'), { months }) },
  { name: 'clear normals', writes: true, call: (c, f) => c.delete(w(f, '/normals')) },
  { name: 'link a station', writes: true, call: (c, f) => put(c, w(f, '/station'), { stationId: 'TEST-01' }) },
  // With no station linked the pull is refused for what it is, past the role gate: 400, not 403.
  { name: 'fetch missing days', writes: true, call: (c, f) => c.post(r(f, '/station-pull')) },
];

async function snapshot(f: Fixture) {
  const [readings, normals, site] = await Promise.all([
    SiteReading.findAll({ order: [['date', 'ASC']], raw: true }),
    SiteNormal.findAll({ order: [['month', 'ASC']], raw: true }),
    Site.findByPk(f.site.id, { raw: true }),
  ]);
  return JSON.stringify({ readings, normals, site });
}

async function fixture() {
  const f = await roleFixture();
  await SiteReading.create({ siteId: f.site.id, date: '2026-04-01', tminC: 2, tmaxC: 11, rainMm: null, source: 'upload' });
  await SiteNormal.bulkCreate(months.map((m) => ({ siteId: f.site.id, month: m.month, tminC: 1, tmaxC: 10, source: 'manual' as const })));
  return f;
}

beforeEach(resetDatabase);

describe('role × action matrix for readings, normals and the station', () => {
  for (const action of actions) {
    for (const who of ['owner', 'grower', 'helper', 'viewer', 'outsider'] as Who[]) {
      const isAllowed = who !== 'outsider' && (!action.writes || who === 'owner' || who === 'grower');
      const expected = isAllowed ? 'is allowed' : who === 'outsider' ? 'answers 404' : 'answers 403';
      it(`${action.name}: ${who} ${expected}`, async () => {
        const f = await fixture();
        const client = await signedIn(f.people[who].email);
        const before = await snapshot(f);
        const res = await action.call(client, f);
        if (isAllowed) {
          if (action.name === 'fetch missing days') expect(errorEnvelopeSchema.parse(res.body).error.message).toMatch(/Link the site to a weather station first/);
          else expect(res.status).toBeLessThan(300);
          return;
        }
        expect(res.status).toBe(who === 'outsider' ? 404 : 403);
        expect(errorEnvelopeSchema.parse(res.body).error.code).toBe(who === 'outsider' ? 'NOT_FOUND' : 'FORBIDDEN');
        expect(await snapshot(f)).toBe(before);
      });
    }
  }
});
