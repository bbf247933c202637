import { beforeEach, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/db';
import { OutboxMessage, ReminderPreference, StoreBatch, StoreBatchPlant } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { storeBatchSchema, storeListSchema } from '../../server/schemas/store';
import * as notifyStoreExpiry from '../../worker/jobs/notify-store-expiry';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn, type Client } from '../helpers/api';
import { deliverQueuedMail, mailTo } from '../helpers/mail';
import { groupPath, storedBatch, today } from '../helpers/team';

beforeEach(resetDatabase);

const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;
const leaves = (plantIds: string[]) => ({ item: 'vine-leaves', label: 'Blanched, 40 to a bag', quantity: 40, unit: 'leaves', method: 'frozen', storedOn: '2026-06-10', plantIds });
const markUsed = (c: Client, groupId: string, batchId: string, usedOn: string | null) =>
  c.agent.put(groupPath(groupId, `/store/${batchId}/used`)).set('x-csrf-token', c.token).send({ usedOn });

describe('POST /api/groups/:groupId/store', () => {
  it('stores a batch with its plants and a use-by worked out from the item and method', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.helper.email)).post(groupPath(f.group.id, '/store'), leaves([f.plant.id])).expect(201);
    // Frozen vine leaves: warn at 6 months (MSU Extension via UC Cooperative Extension, S62), use by 12 (common practice).
    expect(storeBatchSchema.parse(res.body)).toMatchObject({
      item: 'vine-leaves', quantity: 40, unit: 'leaves', method: 'frozen', storedOn: '2026-06-10', warnOn: '2026-12-10', useBy: '2027-06-10',
      plants: [{ id: f.plant.id, name: 'Victoria plum' }], storedByName: 'helper', usedOn: null,
    });
    expect(await StoreBatchPlant.count()).toBe(1);
  });

  it('refuses bottled vine leaves with the reason, under the method field', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, '/store'), { ...leaves([]), method: 'bottled' }).expect(400);
    expect(envelope(res.body).issues).toEqual([{ path: 'method', message: expect.stringMatching(/no tested way to bottle vine leaves/) }]);
    expect(await StoreBatch.count()).toBe(0);
  });

  it('refuses another group’s plant and a stored date after today, writing nothing', async () => {
    const f = await roleFixture();
    const theirs = await createPlant(f.otherGroup, await createSite(f.otherGroup), 'Opal');
    const owner = await signedIn(f.people.owner.email);
    expect(envelope((await owner.post(groupPath(f.group.id, '/store'), leaves([theirs.id])).expect(400)).body).issues?.[0]?.path).toBe('plantIds');
    expect(envelope((await owner.post(groupPath(f.group.id, '/store'), { ...leaves([]), storedOn: '2099-01-01' }).expect(400)).body).issues?.[0]?.path).toBe('storedOn');
    expect(await StoreBatch.count()).toBe(0);
  });
});

describe('GET /api/groups/:groupId/store', () => {
  it('lists what is in store, soonest use-by first, each with its state, and the keep table', async () => {
    const f = await roleFixture();
    await storedBatch(f.group, f.people.helper, { label: 'Old leaves', storedOn: '2025-06-01', warnOn: '2025-12-01', useBy: '2026-06-01' });
    await storedBatch(f.group, f.people.helper, { label: 'Autumn leaves', storedOn: '2026-11-20', warnOn: '2027-05-20', useBy: '2027-11-20' });
    await storedBatch(f.group, f.people.helper, { label: 'Eaten', usedOn: '2026-10-01' });
    const list = storeListSchema.parse((await (await signedIn(f.people.viewer.email)).get(groupPath(f.group.id, '/store')).expect(200)).body);
    expect(list.batches.map((b) => [b.label, b.state])).toEqual([['Old leaves', 'past-use-by'], ['Autumn leaves', 'keeps']]);
    expect(list.keepTimes).toContainEqual(expect.objectContaining({ item: 'vine-leaves', method: 'frozen', warnMonths: 6, expireMonths: 12 }));
    const withUsed = storeListSchema.parse((await (await signedIn(f.people.viewer.email)).get(groupPath(f.group.id, '/store?includeUsed=true'))).body);
    expect(withUsed.batches.map((b) => b.state)).toContain('used');
  });
});

