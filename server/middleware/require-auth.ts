import type { RequestHandler } from 'express';
import { unauthenticated } from '../lib/errors';

export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) throw unauthenticated();
  next();
};
