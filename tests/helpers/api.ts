// Helpers for API tests: a supertest agent that carries a session and the CSRF token, and direct
// database set-up through the real models (never a mock of our own database).
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '../../server/app';
import { sequelize } from '../../server/db';
import { Group, Membership, Plant, Site, User } from '../../server/models';
import type { Role } from '../../server/schemas/group';
import { hashPassword } from '../../server/services/account.service';

let app: Express | null = null;
export const testApp = () => (app ??= createApp({ serveClient: false }));

export const PASSWORD = 'correct-horse-battery';

export interface Client {
  agent: ReturnType<typeof request.agent>;
  token: string;
  get(path: string): request.Test;
  post(path: string, body?: object | string): request.Test;
  patch(path: string, body?: object): request.Test;
  delete(path: string): request.Test;
}

/** A fresh browser-like client: its own cookie jar and CSRF token. */
export async function newClient(): Promise<Client> {
  const agent = request.agent(testApp());
  const { body } = await agent.get('/api/auth/csrf').expect(200);
  const token = body.token as string;
  return {
    agent,
    token,
    get: (path) => agent.get(path),
    post: (path, payload) => agent.post(path).set('x-csrf-token', token).send(payload as object),
    patch: (path, payload) => agent.patch(path).set('x-csrf-token', token).send(payload),
    delete: (path) => agent.delete(path).set('x-csrf-token', token),
  };
}

export async function createUser(email: string, name = email.split('@')[0]!): Promise<User> {
  return User.create({ email, name, passwordHash: await hashPassword(PASSWORD) });
}

export async function signedIn(email: string): Promise<Client> {
  const client = await newClient();
  await client.post('/api/auth/sign-in', { email, password: PASSWORD }).expect(200);
  return client;
}

export async function createGroup(name = 'Test orchard'): Promise<Group> {
  return Group.create({ name, kind: 'community-orchard' });
}

export async function addMember(group: Group, user: User, role: Role): Promise<void> {
  await Membership.create({ groupId: group.id, userId: user.id, role });
}

export async function createSite(group: Group, name = 'Top plot'): Promise<Site> {
  return Site.create({ groupId: group.id, name, latitude: 52.4, longitude: -1.9, elevationM: null, timeZone: 'Europe/London', hazards: [], notes: '', archivedAt: null });
}

export async function createPlant(group: Group, site: Site, cultivar = 'Victoria', typeCode: Plant['typeCode'] = 'plum'): Promise<Plant> {
  return Plant.create({
    groupId: group.id, siteId: site.id, typeCode, cultivar, rootstock: '', form: 'bush', plantedYear: 2015, heightM: 2.5,
    positionLabel: '', healthFlags: [], notes: '', archivedAt: null,
  });
}

/** Empties every table but the migration record, so each test starts from nothing. */
export async function resetDatabase(): Promise<void> {
  const [rows] = await sequelize.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'`);
  const tables = (rows as { tablename: string }[]).map((r) => `"${r.tablename}"`).join(', ');
  if (tables) await sequelize.query(`TRUNCATE ${tables} CASCADE`);
}

/** A group with one member of each role, plus an outsider in a group of their own. */
export async function roleFixture() {
  const group = await createGroup();
  const people = {} as Record<Role | 'outsider', User>;
  for (const role of ['owner', 'grower', 'helper', 'viewer'] as const) {
    people[role] = await createUser(`${role}@test.example.org`, role);
    await addMember(group, people[role], role);
  }
  people.outsider = await createUser('outsider@test.example.org', 'outsider');
  const otherGroup = await createGroup('Elsewhere');
  await addMember(otherGroup, people.outsider, 'owner');
  const site = await createSite(group);
  const plant = await createPlant(group, site);
  return { group, otherGroup, people, site, plant };
}
