import { Router } from 'express';
import { isDatabaseUp } from '../db';

export const healthRouter = Router();

healthRouter.get('/', async (_req, res) => {
  const up = await isDatabaseUp();
  res.status(up ? 200 : 503).json({ status: up ? 'ok' : 'degraded', database: up ? 'up' : 'down' });
});
