import { Router, type Request } from 'express';
import { z } from 'zod';
import { config } from '../config';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams } from '../middleware/validate';
import type { Person } from '../schemas/auth';
import { invitationAcceptSchema, invitationCreateSchema, invitationTokenSchema } from '../schemas/team';
import * as invitations from '../services/invitation.service';

// A group's invitations, under /api/groups/:groupId/invitations: owners invite anyone, growers invite
// helpers (the service checks the role asked for).
export const groupInvitationsRouter = Router({ mergeParams: true });

const invitationParams = z.object({ invitationId: z.uuid({ message: 'Not a valid invitation id' }) }).loose();
const actorOf = (req: Request) => ({ userId: req.user!.id, role: req.membership!.role });

groupInvitationsRouter.get('/', requireRole('grower'), async (req, res) => {
  res.json(await invitations.listInvitations(req.membership!.groupId));
});

groupInvitationsRouter.post('/', requireRole('grower'), async (req, res) => {
  res.status(201).json(await invitations.createInvitation(req.membership!.groupId, actorOf(req), parseBody(req, invitationCreateSchema), config.APP_URL));
});

groupInvitationsRouter.delete('/:invitationId', requireRole('grower'), async (req, res) => {
  await invitations.revokeInvitation(req.membership!.groupId, actorOf(req), parseParams(req, invitationParams).invitationId);
  res.status(204).end();
});

// The invitation link's own API, under /api/invitations, for signed-in and signed-out people alike.
// The token travels in the body, not the path, so it never lands in the request log.
export const invitationLinkRouter = Router();

const logIn = (req: Request, person: Person) => new Promise<void>((resolve, reject) => req.login(person, { session: true, keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())));

invitationLinkRouter.post('/preview', async (req, res) => {
  res.json(await invitations.previewInvitation(parseBody(req, invitationTokenSchema).token));
});

invitationLinkRouter.post('/accept', async (req, res) => {
  const { token, ...input } = parseBody(req, invitationTokenSchema.extend(invitationAcceptSchema.shape));
  const { person, accepted } = await invitations.acceptInvitation(token, req.user?.id ?? null, input);
  if (!req.user) await logIn(req, person);
  res.json(accepted);
});
