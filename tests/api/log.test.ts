import { beforeEach, describe, expect, it } from 'vitest';
import { CareWindow, LogEntry, LogEntryPlant } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { logEntrySchema, logGuardSchema, logListSchema } from '../../server/schemas/log';
import { createPlant, resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { feedBody, logPath, pruneBody, windowFor } from '../helpers/log';

beforeEach(resetDatabase);

const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;

describe('POST /api/groups/:groupId/log', () => {
  it('lets a helper log a feed, stored with its details, the helper as doer and recorder', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const res = await helper.post(logPath(f.group.id), feedBody([f.plant.id], { notes: 'Spread over the rooting area' })).expect(201);
    const entry = logEntrySchema.parse(res.body);
    expect(entry).toMatchObject({ kind: 'feed', doneOn: '2026-03-10', doneBy: { id: f.people.helper.id }, recordedBy: { id: f.people.helper.id }, notes: 'Spread over the rooting area' });
    expect(entry.summary).toBe('Growmore (7-7-7), 140 g, over 1 m²');
    expect(entry.plants.map((p) => p.name)).toEqual(['Victoria plum']);
    expect(await LogEntry.count()).toBe(1);
  });

  it('lets a grower record work done by another member', async () => {
    const f = await roleFixture();
    const grower = await signedIn(f.people.grower.email);
    const res = await grower.post(logPath(f.group.id), feedBody([f.plant.id], { doneBy: f.people.helper.id })).expect(201);
    expect(logEntrySchema.parse(res.body)).toMatchObject({ doneBy: { id: f.people.helper.id }, recordedBy: { id: f.people.grower.id } });
  });

  it('answers 403 when a helper records work as someone else, and writes nothing', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const res = await helper.post(logPath(f.group.id), feedBody([f.plant.id], { doneBy: f.people.grower.id })).expect(403);
    expect(envelope(res.body).code).toBe('FORBIDDEN');
    expect(await LogEntry.count()).toBe(0);
  });

  it('refuses a doer from outside the group', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const res = await owner.post(logPath(f.group.id), feedBody([f.plant.id], { doneBy: f.people.outsider.id })).expect(400);
    expect(envelope(res.body).issues).toEqual([{ path: 'doneBy', message: 'Choose a member of this group' }]);
  });

  it('refuses a plant of another group as unknown, and writes nothing', async () => {
    const f = await roleFixture();
    const theirs = await createPlant(f.otherGroup, await (await import('../helpers/api')).createSite(f.otherGroup), 'Opal');
    const owner = await signedIn(f.people.owner.email);
    const res = await owner.post(logPath(f.group.id), feedBody([f.plant.id, theirs.id])).expect(400);
    expect(envelope(res.body).issues).toEqual([{ path: 'plantIds', message: 'Choose plants of this group' }]);
    expect(await LogEntry.count()).toBe(0);
  });

  it('checks each kind’s own details: a feed needs its product, a note its words, a harvest a weight or count', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const feed = await owner.post(logPath(f.group.id), feedBody([f.plant.id], { details: { amount: 100, unit: 'g' } } as never)).expect(400);
    expect(envelope(feed.body).issues?.map((i) => i.path)).toContain('details.product');
    const note = await owner.post(logPath(f.group.id), { kind: 'note', doneOn: '2026-05-01', plantIds: [f.plant.id], details: {} }).expect(400);
    expect(envelope(note.body).issues?.[0]?.path).toBe('notes');
    const harvest = await owner.post(logPath(f.group.id), { kind: 'harvest', doneOn: '2026-08-01', plantIds: [f.plant.id], details: {} }).expect(400);
    expect(envelope(harvest.body).issues?.[0]).toEqual({ path: 'details.weightKg', message: 'Give the weight, the count or both' });
    const unknown = await owner.post(logPath(f.group.id), { kind: 'dance', doneOn: '2026-08-01', plantIds: [f.plant.id], details: {} }).expect(400);
    expect(envelope(unknown.body).issues?.[0]?.path).toBe('kind');
    expect(await LogEntry.count()).toBe(0);
  });

  it('stores the day before which a sprayed plant must not be picked', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const res = await owner.post(logPath(f.group.id), { kind: 'spray', doneOn: '2026-06-01', plantIds: [f.plant.id], details: { product: 'Sulphur', harvestIntervalDays: 14 } }).expect(201);
    expect(logEntrySchema.parse(res.body).pickingSafeFrom).toBe('2026-06-15');
  });

  it('records vine leaves picked and a harvest by weight and count', async () => {
    const f = await roleFixture();
    const vine = await createPlant(f.group, f.site, 'Black Hamburgh', 'grape-under-cover');
    const owner = await signedIn(f.people.owner.email);
    const leaves = await owner.post(logPath(f.group.id), { kind: 'leaf-pick', doneOn: '2026-06-10', plantIds: [vine.id], details: { leafCount: 40, sizeBand: '10-15' } }).expect(201);
    expect(leaves.body.summary).toBe('40 leaves, 10–15 cm');
    const pick = await owner.post(logPath(f.group.id), { kind: 'harvest', doneOn: '2026-08-20', plantIds: [f.plant.id], details: { weightKg: 3.25, count: 60 } }).expect(201);
    expect(pick.body.summary).toBe('3.25 kg, 60 picked');
  });
});

