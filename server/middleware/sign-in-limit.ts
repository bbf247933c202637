import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { config } from '../config';
import { AppError } from '../lib/errors';

const WINDOW_MS = 15 * 60 * 1000;

const tooMany = () => {
  throw new AppError('RATE_LIMITED', 'Too many sign-in attempts; wait 15 minutes and try again');
};

const emailOf = (body: unknown) => (typeof body === 'object' && body && 'email' in body ? String(body.email).trim().toLowerCase() : '');

/**
 * Failed sign-ins are counted per account-and-address and, more loosely, per address alone, so one
 * person mistyping is slowed down without a guesser being able to try many accounts from one place.
 * Counts live in this process's memory; behind a load balancer each server counts its own share.
 */
export const signInLimit = [
  rateLimit({
    windowMs: WINDOW_MS,
    limit: config.SIGN_IN_LIMIT,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `${emailOf(req.body)}|${ipKeyGenerator(req.ip ?? '')}`,
    handler: tooMany,
  }),
  rateLimit({
    windowMs: WINDOW_MS,
    limit: config.SIGN_IN_LIMIT * 5,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
    handler: tooMany,
  }),
];
