import { expect, it } from 'vitest';
import type { User } from '../../server/models';
import { errorEnvelopeSchema } from '../../server/schemas/error';
import { signedIn, type Client } from './api';

export type Who = 'owner' | 'grower' | 'helper' | 'viewer' | 'outsider';
export const members = ['owner', 'grower', 'helper', 'viewer'] as const;

export interface MatrixAction<F> {
  name: string;
  allowed: readonly Who[];
  call: (client: Client, f: F) => Promise<{ status: number; body?: unknown }>;
}

/**
 * One test per action and person: an allowed call succeeds; a member whose role is too low gets
 * 403, someone outside the group 404, and a refused call changes nothing `snapshot` can see.
 */
export function roleMatrix<F extends { people: Record<Who, User> }>(
  actions: readonly MatrixAction<F>[],
  fixture: () => Promise<F>,
  snapshot: (f: F) => Promise<string>,
): void {
  for (const action of actions) {
    for (const who of [...members, 'outsider'] as const) {
      const allowed = action.allowed.includes(who);
      it(`${action.name}: ${who} ${allowed ? 'is allowed' : who === 'outsider' ? 'answers 404' : 'answers 403'}`, async () => {
        const f = await fixture();
        const client = await signedIn(f.people[who].email);
        const before = await snapshot(f);
        const res = await action.call(client, f);
        if (allowed) {
          expect(res.status, JSON.stringify(res.body)).toBeLessThan(300);
          return;
        }
        expect(res.status).toBe(who === 'outsider' ? 404 : 403);
        expect(errorEnvelopeSchema.parse(res.body).error.code).toBe(who === 'outsider' ? 'NOT_FOUND' : 'FORBIDDEN');
        expect(await snapshot(f)).toBe(before);
      });
    }
  }
}
