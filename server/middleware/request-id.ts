import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';

// A caller may pass its own id (a load balancer, say) so one request can be followed across logs.
export const requestId: RequestHandler = (req, res, next) => {
  const incoming = req.get('x-request-id');
  const id = incoming && /^[\w.-]{1,100}$/.test(incoming) ? incoming : randomUUID();
  req.id = id;
  res.setHeader('x-request-id', id);
  next();
};
