import { beforeEach, describe, expect, it } from 'vitest';
import { Group, Plant, Site } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { resetDatabase, roleFixture, signedIn } from '../helpers/api';

// DESIGN.md §2: owner does everything; grower adds and edits plants; helper and viewer see only
// (helpers log work, which arrives with the work log). An outsider gets 404: we don't confirm the
// group exists.
type Who = 'owner' | 'grower' | 'helper' | 'viewer' | 'outsider';
type Fixture = Awaited<ReturnType<typeof roleFixture>>;

interface Action {
  name: string;
  allowed: Who[];
  call: (client: Awaited<ReturnType<typeof signedIn>>, f: Fixture) => Promise<{ status: number; body: unknown }>;
}

const all: Who[] = ['owner', 'grower', 'helper', 'viewer'];
const newPlant = (f: Fixture) => ({ siteId: f.site.id, typeCode: 'apple', form: 'cordon', cultivar: 'Matrix' });
const newSite = { name: 'New bed', latitude: 51.5, longitude: -0.1, timeZone: 'Europe/London' };

const actions: Action[] = [
  { name: 'read the group', allowed: all, call: (c, f) => c.get(`/api/groups/${f.group.id}`) },
  { name: 'rename the group', allowed: ['owner'], call: (c, f) => c.patch(`/api/groups/${f.group.id}`, { name: 'Renamed' }) },
  { name: 'list members', allowed: all, call: (c, f) => c.get(`/api/groups/${f.group.id}/members`) },
  { name: 'list sites', allowed: all, call: (c, f) => c.get(`/api/groups/${f.group.id}/sites`) },
  { name: 'create a site', allowed: ['owner'], call: (c, f) => c.post(`/api/groups/${f.group.id}/sites`, newSite) },
  { name: 'edit a site', allowed: ['owner'], call: (c, f) => c.patch(`/api/groups/${f.group.id}/sites/${f.site.id}`, { name: 'Edited' }) },
  { name: 'archive a site', allowed: ['owner'], call: (c, f) => c.post(`/api/groups/${f.group.id}/sites/${f.site.id}/archive`) },
  { name: 'list plants', allowed: all, call: (c, f) => c.get(`/api/groups/${f.group.id}/plants`) },
  { name: 'read a plant', allowed: all, call: (c, f) => c.get(`/api/groups/${f.group.id}/plants/${f.plant.id}`) },
  { name: 'add a plant', allowed: ['owner', 'grower'], call: (c, f) => c.post(`/api/groups/${f.group.id}/plants`, newPlant(f)) },
  { name: 'edit a plant', allowed: ['owner', 'grower'], call: (c, f) => c.patch(`/api/groups/${f.group.id}/plants/${f.plant.id}`, { cultivar: 'Edited' }) },
  { name: 'archive a plant', allowed: ['owner', 'grower'], call: (c, f) => c.post(`/api/groups/${f.group.id}/plants/${f.plant.id}/archive`) },
  { name: 'delete a plant', allowed: ['owner'], call: (c, f) => c.delete(`/api/groups/${f.group.id}/plants/${f.plant.id}`) },
];

// Everything a forbidden call could have touched, to prove it changed nothing.
async function snapshot(f: Fixture) {
  const [group, site, plant, sites, plants] = await Promise.all([
    Group.findByPk(f.group.id, { raw: true }),
    Site.findByPk(f.site.id, { raw: true }),
    Plant.findByPk(f.plant.id, { raw: true }),
    Site.count(),
    Plant.count(),
  ]);
  return JSON.stringify({ group, site, plant, sites, plants });
}

beforeEach(resetDatabase);

describe('role × action matrix under /api/groups/:groupId', () => {
  for (const action of actions) {
    for (const who of [...all, 'outsider'] as Who[]) {
      const allowed = action.allowed.includes(who);
      const expected = allowed ? 'is allowed' : who === 'outsider' ? 'answers 404' : 'answers 403';
      it(`${action.name}: ${who} ${expected}`, async () => {
        const f = await roleFixture();
        const client = await signedIn(f.people[who].email);
        const before = await snapshot(f);
        const res = await action.call(client, f);
        if (allowed) {
          expect(res.status).toBeLessThan(300);
          return;
        }
        expect(res.status).toBe(who === 'outsider' ? 404 : 403);
        expect(errorEnvelopeSchema.parse(res.body).error.code).toBe(who === 'outsider' ? 'NOT_FOUND' : 'FORBIDDEN');
        expect(await snapshot(f)).toBe(before);
      });
    }
  }
});
