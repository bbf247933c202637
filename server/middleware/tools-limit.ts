import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { AppError } from '../lib/errors';

// The public tools need no sign-in, so a generous per-address ceiling keeps one caller from hogging
// the server's CPU (a 1,000-day sine calculation is cheap, a flood of them is not).
export const toolsLimit = rateLimit({
  windowMs: 60_000,
  limit: 120,
  keyGenerator: (req) => ipKeyGenerator(req.ip ?? ''),
  handler: () => {
    throw new AppError('RATE_LIMITED', 'Too many calculations in a minute; wait a moment and try again');
  },
});