describe('the stone-fruit guard on POST …/log', () => {
  it('answers 422 for a winter cut on a plum without a reason, saying why, and writes nothing', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const res = await helper.post(logPath(f.group.id), pruneBody([f.plant.id], '2026-12-01')).expect(422);
    const error = envelope(res.body);
    expect(error.code).toBe('UNPROCESSABLE');
    expect(error.message).toMatch(/avoid cutting Victoria plum on 2026-12-01.*should not be pruned while dormant/);
    expect(error.issues?.[0]?.path).toBe('overrideReason');
    expect(await LogEntry.count()).toBe(0);
  });

  it('stores the verdict, its rules and the reason when one is given', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const body = pruneBody([f.plant.id], '2026-12-01', { details: { pruneType: 'remedial' }, overrideReason: 'Branch split in the storm; a clean cut now' });
    const entry = logEntrySchema.parse((await helper.post(logPath(f.group.id), body).expect(201)).body);
    expect(entry.overrideReason).toBe('Branch split in the storm; a clean cut now');
    expect(entry.plants[0]?.guard?.verdict).toBe('avoid');
    expect(entry.plants[0]?.guard?.rules.map((r) => r.code)).toContain('PR-1');
    const row = await LogEntryPlant.findOne({ where: { plantId: f.plant.id } });
    expect(row?.guardVerdict).toBe('avoid');
  });

  it('saves a summer cut on a plum as ok with no reason asked or kept', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const entry = logEntrySchema.parse((await helper.post(logPath(f.group.id), pruneBody([f.plant.id], '2026-07-15', { overrideReason: 'not needed' })).expect(201)).body);
    expect(entry.plants[0]?.guard?.verdict).toBe('ok');
    expect(entry.overrideReason).toBeNull();
  });

  it('does not run on a cut of an apple', async () => {
    const f = await roleFixture();
    const apple = await createPlant(f.group, f.site, 'Discovery', 'apple');
    const owner = await signedIn(f.people.owner.email);
    const entry = logEntrySchema.parse((await owner.post(logPath(f.group.id), pruneBody([apple.id], '2026-12-01', { details: { pruneType: 'winter' } })).expect(201)).body);
    expect(entry.plants[0]?.guard).toBeNull();
  });

  it('answers the form’s question before saving: each stone-fruit plant’s verdict and the worst', async () => {
    const f = await roleFixture();
    const apple = await createPlant(f.group, f.site, 'Discovery', 'apple');
    const helper = await signedIn(f.people.helper.email);
    const res = await helper.get(logPath(f.group.id, `/stone-fruit-check?date=2026-12-01&plantIds=${f.plant.id},${apple.id}`)).expect(200);
    const guard = logGuardSchema.parse(res.body);
    expect(guard.verdict).toBe('avoid');
    expect(guard.plants.map((p) => p.name)).toEqual(['Victoria plum']);
    expect(guard.plants[0]?.nextSafe?.from).toMatch(/^2027-0[5-6]/);
  });
});