describe('PUT /api/groups/:groupId/store/:batchId/used', () => {
  it('marks a batch used, and null puts it back in store (the undo)', async () => {
    const f = await roleFixture();
    const batch = await storedBatch(f.group, f.people.owner);
    const helper = await signedIn(f.people.helper.email);
    expect(storeBatchSchema.parse((await markUsed(helper, f.group.id, batch.id, today()).expect(200)).body)).toMatchObject({ state: 'used', usedOn: today(), usedByName: 'helper' });
    expect(storeBatchSchema.parse((await markUsed(helper, f.group.id, batch.id, null).expect(200)).body)).toMatchObject({ usedOn: null, usedByName: null });
  });

  it('refuses a used date before the batch was stored', async () => {
    const f = await roleFixture();
    const batch = await storedBatch(f.group, f.people.owner);
    const res = await markUsed(await signedIn(f.people.owner.email), f.group.id, batch.id, '2026-01-01').expect(400);
    expect(envelope(res.body).issues?.[0]?.path).toBe('usedOn');
  });
});

describe('worker job notify-store-expiry', () => {
  it('queues one notice a week before use-by, to the person who stored it, however often it runs', async () => {
    const f = await roleFixture();
    const batch = await storedBatch(f.group, f.people.helper, { label: 'Blanched leaves', storedOn: '2025-12-08', warnOn: '2026-06-08', useBy: '2026-12-08' });
    await storedBatch(f.group, f.people.helper, { label: 'Too early', storedOn: '2025-12-20', warnOn: '2026-06-20', useBy: '2026-12-20' });
    await storedBatch(f.group, f.people.helper, { label: 'Already used', storedOn: '2025-12-08', warnOn: '2026-06-08', useBy: '2026-12-08', usedOn: '2026-11-30' });
    const now = () => new Date('2026-12-01T07:05:00Z');
    expect(await notifyStoreExpiry.run({ db: sequelize, now, appUrl: 'http://127.0.0.1:3999' })).toEqual({ queued: 1 });
    expect(await notifyStoreExpiry.run({ db: sequelize, now, appUrl: 'http://127.0.0.1:3999' })).toEqual({ queued: 0 });
    expect(await notifyStoreExpiry.run({ db: sequelize, now: () => new Date('2026-12-05T07:05:00Z') })).toEqual({ queued: 0 });
    const rows = await OutboxMessage.findAll({ where: { kind: 'store-expiry' } });
    expect(rows.map((r) => [r.deliveryKey, r.toAddress])).toEqual([[`store-expiry:${batch.id}`, f.people.helper.email]]);
    await deliverQueuedMail();
    // maildev is shared by every test file: pick this file's message by its subject.
    const mail = (await mailTo(f.people.helper.email)).find((m) => m.subject === 'Use by 8 December 2026: Blanched leaves');
    expect(mail!.text).toContain('Blanched leaves (40 leaves, frozen on 8 December 2025) should be used by 8 December 2026');
  });

  it('tells an owner when the person who stored it has left, and no one who turned reminders off', async () => {
    const f = await roleFixture();
    await storedBatch(f.group, f.people.outsider, { storedOn: '2025-12-03', warnOn: '2026-06-03', useBy: '2026-12-03' });
    await storedBatch(f.group, f.people.helper, { storedOn: '2025-12-04', warnOn: '2026-06-04', useBy: '2026-12-04' });
    await ReminderPreference.create({ userId: f.people.helper.id, isEnabled: false } as ReminderPreference);
    await notifyStoreExpiry.run({ db: sequelize, now: () => new Date('2026-12-01T07:05:00Z') });
    expect((await OutboxMessage.findAll({ where: { kind: 'store-expiry' } })).map((r) => r.toAddress)).toEqual([f.people.owner.email]);
  });
});
