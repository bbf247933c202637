import { beforeEach, describe, expect, it } from 'vitest';
import { todayIn } from '../../server/care';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { plantWindowsSchema } from '../../server/schemas/windows';
import { createPlant, newClient, resetDatabase, roleFixture, signedIn } from '../helpers/api';

beforeEach(resetDatabase);

const windowsPath = (groupId: string, plantId: string, query = '') => `/api/groups/${groupId}/plants/${plantId}/windows${query}`;

describe('GET /api/groups/:groupId/plants/:plantId/windows', () => {
  it('shows a viewer the plum’s windows for the season with the stone-fruit check for the day', async () => {
    const f = await roleFixture(); // a 'Victoria' plum, bush, planted 2015, at 52.4° N
    const res = await (await signedIn(f.people.viewer.email)).get(windowsPath(f.group.id, f.plant.id, '?season=2026&on=2026-07-15'));
    expect(res.status).toBe(200);
    const body = plantWindowsSchema.parse(res.body);
    expect(body).toMatchObject({ season: 2026, on: '2026-07-15' });
    // RHS plum pruning (care-rules.md PR-3): June to August.
    expect(body.windows.find((w) => w.task === 'stone-fruit-prune')).toMatchObject({ opens: '2026-06-01', closes: '2026-08-31', state: 'open', label: expect.any(String) });
    expect(body.stoneFruitCheck).toMatchObject({ applies: true, verdict: 'ok' });
    expect(body.stoneFruitCheck?.rules.map((r) => r.code)).toContain('PR-3');
    expect(body.basisNote).toMatch(/no readings for this site yet/);
  });

  it('carries the plant’s silver leaf into the check, and says avoid in winter', async () => {
    const f = await roleFixture();
    await f.plant.update({ healthFlags: ['silver-leaf'] });
    const res = await (await signedIn(f.people.owner.email)).get(windowsPath(f.group.id, f.plant.id, '?on=2026-01-10'));
    const body = plantWindowsSchema.parse(res.body);
    expect(body.season).toBe(2026);
    expect(body.stoneFruitCheck?.verdict).toBe('avoid');
    expect(body.stoneFruitCheck?.rules.map((r) => r.code)).toContain('PR-13');
    expect(body.windows.some((w) => w.task === 'remedial-cut')).toBe(true);
  });

  it('judges the day at the site when no date is given', async () => {
    const f = await roleFixture();
    const body = plantWindowsSchema.parse((await (await signedIn(f.people.helper.email)).get(windowsPath(f.group.id, f.plant.id))).body);
    expect(body.on).toBe(todayIn('Europe/London'));
    expect(body.season).toBe(Number(body.on.slice(0, 4)));
  });

  it('leaves the check out for a plant that is not stone fruit', async () => {
    const f = await roleFixture();
    const apple = await createPlant(f.group, f.site, 'Egremont Russet', 'apple');
    const body = plantWindowsSchema.parse((await (await signedIn(f.people.viewer.email)).get(windowsPath(f.group.id, apple.id, '?season=2026'))).body);
    expect(body.stoneFruitCheck).toBeNull();
    expect(body.windows.length).toBeGreaterThan(0);
  });

  it('answers 404 to someone outside the group', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.outsider.email)).get(windowsPath(f.group.id, f.plant.id));
    expect(res.status).toBe(404);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('NOT_FOUND');
  });

  it('answers 404 for a plant of another group asked through one’s own group', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.outsider.email)).get(windowsPath(f.otherGroup.id, f.plant.id));
    expect(res.status).toBe(404);
  });

  it('answers 401 when nobody is signed in', async () => {
    const f = await roleFixture();
    expect((await (await newClient()).get(windowsPath(f.group.id, f.plant.id))).status).toBe(401);
  });

  it.each([
    ['a season that is not a year', '?season=next', 'query.season'],
    ['a season out of range', '?season=1700', 'query.season'],
    ['a fractional season', '?season=2026.5', 'query.season'],
    ['an impossible date', '?on=2026-02-30', 'query.on'],
  ])('answers 400 for %s', async (_name, query, path) => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.viewer.email)).get(windowsPath(f.group.id, f.plant.id, query));
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.issues?.map((i) => i.path)).toContain(path);
  });

  it('answers 400 for a plant id that is not an id', async () => {
    const f = await roleFixture();
    expect((await (await signedIn(f.people.viewer.email)).get(windowsPath(f.group.id, 'not-an-id'))).status).toBe(400);
  });
});