describe('care windows counted by an entry', () => {
  it('marks the window holding the day done by the doer, and leaves other tasks open', async () => {
    const f = await roleFixture();
    const prune = await windowFor(f.plant, 'stone-fruit-prune', '2026-06-01', '2026-08-31');
    const feed = await windowFor(f.plant, 'spring-feed', '2026-03-01', '2026-04-15');
    const helper = await signedIn(f.people.helper.email);
    const entry = logEntrySchema.parse((await helper.post(logPath(f.group.id), pruneBody([f.plant.id], '2026-07-15')).expect(201)).body);
    await prune.reload();
    await feed.reload();
    expect(prune.doneAt).toBeInstanceOf(Date);
    expect(prune.doneBy).toBe(f.people.helper.id);
    expect(feed.doneAt).toBeNull();
    expect(entry.windowsDone).toEqual([{ id: prune.id, plantId: f.plant.id, task: 'stone-fruit-prune', label: 'Pruning stone fruit (summer)' }]);
  });

  it('counts a feed a little before its window for that season’s window', async () => {
    const f = await roleFixture();
    const spring = await windowFor(f.plant, 'spring-feed', '2026-03-01', '2026-04-15');
    const owner = await signedIn(f.people.owner.email);
    await owner.post(logPath(f.group.id), feedBody([f.plant.id], { doneOn: '2026-02-20' })).expect(201);
    await spring.reload();
    expect(spring.doneAt).toBeInstanceOf(Date);
  });

  it('opens the window again when the entry is deleted', async () => {
    const f = await roleFixture();
    const spring = await windowFor(f.plant, 'spring-feed', '2026-03-01', '2026-04-15');
    const owner = await signedIn(f.people.owner.email);
    const { body } = await owner.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    await owner.delete(logPath(f.group.id, `/${body.id}`)).expect(204);
    await spring.reload();
    expect(spring.doneAt).toBeNull();
    expect(await CareWindow.count()).toBe(1);
  });
});

describe('GET /api/groups/:groupId/log', () => {
  it('filters by plant, kind, person and date range, newest first, in pages', async () => {
    const f = await roleFixture();
    const apple = await createPlant(f.group, f.site, 'Discovery', 'apple');
    const owner = await signedIn(f.people.owner.email);
    const helper = await signedIn(f.people.helper.email);
    await owner.post(logPath(f.group.id), feedBody([f.plant.id, apple.id], { doneOn: '2026-03-01' })).expect(201);
    await helper.post(logPath(f.group.id), { kind: 'water', doneOn: '2026-06-01', plantIds: [apple.id], details: { litres: 20 } }).expect(201);
    await helper.post(logPath(f.group.id), { kind: 'note', doneOn: '2026-07-01', plantIds: [f.plant.id], details: {}, notes: 'Wasps' }).expect(201);
    const list = async (q: string) => logListSchema.parse((await owner.get(logPath(f.group.id, `?${q}`)).expect(200)).body);
    expect((await list('')).items.map((e) => e.doneOn)).toEqual(['2026-07-01', '2026-06-01', '2026-03-01']);
    expect((await list(`plantId=${apple.id}`)).items.map((e) => e.kind)).toEqual(['water', 'feed']);
    expect((await list('kind=note')).items.map((e) => e.notes)).toEqual(['Wasps']);
    expect((await list(`personId=${f.people.helper.id}`)).total).toBe(2);
    expect((await list('from=2026-05-01&to=2026-06-30')).items.map((e) => e.kind)).toEqual(['water']);
    const page2 = await list('pageSize=2&page=2');
    expect([page2.total, page2.items.length, page2.items[0]?.doneOn]).toEqual([3, 1, '2026-03-01']);
  });

  it('never shows another group’s entries, even when asked by their plant', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    await owner.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    const outsider = await signedIn(f.people.outsider.email);
    const res = await outsider.get(logPath(f.otherGroup.id, `?plantId=${f.plant.id}`)).expect(200);
    expect(logListSchema.parse(res.body).total).toBe(0);
    await outsider.get(logPath(f.group.id)).expect(404);
  });
});

describe('DELETE /api/groups/:groupId/log/:entryId', () => {
  it('lets the author delete an entry', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const { body } = await helper.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    await helper.delete(logPath(f.group.id, `/${body.id}`)).expect(204);
    expect(await LogEntry.count()).toBe(0);
  });

  it('lets an owner delete anyone’s entry', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const { body } = await helper.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    await (await signedIn(f.people.owner.email)).delete(logPath(f.group.id, `/${body.id}`)).expect(204);
    expect(await LogEntry.count()).toBe(0);
  });

  it('answers 403 when a grower deletes someone else’s entry, and keeps it', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    const { body } = await helper.post(logPath(f.group.id), feedBody([f.plant.id])).expect(201);
    const res = await (await signedIn(f.people.grower.email)).delete(logPath(f.group.id, `/${body.id}`)).expect(403);
    expect(envelope(res.body).code).toBe('FORBIDDEN');
    expect(await LogEntry.count()).toBe(1);
  });
});
