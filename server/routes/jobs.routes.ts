import { Router, type Request } from 'express';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams } from '../middleware/validate';
import { assignmentSchema, jobDoneSchema, windowParamsSchema } from '../schemas/team';
import { completeJob } from '../services/job-done.service';
import * as jobs from '../services/job.service';

// Mounted under /api/groups/:groupId/jobs. A job is a care window; growers and owners hand them out.
export const jobsRouter = Router({ mergeParams: true });

const windowIdOf = (req: Request) => parseParams(req, windowParamsSchema).windowId;

jobsRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await jobs.listJobs(req.membership!.groupId, req.user!.id, req.membership!.role));
});

jobsRouter.put('/:windowId/assignee', requireRole('grower'), async (req, res) => {
  res.json(await jobs.assignJob(req.membership!.groupId, req.user!.id, windowIdOf(req), parseBody(req, assignmentSchema).userId));
});

// Helpers tick off jobs handed to them; growers and owners any job (the service checks which).
jobsRouter.post('/:windowId/done', requireRole('helper'), async (req, res) => {
  res.status(201).json(await completeJob(req.membership!.groupId, req.user!.id, req.membership!.role, windowIdOf(req), parseBody(req, jobDoneSchema)));
});
