import { beforeEach, describe, expect, it } from 'vitest';
import { Invitation, Membership, OutboxMessage, User } from '../../server/models';
import { personSchema } from '../../server/schemas/auth';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { invitationAcceptedSchema, invitationPreviewSchema, invitationSchema } from '../../server/schemas/team';
import { createUser, newClient, resetDatabase, roleFixture, signedIn, type Client } from '../helpers/api';
import { deliverQueuedMail, mailTo } from '../helpers/mail';
import { groupPath } from '../helpers/team';

beforeEach(resetDatabase);

const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;

/** Sends an invitation, delivers the outbox to maildev and answers the token from the link in the mail. */
async function inviteByMail(from: Client, groupId: string, email: string, role = 'helper'): Promise<string> {
  await from.post(groupPath(groupId, '/invitations'), { email, role }).expect(201);
  await deliverQueuedMail();
  const [mail] = await mailTo(email);
  const link = /http:\/\/127\.0\.0\.1:3999\/invitations\/([A-Za-z0-9_-]{40,})/.exec(mail?.text ?? '');
  expect(link, mail?.text).not.toBeNull();
  return link![1]!;
}

describe('POST /api/groups/:groupId/invitations', () => {
  it('queues a real message through the outbox, with a link, the group and the role; only a hash of the token is stored', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const res = await owner.post(groupPath(f.group.id, '/invitations'), { email: 'Nell@Test.example.org', role: 'grower' }).expect(201);
    expect(invitationSchema.parse(res.body)).toMatchObject({ email: 'nell@test.example.org', role: 'grower', invitedByName: 'owner' });
    expect(await OutboxMessage.count({ where: { kind: 'invitation' } })).toBe(1);
    const token = await inviteByMail(owner, f.group.id, 'nell2@test.example.org');
    const [mail] = await mailTo('nell2@test.example.org');
    expect(mail!.subject).toBe('owner invited you to Test orchard on Spurwood');
    expect(mail!.text).toContain('as a helper');
    expect(mail!.text).toMatch(/Accept by \d{1,2} [A-Z][a-z]+ \d{4}/);
    const stored = await Invitation.findAll({ raw: true });
    expect(JSON.stringify(stored)).not.toContain(token);
  });

  it('answers 409 when the person is already in the group, and sends nothing', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const res = await owner.post(groupPath(f.group.id, '/invitations'), { email: f.people.viewer.email, role: 'helper' }).expect(409);
    expect(envelope(res.body).issues).toEqual([{ path: 'email', message: 'Already a member' }]);
    expect(await OutboxMessage.count()).toBe(0);
  });

  it('answers 403 when a grower invites anyone but a helper', async () => {
    const f = await roleFixture();
    const grower = await signedIn(f.people.grower.email);
    const res = await grower.post(groupPath(f.group.id, '/invitations'), { email: 'x@test.example.org', role: 'viewer' }).expect(403);
    expect(envelope(res.body).message).toBe('Growers may invite helpers; ask an owner to invite a viewer');
    expect(await Invitation.count()).toBe(0);
  });

  it('replaces an earlier invitation to the same address: the old link stops working', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const first = await inviteByMail(owner, f.group.id, 'twice@test.example.org');
    await owner.post(groupPath(f.group.id, '/invitations'), { email: 'twice@test.example.org', role: 'helper' }).expect(201);
    const res = await (await newClient()).post('/api/invitations/preview', { token: first }).expect(400);
    expect(envelope(res.body).issues).toEqual([{ path: 'token', message: expect.stringMatching(/withdrawn or replaced/) }]);
    expect((await owner.get(groupPath(f.group.id, '/invitations')).expect(200)).body).toHaveLength(1);
  });
});

