import { Router, type NextFunction, type Request, type Response } from 'express';
import { config } from '../config';
import { unauthenticated } from '../lib/errors';
import { csrfToken } from '../middleware/csrf';
import { requireAuth } from '../middleware/require-auth';
import { passport } from '../middleware/session';
import { signInLimit } from '../middleware/sign-in-limit';
import { parseBody } from '../middleware/validate';
import { passwordChangeSchema, passwordResetRequestSchema, passwordResetSchema, registerSchema, signInSchema, type Person } from '../schemas/auth';
import * as accounts from '../services/account.service';

export const authRouter = Router();

// keepSessionInfo keeps the CSRF token across the session id change that signing in and out make,
// so a client can keep using the token it fetched first.
const logIn = (req: Request, person: Person) => new Promise<void>((resolve, reject) => req.login(person, { session: true, keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())));
const logOut = (req: Request) => new Promise<void>((resolve, reject) => req.logout({ keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())));

authRouter.get('/csrf', (req, res) => {
  res.json({ token: csrfToken(req) });
});

authRouter.post('/sign-in', ...signInLimit, (req: Request, res: Response, next: NextFunction) => {
  req.body = parseBody(req, signInSchema);
  passport.authenticate('local', { session: false }, (err: unknown, person: Person | false) => {
    if (err) return next(err);
    if (!person) return next(unauthenticated('That e-mail and password do not match an account'));
    logIn(req, person).then(() => res.json(person), next);
  })(req, res, next);
});

authRouter.post('/sign-out', async (req, res) => {
  await logOut(req);
  res.status(204).end();
});

authRouter.post('/register', async (req, res) => {
  const person = await accounts.register(parseBody(req, registerSchema));
  await logIn(req, person);
  res.status(201).json(person);
});

authRouter.get('/me', requireAuth, (req, res) => {
  res.json(req.user);
});

authRouter.post('/password', requireAuth, async (req, res) => {
  const input = parseBody(req, passwordChangeSchema);
  await accounts.changePassword(req.user!.id, input.currentPassword, input.newPassword);
  res.status(204).end();
});

authRouter.post('/password-reset/request', async (req, res) => {
  await accounts.requestPasswordReset(parseBody(req, passwordResetRequestSchema).email, config.APP_URL);
  res.status(202).json({ message: 'If an account exists for that address, a reset link is on its way' });
});

authRouter.post('/password-reset', async (req, res) => {
  const input = parseBody(req, passwordResetSchema);
  await accounts.resetPassword(input.token, input.newPassword);
  res.status(204).end();
});
