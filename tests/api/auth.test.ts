import { beforeEach, describe, expect, it } from 'vitest';
import { PasswordResetToken, User } from '../../server/models';
import { personSchema } from '../../server/schemas/auth';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { createUser, newClient, PASSWORD, resetDatabase, signedIn } from '../helpers/api';
import { deliverQueuedMail, mailTo } from '../helpers/mail';

beforeEach(resetDatabase);

describe('GET /api/auth/csrf', () => {
  it('returns a token', async () => {
    const client = await newClient();
    expect(client.token).toMatch(/^\S{16,}$/);
  });
});

describe('CSRF protection', () => {
  it('refuses a state-changing request without the token with 403', async () => {
    const client = await newClient();
    const res = await client.agent.post('/api/auth/register').send({ email: 'a@example.org', password: 'long-enough-pw', name: 'A' });
    expect(res.status).toBe(403);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('CSRF_FAILED');
    expect(await User.count()).toBe(0);
  });

  it('keeps the same token valid after signing in and out', async () => {
    await createUser('kept@example.org');
    const client = await newClient();
    await client.post('/api/auth/sign-in', { email: 'kept@example.org', password: PASSWORD }).expect(200);
    await client.post('/api/groups', { name: 'After sign-in', kind: 'household' }).expect(201);
    await client.post('/api/auth/sign-out').expect(204);
    await client.post('/api/auth/sign-in', { email: 'kept@example.org', password: PASSWORD }).expect(200);
  });
});

describe('POST /api/auth/register', () => {
  it('creates the account, signs it in and answers 201 without the password hash', async () => {
    const client = await newClient();
    const res = await client.post('/api/auth/register', { email: 'New@Example.org', password: 'pruning-saw-42', name: 'Nell' });
    expect(res.status).toBe(201);
    const person = personSchema.parse(res.body);
    expect(person.email).toBe('new@example.org');
    expect(JSON.stringify(res.body)).not.toMatch(/hash|\$2[aby]\$/);
    await client.get('/api/auth/me').expect(200);
    const stored = await User.findOne({ where: { email: 'new@example.org' } });
    expect(stored?.passwordHash).toMatch(/^\$2[aby]\$/);
  });

  it('answers 409 when the e-mail is taken', async () => {
    await createUser('taken@example.org');
    const client = await newClient();
    const res = await client.post('/api/auth/register', { email: 'taken@example.org', password: 'pruning-saw-42', name: 'X' });
    expect(res.status).toBe(409);
    expect(res.body.error.issues[0].path).toBe('email');
  });

  it('answers 400 naming each bad field', async () => {
    const client = await newClient();
    const res = await client.post('/api/auth/register', { email: 'not-an-email', password: 'short', name: '' });
    expect(res.status).toBe(400);
    const paths = errorEnvelopeSchema.parse(res.body).error.issues!.map((i) => i.path).sort();
    expect(paths).toEqual(['email', 'name', 'password']);
  });

  it('never writes an unknown field such as isAdmin', async () => {
    const client = await newClient();
    await client.post('/api/auth/register', { email: 'sneaky@example.org', password: 'pruning-saw-42', name: 'S', isAdmin: true }).expect(201);
    expect((await User.findOne({ where: { email: 'sneaky@example.org' } }))?.isAdmin).toBe(false);
  });
});