describe('accepting an invitation from its link', () => {
  it('signed out: previews, then creates the account for the invited address, signs it in and joins with the role', async () => {
    const f = await roleFixture();
    const token = await inviteByMail(await signedIn(f.people.owner.email), f.group.id, 'newcomer@test.example.org');
    const guest = await newClient();
    const preview = invitationPreviewSchema.parse((await guest.post('/api/invitations/preview', { token }).expect(200)).body);
    expect(preview).toMatchObject({ groupName: 'Test orchard', role: 'helper', email: 'newcomer@test.example.org', invitedByName: 'owner', hasAccount: false });
    const res = await guest.post('/api/invitations/accept', { token, name: 'Nia', password: 'pruning-saw-42' }).expect(200);
    expect(invitationAcceptedSchema.parse(res.body)).toEqual({ groupId: f.group.id, groupName: 'Test orchard', role: 'helper' });
    expect(personSchema.parse((await guest.get('/api/auth/me').expect(200)).body)).toMatchObject({ email: 'newcomer@test.example.org', name: 'Nia' });
    const user = await User.findOne({ where: { email: 'newcomer@test.example.org' } });
    expect((await Membership.findOne({ where: { groupId: f.group.id, userId: user!.id } }))?.role).toBe('helper');
  });

  it('signed in: joins the signed-in account, even under another address', async () => {
    const f = await roleFixture();
    const token = await inviteByMail(await signedIn(f.people.owner.email), f.group.id, 'work-address@test.example.org', 'viewer');
    const outsider = await signedIn(f.people.outsider.email);
    await outsider.post('/api/invitations/accept', { token }).expect(200);
    expect((await Membership.findOne({ where: { groupId: f.group.id, userId: f.people.outsider.id } }))?.role).toBe('viewer');
    expect(await User.count({ where: { email: 'work-address@test.example.org' } })).toBe(0);
  });

  it('works once: a second use answers 400 with issue path token', async () => {
    const f = await roleFixture();
    const token = await inviteByMail(await signedIn(f.people.owner.email), f.group.id, 'once@test.example.org');
    await (await newClient()).post('/api/invitations/accept', { token, name: 'Once', password: 'pruning-saw-42' }).expect(200);
    const res = await (await signedIn(f.people.outsider.email)).post('/api/invitations/accept', { token }).expect(400);
    expect(envelope(res.body)).toMatchObject({ code: 'VALIDATION_FAILED', issues: [{ path: 'token', message: 'This invitation has already been accepted. Sign in to reach the group.' }] });
    expect(await Membership.count({ where: { groupId: f.group.id, userId: f.people.outsider.id } })).toBe(0);
  });

  it('refuses an expired link with 400 saying so, and creates no account', async () => {
    const f = await roleFixture();
    const token = await inviteByMail(await signedIn(f.people.owner.email), f.group.id, 'late@test.example.org');
    // Seven days and a minute later, as far as the stored row is concerned.
    await Invitation.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { email: 'late@test.example.org' } });
    const guest = await newClient();
    const preview = await guest.post('/api/invitations/preview', { token }).expect(400);
    expect(envelope(preview.body).message).toMatch(/^This invitation expired on \d{1,2} [A-Z][a-z]+ \d{4}\. Ask the person who invited you to send a new one\.$/);
    const res = await guest.post('/api/invitations/accept', { token, name: 'Late', password: 'pruning-saw-42' }).expect(400);
    expect(envelope(res.body).issues?.[0]?.path).toBe('token');
    expect(await User.count({ where: { email: 'late@test.example.org' } })).toBe(0);
  });

  it('expires seven days after it was sent', async () => {
    const f = await roleFixture();
    await (await signedIn(f.people.owner.email)).post(groupPath(f.group.id, '/invitations'), { email: 'week@test.example.org', role: 'helper' }).expect(201);
    const row = await Invitation.findOne({ where: { email: 'week@test.example.org' } });
    expect((row!.expiresAt.getTime() - row!.createdAt.getTime()) / 86_400_000).toBeCloseTo(7, 2);
  });

  it('answers 404 for a token that was never sent, and 409 for an address that already has an account', async () => {
    const f = await roleFixture();
    await (await newClient()).post('/api/invitations/preview', { token: 'x'.repeat(43) }).expect(404);
    await createUser('has-account@test.example.org');
    const token = await inviteByMail(await signedIn(f.people.owner.email), f.group.id, 'has-account@test.example.org');
    const guest = await newClient();
    expect(invitationPreviewSchema.parse((await guest.post('/api/invitations/preview', { token })).body).hasAccount).toBe(true);
    const res = await guest.post('/api/invitations/accept', { token, name: 'Dup', password: 'pruning-saw-42' }).expect(409);
    expect(envelope(res.body).message).toMatch(/sign in first/);
    expect((await Invitation.findOne({ where: { email: 'has-account@test.example.org' } }))?.acceptedAt).toBeNull();
  });

  it('asks a signed-out person for a name and password', async () => {
    const f = await roleFixture();
    const token = await inviteByMail(await signedIn(f.people.owner.email), f.group.id, 'blank@test.example.org');
    const res = await (await newClient()).post('/api/invitations/accept', { token }).expect(400);
    expect(envelope(res.body).issues?.map((i) => i.path)).toEqual(['name', 'password']);
  });
});

describe('DELETE /api/groups/:groupId/invitations/:invitationId', () => {
  it('withdraws the invitation: its link answers 400 and it leaves the list', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    const token = await inviteByMail(owner, f.group.id, 'withdrawn@test.example.org');
    const [listed] = (await owner.get(groupPath(f.group.id, '/invitations')).expect(200)).body as { id: string }[];
    await owner.delete(groupPath(f.group.id, `/invitations/${listed!.id}`)).expect(204);
    await (await newClient()).post('/api/invitations/preview', { token }).expect(400);
    expect((await owner.get(groupPath(f.group.id, '/invitations')).expect(200)).body).toEqual([]);
  });
});
