import { beforeEach, describe, expect, it } from 'vitest';
import { Plant } from '../../server/models';
import { plantListSchema, plantSchema } from '../../server/schemas/plant';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn } from '../helpers/api';

beforeEach(resetDatabase);

describe('POST /api/groups/:groupId/plants', () => {
  it('adds a plant and answers with its site name', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.grower.email)).post(`/api/groups/${f.group.id}/plants`, {
      siteId: f.site.id, typeCode: 'pear', cultivar: 'Concorde', form: 'espalier', plantedYear: 2020, heightM: 2.1, healthFlags: ['canker'],
    });
    expect(res.status).toBe(201);
    expect(plantSchema.parse(res.body)).toMatchObject({ typeCode: 'pear', cultivar: 'Concorde', siteName: 'Top plot', healthFlags: ['canker'] });
  });

  it('answers 400 for a type code outside the catalogue, a future year and a negative height, writing nothing', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.owner.email)).post(`/api/groups/${f.group.id}/plants`, {
      siteId: f.site.id, typeCode: 'banana', form: 'bush', plantedYear: 2999, heightM: -1,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['heightM', 'plantedYear', 'typeCode']);
    expect(await Plant.count()).toBe(1);
  });

  it('refuses a site that belongs to another group', async () => {
    const f = await roleFixture();
    const theirs = await createSite(f.otherGroup, 'Theirs');
    const res = await (await signedIn(f.people.owner.email)).post(`/api/groups/${f.group.id}/plants`, { siteId: theirs.id, typeCode: 'apple', form: 'bush' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('siteId');
    expect(await Plant.count({ where: { siteId: theirs.id } })).toBe(0);
  });
});

describe('GET /api/groups/:groupId/plants', () => {
  async function listed(query: string) {
    const f = await roleFixture();
    const other = await createSite(f.group, 'Walled garden');
    await createPlant(f.group, f.site, 'Egremont Russet', 'apple');
    await createPlant(f.group, other, 'Conference', 'pear');
    await createPlant(f.group, other, 'Stella', 'cherry-sweet');
    await createPlant(f.otherGroup, await createSite(f.otherGroup, 'X'), 'Not ours', 'apple');
    const res = await (await signedIn(f.people.viewer.email)).get(`/api/groups/${f.group.id}/plants${query}`).expect(200);
    return { f, other, list: plantListSchema.parse(res.body) };
  }

  it('lists only the group’s plants, sorted by cultivar', async () => {
    const { list } = await listed('');
    expect(list.items.map((p) => p.cultivar)).toEqual(['Conference', 'Egremont Russet', 'Stella', 'Victoria']);
    expect(list.total).toBe(4);
  });

  it('searches cultivars case-insensitively', async () => {
    const { list } = await listed('?search=russ');
    expect(list.items.map((p) => p.cultivar)).toEqual(['Egremont Russet']);
  });

  it('filters by type', async () => {
    expect((await listed('?typeCode=pear')).list.items.map((p) => p.cultivar)).toEqual(['Conference']);
  });

  it('sorts by site name descending', async () => {
    const bySite = (await listed('?sort=siteName&order=desc')).list.items.map((p) => p.siteName);
    expect(bySite).toEqual(['Walled garden', 'Walled garden', 'Top plot', 'Top plot']);
  });

  it('pages through the results', async () => {
    const { list } = await listed('?pageSize=3&page=2');
    expect(list).toMatchObject({ total: 4, page: 2, pageSize: 3 });
    expect(list.items.map((p) => p.cultivar)).toEqual(['Victoria']);
  });

  it('answers 400 for an unknown sort field', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.viewer.email)).get(`/api/groups/${f.group.id}/plants?sort=password`);
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('query.sort');
  });
});

describe('archive, restore and delete a plant', () => {
  it('archives a plant out of the list and restores it', async () => {
    const f = await roleFixture();
    const client = await signedIn(f.people.grower.email);
    await client.post(`/api/groups/${f.group.id}/plants/${f.plant.id}/archive`).expect(200);
    expect((await client.get(`/api/groups/${f.group.id}/plants`)).body.total).toBe(0);
    expect((await client.get(`/api/groups/${f.group.id}/plants?includeArchived=true`)).body.total).toBe(1);
    await client.post(`/api/groups/${f.group.id}/plants/${f.plant.id}/restore`).expect(200);
    expect((await client.get(`/api/groups/${f.group.id}/plants`)).body.total).toBe(1);
  });

  it('lets the owner delete a plant for good', async () => {
    const f = await roleFixture();
    await (await signedIn(f.people.owner.email)).delete(`/api/groups/${f.group.id}/plants/${f.plant.id}`).expect(204);
    expect(await Plant.findByPk(f.plant.id)).toBeNull();
  });
});

describe('PATCH /api/groups/:groupId/plants/:plantId', () => {
  it('changes only the fields sent', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.grower.email)).patch(`/api/groups/${f.group.id}/plants/${f.plant.id}`, { heightM: 3.1, groupId: f.otherGroup.id });
    expect(res.status).toBe(200);
    const stored = await Plant.findByPk(f.plant.id);
    expect(stored?.get({ plain: true })).toMatchObject({ heightM: 3.1, cultivar: 'Victoria', groupId: f.group.id });
  });
});
