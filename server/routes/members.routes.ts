import { Router, type Request } from 'express';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { memberParamsSchema, memberRoleSchema, seasonQuerySchema } from '../schemas/team';
import * as members from '../services/member.service';
import { seasonWork } from '../services/season-work.service';

// Mounted under /api/groups/:groupId/members, beside the member list in groups.routes.ts. Owners
// change roles and remove people; anyone may leave, except the last owner (409).
export const membersRouter = Router({ mergeParams: true });

const userIdOf = (req: Request) => parseParams(req, memberParamsSchema).userId;

// Owners see who has done what over the season, from the work log.
membersRouter.get('/work', requireRole('owner'), async (req, res) => {
  res.json(await seasonWork(req.membership!.groupId, parseQuery(req, seasonQuerySchema).season));
});

membersRouter.delete('/me', requireRole('viewer'), async (req, res) => {
  await members.removeMember(req.membership!.groupId, req.user!.id);
  res.status(204).end();
});

membersRouter.patch('/:userId', requireRole('owner'), async (req, res) => {
  res.json(await members.changeRole(req.membership!.groupId, userIdOf(req), parseBody(req, memberRoleSchema).role));
});

membersRouter.delete('/:userId', requireRole('owner'), async (req, res) => {
  await members.removeMember(req.membership!.groupId, userIdOf(req));
  res.status(204).end();
});
