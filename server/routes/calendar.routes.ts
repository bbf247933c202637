import { Router } from 'express';
import { z } from 'zod';
import { parseParams } from '../middleware/validate';
import { calendarFeed } from '../services/calendar-feed.service';

// Public: the secret token in the path is the only key, so no session or CSRF token is involved.
export const calendarRouter = Router();

const feedParams = z.object({ token: z.string().max(100) });

calendarRouter.get('/:token.ics', async (req, res) => {
  const ics = await calendarFeed(parseParams(req, feedParams).token);
  res.set({ 'Content-Type': 'text/calendar; charset=utf-8', 'Cache-Control': 'private, max-age=900', 'Referrer-Policy': 'no-referrer' }).send(ics);
});
