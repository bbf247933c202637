import { beforeEach, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/db';
import { CareWindow, LogEntry, OutboxMessage } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { logEntrySchema } from '../../server/schemas/log';
import { jobListSchema, jobSchema } from '../../server/schemas/team';
import { assembleDigests } from '../../worker/pass/assemble-digests';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn, type Client } from '../helpers/api';
import { deliverQueuedMail, mailTo } from '../helpers/mail';
import { windowFor } from '../helpers/log';
import { addDays, assign, groupPath, openFeedWindow, teamSnapshot, today } from '../helpers/team';

beforeEach(resetDatabase);

const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;
const handOut = (c: Client, groupId: string, windowId: string, userId: string | null) =>
  c.agent.put(groupPath(groupId, `/jobs/${windowId}/assignee`)).set('x-csrf-token', c.token).send({ userId });
const feed = { product: 'Fish, blood and bone', amount: 140, unit: 'g' };

describe('PUT /api/groups/:groupId/jobs/:windowId/assignee', () => {
  it('hands an open window to a helper, who sees it under "My jobs" with its state', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    const res = await handOut(await signedIn(f.people.grower.email), f.group.id, window.id, f.people.helper.id).expect(200);
    expect(jobSchema.parse(res.body)).toMatchObject({ windowId: window.id, assignedTo: { userId: f.people.helper.id, name: 'helper' }, state: 'open', task: 'spring-feed' });
    const list = jobListSchema.parse((await (await signedIn(f.people.helper.email)).get(groupPath(f.group.id, '/jobs')).expect(200)).body);
    expect(list.mine.map((j) => [j.plantName, j.task, j.state])).toEqual([['Victoria plum', 'spring-feed', 'open']]);
    expect(list.week).toEqual([]);
  });

  it('shows growers and owners this week’s open windows with who has them', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await windowFor(f.plant, 'winter-prune', addDays(today(), 30), addDays(today(), 60));
    await assign(window, f.people.helper, f.people.owner);
    const list = jobListSchema.parse((await (await signedIn(f.people.owner.email)).get(groupPath(f.group.id, '/jobs')).expect(200)).body);
    expect(list.week.map((j) => [j.task, j.assignedTo?.name])).toEqual([['spring-feed', 'helper']]);
    expect(list.mine).toEqual([]);
  });

  it('takes a job back with null', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await assign(window, f.people.helper, f.people.owner);
    const res = await handOut(await signedIn(f.people.owner.email), f.group.id, window.id, null).expect(200);
    expect(jobSchema.parse(res.body).assignedTo).toBeNull();
  });

  it('refuses a viewer or someone outside the group as the assignee with 400', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    const owner = await signedIn(f.people.owner.email);
    for (const user of [f.people.viewer, f.people.outsider]) {
      const res = await handOut(owner, f.group.id, window.id, user.id).expect(400);
      expect(envelope(res.body).issues?.[0]?.path).toBe('userId');
    }
  });

  it('answers 409 for a window that has passed, and 404 for another group’s window', async () => {
    const f = await roleFixture();
    const passed = await windowFor(f.plant, 'spring-feed', '2026-02-15', '2026-03-31');
    const owner = await signedIn(f.people.owner.email);
    const theirs = await openFeedWindow(await createPlant(f.otherGroup, await createSite(f.otherGroup), 'Opal'));
    const before = await teamSnapshot();
    expect(envelope((await handOut(owner, f.group.id, passed.id, f.people.helper.id).expect(409)).body).message).toMatch(/passed/);
    await handOut(owner, f.group.id, theirs.id, f.people.helper.id).expect(404);
    expect(await teamSnapshot()).toBe(before);
  });

  it('puts the job in the helper’s next digest, once, said as theirs', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await handOut(await signedIn(f.people.owner.email), f.group.id, window.id, f.people.helper.id).expect(200);
    await assembleDigests(sequelize, today(), { appUrl: 'http://127.0.0.1:3999' });
    const digests = await OutboxMessage.findAll({ where: { kind: 'reminder-digest', toAddress: f.people.helper.email } });
    expect(digests).toHaveLength(1);
    expect((digests[0]!.payload as { jobs: { kind: string; windowId: string }[] }).jobs).toEqual([expect.objectContaining({ kind: 'assigned', windowId: window.id })]);
    await assembleDigests(sequelize, addDays(today(), 1), { appUrl: 'http://127.0.0.1:3999' });
    expect(await OutboxMessage.count({ where: { kind: 'reminder-digest', toAddress: f.people.helper.email } })).toBe(1);
    await deliverQueuedMail();
    // maildev is shared by every test file: pick this file's digest by what it says.
    const mail = (await mailTo(f.people.helper.email)).find((m) => m.text.includes('Handed to you'));
    expect(mail!.text).toContain('Handed to you: open until');
    expect(mail!.text).toContain('Victoria');
  });
});

