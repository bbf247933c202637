import type { RequestHandler } from 'express';
import { AppError } from '../lib/errors';

export const apiNotFound: RequestHandler = (req) => {
  throw new AppError('NOT_FOUND', `No API route for ${req.method} ${req.path}`);
};
