import { Router, type RequestHandler } from 'express';
import { forbidden } from '../lib/errors';
import { requireAuth } from '../middleware/require-auth';
import { requireRole } from '../middleware/require-role';
import { allOperations, groupOperations } from '../services/operations.service';

// The operator view: last pass per site, queued and failed sends. A group's owner sees their group
// (under /api/groups/:groupId/operations); a server admin sees everything (/api/admin/operations).
export const groupOperationsRouter = Router({ mergeParams: true });

groupOperationsRouter.get('/', requireRole('owner'), async (req, res) => {
  res.json(await groupOperations(req.membership!.groupId));
});

const requireAdmin: RequestHandler = (req, _res, next) => {
  if (!req.user?.isAdmin) throw forbidden('Only a server operator may see this');
  next();
};

export const adminRouter = Router();
adminRouter.use(requireAuth, requireAdmin);

adminRouter.get('/operations', async (_req, res) => {
  res.json(await allOperations());
});
