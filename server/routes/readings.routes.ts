import { Router, type Request } from 'express';
import { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { singleFile, uploadedFile, uploadOptions } from '../middleware/upload';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import {
  readingCreateSchema, readingDateParamsSchema, readingListQuerySchema, readingUpdateSchema, UPLOAD_LIMIT_BYTES, uploadOptionsSchema,
} from '../schemas/readings';
import * as readings from '../services/readings.service';
import * as upload from '../services/reading-upload.service';
import { pullStationForSite } from '../services/station.service';

// Mounted under /api/groups/:groupId/sites/:siteId/readings. DESIGN.md §2: owners and growers edit
// weather data; helpers and viewers read it.
export const readingsRouter = Router({ mergeParams: true });

const siteParams = z.object({ siteId: z.uuid({ message: 'Not a valid site id' }) }).loose();
const siteIdOf = (req: Request) => parseParams(req, siteParams).siteId;
const dateOf = (req: Request) => parseParams(req, readingDateParamsSchema).date;
const file = singleFile(UPLOAD_LIMIT_BYTES);

readingsRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await readings.listReadings(req.membership!.groupId, siteIdOf(req), parseQuery(req, readingListQuerySchema)));
});

readingsRouter.post('/', requireRole('grower'), async (req, res) => {
  res.status(201).json(await readings.createReading(req.membership!.groupId, siteIdOf(req), parseBody(req, readingCreateSchema)));
});

// The role is checked before multer reads the file, so a refused upload is never held in memory.
readingsRouter.post('/upload/preview', requireRole('grower'), file, async (req, res) => {
  res.json(await upload.previewUpload(req.membership!.groupId, siteIdOf(req), uploadedFile(req), uploadOptions(req, uploadOptionsSchema)));
});

readingsRouter.post('/upload', requireRole('grower'), file, async (req, res) => {
  res.json(await upload.importUpload(req.membership!.groupId, siteIdOf(req), uploadedFile(req), uploadOptions(req, uploadOptionsSchema)));
});

readingsRouter.post('/station-pull', requireRole('grower'), async (req, res) => {
  res.json(await pullStationForSite(req.membership!.groupId, siteIdOf(req)));
});

readingsRouter.put('/:date', requireRole('grower'), async (req, res) => {
  res.json(await readings.updateReading(req.membership!.groupId, siteIdOf(req), dateOf(req), parseBody(req, readingUpdateSchema)));
});

readingsRouter.delete('/:date', requireRole('grower'), async (req, res) => {
  await readings.deleteReading(req.membership!.groupId, siteIdOf(req), dateOf(req));
  res.status(204).end();
});
