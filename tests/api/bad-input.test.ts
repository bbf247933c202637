import { describe, expect, it } from 'vitest';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { createUser, newClient, resetDatabase, signedIn } from '../helpers/api';

describe('bad input anywhere in the API', () => {
  it('answers malformed JSON with 400, not 500', async () => {
    const client = await newClient();
    const res = await client.agent.post('/api/auth/sign-in').set('x-csrf-token', client.token).set('content-type', 'application/json').send('{"email": "a@b.org",');
    expect(res.status).toBe(400);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('VALIDATION_FAILED');
  });

  it('answers an oversized body with 413 in the envelope', async () => {
    await resetDatabase();
    const client = await signedIn((await createUser('big@example.org')).email);
    const res = await client.post('/api/groups', { name: 'x', kind: 'household', padding: 'y'.repeat(400_000) });
    expect(res.status).toBe(413);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('PAYLOAD_TOO_LARGE');
  });

  it('answers an unknown API path with 404 in the envelope', async () => {
    const res = await (await newClient()).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('NOT_FOUND');
    expect(res.body.error.requestId).toBe(res.headers['x-request-id']);
  });
});

describe('GET /api/health', () => {
  it('reports that the database answers', async () => {
    const res = await (await newClient()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'up' });
  });
});
