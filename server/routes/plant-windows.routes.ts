import { Router } from 'express';
import { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { parseParams, parseQuery } from '../middleware/validate';
import { plantWindowsQuerySchema } from '../schemas/windows';
import { plantWindows } from '../services/plant-windows.service';

// Mounted under /api/groups/:groupId/plants/:plantId/windows, so it needs the parent's params.
export const plantWindowsRouter = Router({ mergeParams: true });

const plantParams = z.object({ plantId: z.uuid({ message: 'Not a valid plant id' }) }).loose();

plantWindowsRouter.get('/', requireRole('viewer'), async (req, res) => {
  const { plantId } = parseParams(req, plantParams);
  res.json(await plantWindows(req.membership!.groupId, plantId, parseQuery(req, plantWindowsQuerySchema)));
});
