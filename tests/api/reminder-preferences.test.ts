import { beforeEach, describe, expect, it } from 'vitest';
import { ReminderPreference } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { reminderPreferencesSchema, reminderTaskCodes } from '../../server/schemas/reminders';
import { createUser, newClient, resetDatabase, signedIn } from '../helpers/api';

beforeEach(resetDatabase);

describe('GET /api/reminders/preferences', () => {
  it('answers 401 when signed out', async () => {
    const res = await (await newClient()).get('/api/reminders/preferences');
    expect(res.status).toBe(401);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('UNAUTHENTICATED');
  });

  it('gives the defaults to someone who never saved any: every task, 3 days ahead, all three kinds on', async () => {
    await createUser('new@example.org');
    const res = await (await signedIn('new@example.org')).get('/api/reminders/preferences').expect(200);
    expect(reminderPreferencesSchema.parse(res.body)).toEqual({
      isEnabled: true, leadDays: 3, tasks: [...reminderTaskCodes], isOpeningOn: true, isClosingOn: true, isWeeklyOn: true, pausedUntil: null, calendar: null,
    });
  });
});

describe('PATCH /api/reminders/preferences', () => {
  it('saves the signed-in person\'s own choices and nobody else\'s', async () => {
    const ann = await createUser('ann@example.org');
    const bob = await createUser('bob@example.org');
    const client = await signedIn('ann@example.org');
    const res = await client.patch('/api/reminders/preferences', { leadDays: 7, tasks: ['harvest', 'summer-prune'], isWeeklyOn: false, pausedUntil: '2026-08-01' }).expect(200);
    expect(reminderPreferencesSchema.parse(res.body)).toMatchObject({ leadDays: 7, tasks: ['summer-prune', 'harvest'], isWeeklyOn: false, pausedUntil: '2026-08-01', isOpeningOn: true });
    expect(await ReminderPreference.findByPk(ann.id)).toMatchObject({ leadDays: 7, isWeeklyOn: false });
    expect(await ReminderPreference.findByPk(bob.id)).toBeNull();
    const bobs = await (await signedIn('bob@example.org')).get('/api/reminders/preferences').expect(200);
    expect(bobs.body.leadDays).toBe(3);
  });

  it('ignores a userId in the body: there is no way to name another person', async () => {
    const ann = await createUser('ann@example.org');
    const bob = await createUser('bob@example.org');
    await (await signedIn('ann@example.org')).patch('/api/reminders/preferences', { userId: bob.id, isEnabled: false }).expect(200);
    expect((await ReminderPreference.findByPk(ann.id))?.isEnabled).toBe(false);
    expect(await ReminderPreference.findByPk(bob.id)).toBeNull();
  });

  it('keeps fields that were not sent', async () => {
    await createUser('ann@example.org');
    const client = await signedIn('ann@example.org');
    await client.patch('/api/reminders/preferences', { leadDays: 10 }).expect(200);
    const res = await client.patch('/api/reminders/preferences', { isClosingOn: false }).expect(200);
    expect(res.body).toMatchObject({ leadDays: 10, isClosingOn: false });
  });

  it('stores every task ticked as "all tasks", so tasks added later are included', async () => {
    const ann = await createUser('ann@example.org');
    await (await signedIn('ann@example.org')).patch('/api/reminders/preferences', { tasks: [...reminderTaskCodes] }).expect(200);
    expect((await ReminderPreference.findByPk(ann.id))?.tasks).toBeNull();
  });

  it('answers 400 naming each bad field, and changes nothing', async () => {
    const ann = await createUser('ann@example.org');
    const res = await (await signedIn('ann@example.org')).patch('/api/reminders/preferences', { leadDays: 40, tasks: ['weeding'], pausedUntil: '2026-02-30' });
    expect(res.status).toBe(400);
    const paths = errorEnvelopeSchema.parse(res.body).error.issues!.map((i) => i.path.split('.')[0]).sort();
    expect(paths).toEqual(['leadDays', 'pausedUntil', 'tasks']);
    expect(await ReminderPreference.findByPk(ann.id)).toBeNull();
  });

  it('answers 403 without the CSRF token', async () => {
    await createUser('ann@example.org');
    const client = await signedIn('ann@example.org');
    const res = await client.agent.patch('/api/reminders/preferences').send({ leadDays: 5 });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF_FAILED');
  });
});

describe('POST /api/reminders/calendar', () => {
  it('answers 201 with a secret feed link, shown again on the preferences', async () => {
    await createUser('ann@example.org');
    const client = await signedIn('ann@example.org');
    const res = await client.post('/api/reminders/calendar').expect(201);
    expect(res.body.url).toMatch(/^http:\/\/127\.0\.0\.1:3999\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    const prefs = await client.get('/api/reminders/preferences').expect(200);
    expect(prefs.body.calendar.url).toBe(res.body.url);
  });

  it('keeps only a hash of the token', async () => {
    const ann = await createUser('ann@example.org');
    const res = await (await signedIn('ann@example.org')).post('/api/reminders/calendar').expect(201);
    const token = /\/([^/]+)\.ics$/.exec(res.body.url as string)![1]!;
    const row = await ReminderPreference.findByPk(ann.id);
    expect(row?.calendarTokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(row?.get({ plain: true }))).not.toContain(token);
  });
});