describe('POST /api/auth/sign-in', () => {
  it('answers 200 with the person for the right password', async () => {
    await createUser('grower@example.org');
    const client = await newClient();
    const res = await client.post('/api/auth/sign-in', { email: 'grower@example.org', password: PASSWORD });
    expect(res.status).toBe(200);
    expect(personSchema.parse(res.body).email).toBe('grower@example.org');
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('answers 401 in the error envelope for a wrong password or an unknown account', async () => {
    await createUser('grower@example.org');
    const client = await newClient();
    for (const email of ['grower@example.org', 'nobody@example.org']) {
      const res = await client.post('/api/auth/sign-in', { email, password: 'wrong-password' });
      expect(res.status).toBe(401);
      expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('UNAUTHENTICATED');
    }
    await client.get('/api/auth/me').expect(401);
  });

  it('answers 429 after too many failed attempts for one account from one address', async () => {
    await createUser('target@example.org');
    const client = await newClient();
    for (let i = 0; i < 10; i += 1) await client.post('/api/auth/sign-in', { email: 'target@example.org', password: `guess-${i}` }).expect(401);
    const res = await client.post('/api/auth/sign-in', { email: 'target@example.org', password: PASSWORD });
    expect(res.status).toBe(429);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('RATE_LIMITED');
    // Another account from the same address is not locked out by one person's typos.
    await createUser('other@example.org');
    await client.post('/api/auth/sign-in', { email: 'other@example.org', password: PASSWORD }).expect(200);
  });
});

describe('GET /api/auth/me', () => {
  it('answers 401 when signed out', async () => {
    const res = await (await newClient()).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });
});

describe('POST /api/auth/sign-out', () => {
  it('ends the session', async () => {
    await createUser('leaving@example.org');
    const client = await signedIn('leaving@example.org');
    await client.post('/api/auth/sign-out').expect(204);
    await client.get('/api/auth/me').expect(401);
  });
});

describe('POST /api/auth/password', () => {
  it('changes the password when the current one is right', async () => {
    await createUser('change@example.org');
    const client = await signedIn('change@example.org');
    await client.post('/api/auth/password', { currentPassword: PASSWORD, newPassword: 'a-brand-new-one' }).expect(204);
    const fresh = await newClient();
    await fresh.post('/api/auth/sign-in', { email: 'change@example.org', password: 'a-brand-new-one' }).expect(200);
  });

  it('answers 400 on the currentPassword field when it is wrong, and keeps the old password', async () => {
    const user = await createUser('keep@example.org');
    const client = await signedIn('keep@example.org');
    const res = await client.post('/api/auth/password', { currentPassword: 'nope-nope-nope', newPassword: 'a-brand-new-one' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('currentPassword');
    expect((await User.findByPk(user.id))?.passwordHash).toBe(user.passwordHash);
  });
});

describe('password reset', () => {
  const resetLink = async (email: string) => {
    await deliverQueuedMail();
    const [mail] = await mailTo(email);
    expect(mail?.subject).toBe('Reset your Spurwood password');
    return new URL(mail!.text.match(/http\S+reset-password\?token=\S+/)![0]).searchParams.get('token')!;
  };

  it('sends a message through the outbox whose single-use token sets a new password', async () => {
    await createUser('forgetful@example.org');
    const client = await newClient();
    await client.post('/api/auth/password-reset/request', { email: 'forgetful@example.org' }).expect(202);
    const token = await resetLink('forgetful@example.org');
    await client.post('/api/auth/password-reset', { token, newPassword: 'remembered-now' }).expect(204);
    await client.post('/api/auth/sign-in', { email: 'forgetful@example.org', password: 'remembered-now' }).expect(200);

    const again = await client.post('/api/auth/password-reset', { token, newPassword: 'second-go-at-it' });
    expect(again.status).toBe(400);
    expect(again.body.error.issues[0].path).toBe('token');
  });

  it('refuses a token older than one hour', async () => {
    await createUser('slow@example.org');
    const client = await newClient();
    await client.post('/api/auth/password-reset/request', { email: 'slow@example.org' }).expect(202);
    const token = await resetLink('slow@example.org');
    await PasswordResetToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: {} });
    const res = await client.post('/api/auth/password-reset', { token, newPassword: 'too-late-for-this' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('token');
  });

  it('answers 202 for an unknown address and queues nothing', async () => {
    const client = await newClient();
    await client.post('/api/auth/password-reset/request', { email: 'ghost@example.org' }).expect(202);
    expect((await deliverQueuedMail()).claimed).toBe(0);
    expect(await PasswordResetToken.count()).toBe(0);
  });
});
