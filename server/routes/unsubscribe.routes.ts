import { Router, type Response } from 'express';
import { z } from 'zod';
import { parseParams } from '../middleware/validate';
import { unsubscribe } from '../services/reminder-preferences.service';
import { unsubscribePage } from './unsubscribe-page';

// The link at the foot of every digest. One click (GET) turns reminders off and says so in a plain
// page; mail programs that offer their own button send a POST (RFC 8058). The signed token is the
// only key, so neither needs a session or a CSRF token.
export const unsubscribeRouter = Router();

const tokenParams = z.object({ token: z.string().max(200) });

async function answer(token: string, res: Response): Promise<void> {
  const person = await unsubscribe(token);
  res.status(person ? 200 : 404).set('Cache-Control', 'no-store').type('html').send(unsubscribePage(person));
}

unsubscribeRouter.get('/:token', (req, res) => answer(parseParams(req, tokenParams).token, res));
unsubscribeRouter.post('/:token', (req, res) => answer(parseParams(req, tokenParams).token, res));
