import { beforeEach, describe, expect, it } from 'vitest';
import { Membership } from '../../server/models';
import { groupSchema } from '../../server/schemas/group';
import { addMember, createGroup, createUser, newClient, resetDatabase, signedIn } from '../helpers/api';

beforeEach(resetDatabase);

describe('POST /api/groups', () => {
  it('creates a group of the chosen kind with the creator as owner', async () => {
    const user = await createUser('founder@example.org');
    const client = await signedIn(user.email);
    const res = await client.post('/api/groups', { name: 'Riverside Plots', kind: 'allotment-society' });
    expect(res.status).toBe(201);
    const group = groupSchema.parse(res.body);
    expect(group).toMatchObject({ name: 'Riverside Plots', kind: 'allotment-society', role: 'owner' });
    expect((await Membership.findOne({ where: { groupId: group.id, userId: user.id } }))?.role).toBe('owner');
  });

  it('answers 400 for an unknown kind', async () => {
    const client = await signedIn((await createUser('k@example.org')).email);
    const res = await client.post('/api/groups', { name: 'X', kind: 'castle' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('kind');
  });

  it('answers 401 when signed out', async () => {
    const res = await (await newClient()).post('/api/groups', { name: 'X', kind: 'household' });
    expect(res.status).toBe(401);
  });
});

describe('GET /api/groups', () => {
  it('lists only the caller’s groups, each with the caller’s role', async () => {
    const me = await createUser('me@example.org');
    const home = await createGroup('Home garden');
    const society = await createGroup('Allotment society');
    await createGroup('Not mine');
    await addMember(home, me, 'owner');
    await addMember(society, me, 'helper');
    const res = await (await signedIn(me.email)).get('/api/groups').expect(200);
    const groups = groupSchema.array().parse(res.body);
    expect(groups.map((g) => [g.name, g.role])).toEqual([
      ['Allotment society', 'helper'],
      ['Home garden', 'owner'],
    ]);
  });
});

describe('GET /api/groups/:groupId', () => {
  it('answers 400 for a malformed group id', async () => {
    const client = await signedIn((await createUser('m@example.org')).email);
    const res = await client.get('/api/groups/not-a-uuid');
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('params.groupId');
  });
});
