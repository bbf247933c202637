import { beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase, signedIn } from '../helpers/api';
import { groupPath, teamFixture, teamSnapshot, today } from '../helpers/team';
import { members as all, roleMatrix, type MatrixAction } from '../helpers/role-matrix';

// DESIGN.md §2 for the team, jobs, store and CSV endpoints: owners do everything; growers invite
// helpers, hand out jobs and import plants; helpers log work (tick off their jobs, store produce);
// viewers only look. An outsider gets 404 and learns nothing. A refused call writes nothing.
type Fixture = Awaited<ReturnType<typeof teamFixture>>;

const csv = (f: Fixture) => ({ csv: `site,type,form\n${f.site.name},apple,cordon\n` });
const g = (f: Fixture, rest: string) => groupPath(f.group.id, rest);

const actions: MatrixAction<Fixture>[] = [
  { name: 'list invitations', allowed: ['owner', 'grower'], call: (c, f) => c.get(g(f, '/invitations')) },
  { name: 'invite a helper', allowed: ['owner', 'grower'], call: (c, f) => c.post(g(f, '/invitations'), { email: 'someone@test.example.org', role: 'helper' }) },
  { name: 'invite a grower', allowed: ['owner'], call: (c, f) => c.post(g(f, '/invitations'), { email: 'someone@test.example.org', role: 'grower' }) },
  { name: 'withdraw an invitation', allowed: ['owner', 'grower'], call: (c, f) => c.delete(g(f, `/invitations/${f.invitation.id}`)) },
  { name: 'change a role', allowed: ['owner'], call: (c, f) => c.patch(g(f, `/members/${f.people.viewer.id}`), { role: 'helper' }) },
  { name: 'remove a member', allowed: ['owner'], call: (c, f) => c.delete(g(f, `/members/${f.people.grower.id}`)) },
  { name: 'see who did what', allowed: ['owner'], call: (c, f) => c.get(g(f, '/members/work')) },
  { name: 'list jobs', allowed: all, call: (c, f) => c.get(g(f, '/jobs')) },
  { name: 'hand out a job', allowed: ['owner', 'grower'], call: (c, f) => c.agent.put(g(f, `/jobs/${f.window.id}/assignee`)).set('x-csrf-token', c.token).send({ userId: f.people.grower.id }) },
  {
    name: 'tick off the helper’s job', allowed: ['owner', 'grower', 'helper'],
    call: (c, f) => c.post(g(f, `/jobs/${f.window.id}/done`), { date: today(), details: { product: 'Growmore', amount: 140, unit: 'g' } }),
  },
  { name: 'list the store', allowed: all, call: (c, f) => c.get(g(f, '/store')) },
  {
    name: 'store a batch', allowed: ['owner', 'grower', 'helper'],
    call: (c, f) => c.post(g(f, '/store'), { item: 'apples', quantity: 2, unit: 'kg', method: 'frozen', storedOn: today(), plantIds: [f.plant.id] }),
  },
  { name: 'mark a batch used', allowed: ['owner', 'grower', 'helper'], call: (c, f) => c.agent.put(g(f, `/store/${f.batch.id}/used`)).set('x-csrf-token', c.token).send({ usedOn: today() }) },
  { name: 'delete a batch', allowed: ['owner', 'grower'], call: (c, f) => c.delete(g(f, `/store/${f.batch.id}`)) },
  { name: 'export plants as CSV', allowed: all, call: (c, f) => c.get(g(f, '/plants/csv')) },
  { name: 'preview a plant CSV', allowed: ['owner', 'grower'], call: (c, f) => c.post(g(f, '/plants/csv/preview'), csv(f)) },
  { name: 'import a plant CSV', allowed: ['owner', 'grower'], call: (c, f) => c.post(g(f, '/plants/csv/import'), csv(f)) },
];

beforeEach(resetDatabase);

describe('role × action matrix for the team, jobs, store and plant CSV', () => {
  roleMatrix(actions, teamFixture, () => teamSnapshot());

  it('leave: a viewer, helper or grower may leave; an outsider gets 404', async () => {
    for (const who of ['viewer', 'helper', 'grower'] as const) {
      await resetDatabase();
      const f = await teamFixture();
      await (await signedIn(f.people[who].email)).delete(g(f, '/members/me')).expect(204);
    }
    await resetDatabase();
    const f = await teamFixture();
    const before = await teamSnapshot();
    await (await signedIn(f.people.outsider.email)).delete(g(f, '/members/me')).expect(404);
    expect(await teamSnapshot()).toBe(before);
  });
});
