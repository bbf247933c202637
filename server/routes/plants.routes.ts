import { Router, type Request } from 'express';
import { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { plantCreateSchema, plantListQuerySchema, plantUpdateSchema } from '../schemas/plant';
import * as plants from '../services/plant.service';
import { plantWindowsRouter } from './plant-windows.routes';

export const plantsRouter = Router({ mergeParams: true });

const plantParams = z.object({ plantId: z.uuid({ message: 'Not a valid plant id' }) }).loose();
const plantIdOf = (req: Request) => parseParams(req, plantParams).plantId;

plantsRouter.use('/:plantId/windows', plantWindowsRouter);

plantsRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await plants.listPlants(req.membership!.groupId, parseQuery(req, plantListQuerySchema)));
});

plantsRouter.post('/', requireRole('grower'), async (req, res) => {
  res.status(201).json(await plants.createPlant(req.membership!.groupId, parseBody(req, plantCreateSchema)));
});

plantsRouter.get('/:plantId', requireRole('viewer'), async (req, res) => {
  res.json(await plants.getPlant(req.membership!.groupId, plantIdOf(req)));
});

plantsRouter.patch('/:plantId', requireRole('grower'), async (req, res) => {
  res.json(await plants.updatePlant(req.membership!.groupId, plantIdOf(req), parseBody(req, plantUpdateSchema)));
});

plantsRouter.post('/:plantId/archive', requireRole('grower'), async (req, res) => {
  res.json(await plants.setPlantArchived(req.membership!.groupId, plantIdOf(req), true));
});

plantsRouter.post('/:plantId/restore', requireRole('grower'), async (req, res) => {
  res.json(await plants.setPlantArchived(req.membership!.groupId, plantIdOf(req), false));
});

plantsRouter.delete('/:plantId', requireRole('owner'), async (req, res) => {
  await plants.deletePlant(req.membership!.groupId, plantIdOf(req));
  res.status(204).end();
});
