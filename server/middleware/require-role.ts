import type { RequestHandler } from 'express';
import { forbidden, notFound } from '../lib/errors';
import { roleRank, type Role } from '../schemas/group';
import { groupParamsSchema } from '../schemas/group';
import { findMembership } from '../services/membership.service';
import { parseParams } from './validate';

/**
 * The one gate for everything under /api/groups/:groupId. Someone outside the group gets 404 (we do
 * not confirm the group exists); a member whose role is below `least` gets 403. On success
 * `req.membership` holds the caller's group and role for the service call.
 */
export function requireRole(least: Role): RequestHandler {
  return async (req, _res, next) => {
    const { groupId } = parseParams(req, groupParamsSchema.loose());
    const membership = req.user ? await findMembership(req.user.id, groupId) : null;
    if (!membership) throw notFound('Group');
    if (roleRank(membership.role) < roleRank(least)) throw forbidden(`This needs the ${least} role or above; you are a ${membership.role} here`);
    req.membership = membership;
    next();
  };
}
