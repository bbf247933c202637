import { beforeEach, describe } from 'vitest';
import { Group, Plant, Site } from '../../server/models';
import { resetDatabase, roleFixture } from '../helpers/api';
import { members as all, roleMatrix, type MatrixAction } from '../helpers/role-matrix';

// DESIGN.md §2: owner does everything; grower adds and edits plants; helper and viewer see only
// (helpers log work, which arrives with the work log). An outsider gets 404: we don't confirm the
// group exists.
type Fixture = Awaited<ReturnType<typeof roleFixture>>;
const newPlant = (f: Fixture) => ({ siteId: f.site.id, typeCode: 'apple', form: 'cordon', cultivar: 'Matrix' });
const newSite = { name: 'New bed', latitude: 51.5, longitude: -0.1, timeZone: 'Europe/London' };

const actions: MatrixAction<Fixture>[] = [
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
  roleMatrix(actions, roleFixture, snapshot);
});
