import { beforeEach, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/db';
import { User } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { operationsSchema } from '../../server/schemas/reminders';
import { enqueueMail } from '../../server/services/outbox.service';
import * as dailyPass from '../../worker/jobs/run-daily-pass';
import { createPlant, createSite, resetDatabase, roleFixture, signedIn } from '../helpers/api';

beforeEach(resetDatabase);

const digestFor = (to: string, key: string) => ({
  deliveryKey: key, kind: 'reminder-digest' as const, to,
  payload: { name: 'X', date: '2026-06-24', appUrl: 'http://127.0.0.1:3999', preferencesUrl: 'http://127.0.0.1:3999/account/reminders', unsubscribeUrl: 'http://127.0.0.1:3999/unsubscribe/x', sites: [], plants: [], jobs: [], weekly: [] },
});

async function withActivity() {
  const fixture = await roleFixture();
  const otherSite = await createSite(fixture.otherGroup, 'Elsewhere plot');
  await createPlant(fixture.otherGroup, otherSite);
  await dailyPass.run({ db: sequelize, links: { appUrl: 'http://127.0.0.1:3999' }, date: '2026-06-24' });
  await enqueueMail(digestFor(fixture.people.helper.email, 'test:queued'));
  await enqueueMail(digestFor(fixture.people.outsider.email, 'test:outsider'));
  await enqueueMail({ deliveryKey: 'test:reset', kind: 'password-reset', to: fixture.people.grower.email, payload: { name: 'G', resetUrl: 'http://127.0.0.1:3999/reset-password?token=x', expiresInMinutes: 60 } });
  await sequelize.query(`UPDATE outbox_messages SET status = 'failed', attempts = 8, last_error = 'connect ECONNREFUSED' WHERE delivery_key = 'test:queued'`);
  await enqueueMail(digestFor(fixture.people.viewer.email, 'test:pending'));
  return fixture;
}

describe('GET /api/groups/:groupId/operations', () => {
  it('shows an owner the last pass of each of the group\'s sites and its members\' queued and failed digests', async () => {
    const { group, site, people } = await withActivity();
    const res = await (await signedIn(people.owner.email)).get(`/api/groups/${group.id}/operations`).expect(200);
    const ops = operationsSchema.parse(res.body);
    expect(ops.sites).toHaveLength(1);
    expect(ops.sites[0]).toMatchObject({ siteId: site.id, lastPass: { date: '2026-06-24', status: 'done', plants: 1 } });
    expect(ops.failed.map((m) => [m.to, m.lastError])).toEqual([[people.helper.email, 'connect ECONNREFUSED']]);
    expect(ops.queued.map((m) => m.to)).toEqual([people.viewer.email]);
    // Another group's mail and a member's password reset are not the owner's to see.
    expect(JSON.stringify(ops)).not.toContain(people.outsider.email);
    expect(JSON.stringify(ops)).not.toContain('password-reset');
    expect(ops.counts).toMatchObject({ sites: 1, queued: 1, failed: 1 });
  });

  it('answers 403 to a helper', async () => {
    const { group, people } = await withActivity();
    const res = await (await signedIn(people.helper.email)).get(`/api/groups/${group.id}/operations`);
    expect(res.status).toBe(403);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('FORBIDDEN');
  });

  it('answers 404 to someone outside the group', async () => {
    const { group, people } = await withActivity();
    const res = await (await signedIn(people.outsider.email)).get(`/api/groups/${group.id}/operations`);
    expect(res.status).toBe(404);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('NOT_FOUND');
  });
});

describe('GET /api/admin/operations', () => {
  it('answers 403 to a group owner who is not a server admin', async () => {
    const { people } = await withActivity();
    const res = await (await signedIn(people.owner.email)).get('/api/admin/operations');
    expect(res.status).toBe(403);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('FORBIDDEN');
  });

  it('shows a server admin every site and every queued and failed message', async () => {
    const { people } = await withActivity();
    await User.update({ isAdmin: true }, { where: { id: people.viewer.id } });
    const res = await (await signedIn(people.viewer.email)).get('/api/admin/operations').expect(200);
    const ops = operationsSchema.parse(res.body);
    expect(ops.sites.map((s) => s.siteName).sort()).toEqual(['Elsewhere plot', 'Top plot']);
    expect(ops.queued.map((m) => m.kind).sort()).toEqual(['password-reset', 'reminder-digest', 'reminder-digest']);
    expect(ops.failed).toHaveLength(1);
  });
});
