import { Router } from 'express';
import { requireAuth } from '../middleware/require-auth';
import { requireRole } from '../middleware/require-role';
import { parseBody } from '../middleware/validate';
import { groupCreateSchema, groupUpdateSchema } from '../schemas/group';
import * as groups from '../services/group.service';
import { logRouter } from './log.routes';
import { groupInvitationsRouter } from './invitations.routes';
import { jobsRouter } from './jobs.routes';
import { membersRouter } from './members.routes';
import { groupOperationsRouter } from './operations.routes';
import { plantCsvRouter } from './plant-csv.routes';
import { photosRouter, plantPhotosRouter } from './photos.routes';
import { plantsRouter } from './plants.routes';
import { sitesRouter } from './sites.routes';
import { storeRouter } from './store.routes';

export const groupsRouter = Router();
groupsRouter.use(requireAuth);

groupsRouter.get('/', async (req, res) => {
  res.json(await groups.listGroupsFor(req.user!.id));
});

groupsRouter.post('/', async (req, res) => {
  res.status(201).json(await groups.createGroup(req.user!.id, parseBody(req, groupCreateSchema)));
});

groupsRouter.get('/:groupId', requireRole('viewer'), async (req, res) => {
  res.json(await groups.getGroup(req.membership!.groupId, req.membership!.role));
});

groupsRouter.patch('/:groupId', requireRole('owner'), async (req, res) => {
  res.json(await groups.updateGroup(req.membership!.groupId, req.membership!.role, parseBody(req, groupUpdateSchema)));
});

groupsRouter.get('/:groupId/members', requireRole('viewer'), async (req, res) => {
  res.json(await groups.listMembers(req.membership!.groupId));
});

groupsRouter.use('/:groupId/sites', sitesRouter);
groupsRouter.use('/:groupId/plants/:plantId/photos', plantPhotosRouter);
// Ahead of the plants router, so "csv" is never read as a plant id.
groupsRouter.use('/:groupId/plants/csv', plantCsvRouter);
groupsRouter.use('/:groupId/plants', plantsRouter);
groupsRouter.use('/:groupId/log', logRouter);
groupsRouter.use('/:groupId/photos', photosRouter);
groupsRouter.use('/:groupId/operations', groupOperationsRouter);
groupsRouter.use('/:groupId/members', membersRouter);
groupsRouter.use('/:groupId/invitations', groupInvitationsRouter);
groupsRouter.use('/:groupId/jobs', jobsRouter);
groupsRouter.use('/:groupId/store', storeRouter);