describe('POST /api/groups/:groupId/jobs/:windowId/done', () => {
  it('logs the work for the helper it was handed to and marks the window done', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await assign(window, f.people.helper, f.people.owner);
    const helper = await signedIn(f.people.helper.email);
    const res = await helper.post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today(), notes: 'Around the drip line', details: feed }).expect(201);
    const entry = logEntrySchema.parse(res.body);
    expect(entry).toMatchObject({ kind: 'feed', doneOn: today(), doneBy: { id: f.people.helper.id }, notes: 'Around the drip line', windowsDone: [{ id: window.id }] });
    expect((await CareWindow.findByPk(window.id))?.doneBy).toBe(f.people.helper.id);
    expect(jobListSchema.parse((await helper.get(groupPath(f.group.id, '/jobs'))).body).mine).toEqual([]);
    expect((await helper.get(groupPath(f.group.id, `/log?plantId=${f.plant.id}`)).expect(200)).body.total).toBe(1);
  });

  it('answers 403 when a helper ticks off a job handed to someone else, and logs nothing', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await assign(window, f.people.grower, f.people.owner);
    const before = await teamSnapshot();
    const res = await (await signedIn(f.people.helper.email)).post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today(), details: feed }).expect(403);
    expect(envelope(res.body).code).toBe('FORBIDDEN');
    expect(await teamSnapshot()).toBe(before);
  });

  it('asks for the feed’s details, by field, and logs nothing without them', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    const res = await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today() }).expect(400);
    expect(envelope(res.body).issues?.map((i) => i.path)).toEqual(expect.arrayContaining(['details.product', 'details.amount', 'details.unit']));
    expect(await LogEntry.count()).toBe(0);
  });

  it('answers 409 for a job already done, and refuses a date after today', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    const owner = await signedIn(f.people.owner.email);
    const future = await owner.post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: addDays(today(), 2), details: feed }).expect(400);
    expect(envelope(future.body).issues).toEqual([{ path: 'date', message: 'The date cannot be after today' }]);
    await owner.post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today(), details: feed }).expect(201);
    await owner.post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today(), details: feed }).expect(409);
    expect(await LogEntry.count()).toBe(1);
  });

  it('runs the stone-fruit guard on a cut: 422 asking for a reason, then saved with it', async () => {
    const f = await roleFixture();
    // A winter prune window on a plum, ticked off in December: the check says to avoid the cut.
    const window = await windowFor(f.plant, 'winter-prune', addDays(today(), -5), addDays(today(), 30));
    await assign(window, f.people.helper, f.people.owner);
    const helper = await signedIn(f.people.helper.email);
    const refused = await helper.post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today() }).expect(422);
    expect(envelope(refused.body).issues).toEqual([expect.objectContaining({ path: 'overrideReason' })]);
    const res = await helper.post(groupPath(f.group.id, `/jobs/${window.id}/done`), { date: today(), overrideReason: 'Storm-broken limb, cut back to clean wood' }).expect(201);
    expect(logEntrySchema.parse(res.body)).toMatchObject({ kind: 'prune', details: { pruneType: 'winter' }, overrideReason: 'Storm-broken limb, cut back to clean wood' });
  });
});
