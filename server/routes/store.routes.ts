import { Router, type Request } from 'express';
import { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { storeBatchCreateSchema, storeBatchUseSchema, storeListQuerySchema } from '../schemas/store';
import * as store from '../services/store.service';

// Mounted under /api/groups/:groupId/store. Storing produce and using it is work done, like the log:
// helpers and up. Deleting a batch entered by mistake is for growers and owners.
export const storeRouter = Router({ mergeParams: true });

const batchParams = z.object({ batchId: z.uuid({ message: 'Not a valid batch id' }) }).loose();
const batchIdOf = (req: Request) => parseParams(req, batchParams).batchId;

storeRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await store.listStore(req.membership!.groupId, parseQuery(req, storeListQuerySchema).includeUsed));
});

storeRouter.post('/', requireRole('helper'), async (req, res) => {
  res.status(201).json(await store.createBatch(req.membership!.groupId, req.user!.id, parseBody(req, storeBatchCreateSchema)));
});

storeRouter.put('/:batchId/used', requireRole('helper'), async (req, res) => {
  res.json(await store.setBatchUsed(req.membership!.groupId, req.user!.id, batchIdOf(req), parseBody(req, storeBatchUseSchema).usedOn));
});

storeRouter.delete('/:batchId', requireRole('grower'), async (req, res) => {
  await store.deleteBatch(req.membership!.groupId, batchIdOf(req));
  res.status(204).end();
});
