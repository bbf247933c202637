import { beforeEach, describe, expect, it } from 'vitest';
import { Membership } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { memberSchema, seasonWorkSchema } from '../../server/schemas/team';
import { addMember, createUser, resetDatabase, roleFixture, signedIn } from '../helpers/api';
import { feedBody, logPath, pruneBody } from '../helpers/log';
import { assign, groupPath, openFeedWindow, teamSnapshot } from '../helpers/team';

beforeEach(resetDatabase);

const envelope = (body: unknown) => errorEnvelopeSchema.parse(body).error;
const assignedTo = async (windowId: string) =>
  ((await Membership.sequelize!.query('SELECT assigned_to FROM care_windows WHERE id = $1', { bind: [windowId], type: 'SELECT' })) as { assigned_to: string | null }[])[0]!.assigned_to;

describe('PATCH /api/groups/:groupId/members/:userId', () => {
  it('lets the owner change a role and answers the member', async () => {
    const f = await roleFixture();
    const res = await (await signedIn(f.people.owner.email)).patch(groupPath(f.group.id, `/members/${f.people.viewer.id}`), { role: 'grower' }).expect(200);
    expect(memberSchema.parse(res.body)).toMatchObject({ userId: f.people.viewer.id, role: 'grower' });
  });

  it('answers 409 when the last owner would step down, and changes nothing', async () => {
    const f = await roleFixture();
    const before = await teamSnapshot();
    const res = await (await signedIn(f.people.owner.email)).patch(groupPath(f.group.id, `/members/${f.people.owner.id}`), { role: 'grower' }).expect(409);
    expect(envelope(res.body)).toMatchObject({ code: 'CONFLICT', message: 'A group needs at least one owner. Make someone else an owner first.' });
    expect(await teamSnapshot()).toBe(before);
  });

  it('lets an owner step down once there is another owner', async () => {
    const f = await roleFixture();
    const owner = await signedIn(f.people.owner.email);
    await owner.patch(groupPath(f.group.id, `/members/${f.people.grower.id}`), { role: 'owner' }).expect(200);
    await owner.patch(groupPath(f.group.id, `/members/${f.people.owner.id}`), { role: 'helper' }).expect(200);
    expect((await Membership.findOne({ where: { groupId: f.group.id, userId: f.people.owner.id } }))?.role).toBe('helper');
  });

  it('answers 404 for someone who is not in the group', async () => {
    const f = await roleFixture();
    await (await signedIn(f.people.owner.email)).patch(groupPath(f.group.id, `/members/${f.people.outsider.id}`), { role: 'helper' }).expect(404);
  });

  it('takes jobs back from someone made a viewer', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await assign(window, f.people.helper, f.people.owner);
    await (await signedIn(f.people.owner.email)).patch(groupPath(f.group.id, `/members/${f.people.helper.id}`), { role: 'viewer' }).expect(200);
    expect(await assignedTo(window.id)).toBeNull();
  });
});

describe('DELETE /api/groups/:groupId/members/:userId and /members/me', () => {
  it('lets the owner remove a member, whose jobs go back to the pool', async () => {
    const f = await roleFixture();
    const window = await openFeedWindow(f.plant);
    await assign(window, f.people.helper, f.people.owner);
    await (await signedIn(f.people.owner.email)).delete(groupPath(f.group.id, `/members/${f.people.helper.id}`)).expect(204);
    expect(await Membership.count({ where: { groupId: f.group.id, userId: f.people.helper.id } })).toBe(0);
    expect(await assignedTo(window.id)).toBeNull();
    await (await signedIn(f.people.helper.email)).get(groupPath(f.group.id)).expect(404);
  });

  it('lets anyone leave, but answers 409 to the last owner and keeps them', async () => {
    const f = await roleFixture();
    await (await signedIn(f.people.viewer.email)).delete(groupPath(f.group.id, '/members/me')).expect(204);
    const owner = await signedIn(f.people.owner.email);
    const res = await owner.delete(groupPath(f.group.id, '/members/me')).expect(409);
    expect(envelope(res.body).code).toBe('CONFLICT');
    expect(await Membership.count({ where: { groupId: f.group.id, role: 'owner' } })).toBe(1);
    const removeSelf = await owner.delete(groupPath(f.group.id, `/members/${f.people.owner.id}`)).expect(409);
    expect(envelope(removeSelf.body).message).toMatch(/at least one owner/);
  });

  it('lets one of two owners leave', async () => {
    const f = await roleFixture();
    const second = await createUser('second-owner@test.example.org');
    await addMember(f.group, second, 'owner');
    await (await signedIn(f.people.owner.email)).delete(groupPath(f.group.id, '/members/me')).expect(204);
    expect(await Membership.count({ where: { groupId: f.group.id, role: 'owner' } })).toBe(1);
  });
});

describe('GET /api/groups/:groupId/members/work', () => {
  it('counts the season’s log entries by person and kind, and lists them newest first', async () => {
    const f = await roleFixture();
    const helper = await signedIn(f.people.helper.email);
    await helper.post(logPath(f.group.id), feedBody([f.plant.id], { doneOn: '2026-03-10' })).expect(201);
    await helper.post(logPath(f.group.id), pruneBody([f.plant.id], '2026-07-20')).expect(201);
    await (await signedIn(f.people.grower.email)).post(logPath(f.group.id), feedBody([f.plant.id], { doneOn: '2026-03-12' })).expect(201);
    await helper.post(logPath(f.group.id), feedBody([f.plant.id], { doneOn: '2025-03-10' })).expect(201);
    const work = seasonWorkSchema.parse((await (await signedIn(f.people.owner.email)).get(groupPath(f.group.id, '/members/work?season=2026')).expect(200)).body);
    expect(work.people).toEqual([
      { userId: f.people.helper.id, name: 'helper', total: 2, byKind: { feed: 1, prune: 1 } },
      { userId: f.people.grower.id, name: 'grower', total: 1, byKind: { feed: 1 } },
    ]);
    expect(work.entries.map((e) => [e.date, e.kind, e.personName, e.plantNames])).toEqual([
      ['2026-07-20', 'prune', 'helper', ['Victoria plum']],
      ['2026-03-12', 'feed', 'grower', ['Victoria plum']],
      ['2026-03-10', 'feed', 'helper', ['Victoria plum']],
    ]);
  });
});
