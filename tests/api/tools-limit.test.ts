import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { errorEnvelopeSchema } from '../../server/schemas/error';

describe('rate limit on the public tools', () => {
  it('answers 429 in the envelope once one address passes 120 calculations in a minute', async () => {
    const app = createApp({ serveClient: false });
    for (let i = 0; i < 120; i += 1) await request(app).post('/api/tools/ladder').send({ supportHeightM: 3 }).expect(200);
    const res = await request(app).post('/api/tools/ladder').send({ supportHeightM: 3 });
    expect(res.status).toBe(429);
    expect(errorEnvelopeSchema.parse(res.body).error.code).toBe('RATE_LIMITED');
  });
});
