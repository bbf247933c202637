import { beforeEach, describe, expect, it } from 'vitest';
import { Site } from '../../server/models';
import { siteSchema } from '../../server/schemas/site';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn } from '../helpers/api';

beforeEach(resetDatabase);

const valid = { name: 'Orchard corner', latitude: -37.8, longitude: 144.9, timeZone: 'Australia/Melbourne', hazards: ['overhead-lines'] };

describe('POST /api/groups/:groupId/sites', () => {
  it('creates a site and works out its hemisphere from the latitude', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.owner.email)).post(`/api/groups/${f.group.id}/sites`, valid);
    expect(res.status).toBe(201);
    const site = siteSchema.parse(res.body);
    expect(site).toMatchObject({ name: 'Orchard corner', hemisphere: 'south', hazards: ['overhead-lines'], plantCount: 0 });
    expect(await Site.count({ where: { groupId: f.group.id } })).toBe(2);
  });

  it('answers 400 naming latitude, longitude and time zone when they are out of range', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.owner.email)).post(`/api/groups/${f.group.id}/sites`, { ...valid, latitude: 95, longitude: -200, timeZone: 'Mars/Olympus' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['latitude', 'longitude', 'timeZone']);
    expect(await Site.count()).toBe(1);
  });
});

describe('GET /api/groups/:groupId/sites', () => {
  it('counts live plants per site and hides archived sites unless asked', async () => {
    const f = await roleFixture();
    await createPlant(f.group, f.site, 'Opal');
    const spare = await createSite(f.group, 'Spare bed');
    await spare.update({ archivedAt: new Date() });
    const client = await signedIn(f.people.viewer.email);
    const live = siteSchema.array().parse((await client.get(`/api/groups/${f.group.id}/sites`).expect(200)).body);
    expect(live.map((s) => [s.name, s.plantCount])).toEqual([['Top plot', 2]]);
    const every = (await client.get(`/api/groups/${f.group.id}/sites?includeArchived=true`).expect(200)).body;
    expect(every).toHaveLength(2);
  });

  it('answers 404 for a site of another group', async () => {
    const f = await roleFixture();
    const theirs = await createSite(f.otherGroup, 'Theirs');
    const res = await (await signedIn(f.people.owner.email)).get(`/api/groups/${f.group.id}/sites/${theirs.id}`);
    expect(res.status).toBe(404);
  });
});

describe('PATCH /api/groups/:groupId/sites/:siteId', () => {
  it('changes only the fields sent', async () => {
    const f = await roleFixture();
    await f.site.update({ notes: 'Keep me', hazards: ['soft-ground'] });
    await (await signedIn(f.people.owner.email)).patch(`/api/groups/${f.group.id}/sites/${f.site.id}`, { name: 'Renamed' }).expect(200);
    expect((await Site.findByPk(f.site.id))?.get({ plain: true })).toMatchObject({ name: 'Renamed', notes: 'Keep me', hazards: ['soft-ground'] });
  });
});

describe('archive, restore and delete a site', () => {
  it('archives and restores', async () => {
    const f = await roleFixture();
    const client = await signedIn(f.people.owner.email);
    const archived = await client.post(`/api/groups/${f.group.id}/sites/${f.site.id}/archive`).expect(200);
    expect(archived.body.archivedAt).not.toBeNull();
    const restored = await client.post(`/api/groups/${f.group.id}/sites/${f.site.id}/restore`).expect(200);
    expect(restored.body.archivedAt).toBeNull();
  });

  it('answers 409 while the site still has plants, and deletes an empty one', async () => {
    const f = await roleFixture();
    const client = await signedIn(f.people.owner.email);
    const res = await client.delete(`/api/groups/${f.group.id}/sites/${f.site.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('CONFLICT');
    const empty = await createSite(f.group, 'Empty');
    await client.delete(`/api/groups/${f.group.id}/sites/${empty.id}`).expect(204);
    expect(await Site.findByPk(empty.id)).toBeNull();
  });
});
