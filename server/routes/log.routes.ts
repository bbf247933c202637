import { Router, type Request } from 'express';
import { requireRole } from '../middleware/require-role';
import { photoFile, uploadedPhoto } from '../middleware/photo-upload';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { logEntryCreateSchema, logEntryParamsSchema, logGuardQuerySchema, logListQuerySchema } from '../schemas/log';
import { seasonReportQuerySchema } from '../schemas/season-report';
import { checkLogCut } from '../services/log-plants.service';
import { exportLogCsv } from '../services/log-export.service';
import * as log from '../services/log.service';
import { addPhoto } from '../services/photo.service';
import { seasonReport } from '../services/season-report.service';

// Mounted under /api/groups/:groupId/log. DESIGN.md §2: helpers and above log work; viewers read.
// Deleting an entry or adding photos to it is for its author or an owner (checked by the service).
export const logRouter = Router({ mergeParams: true });

const entryIdOf = (req: Request) => parseParams(req, logEntryParamsSchema).entryId;
const me = (req: Request) => ({ groupId: req.membership!.groupId, role: req.membership!.role, userId: req.user!.id });

logRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await log.listLog(me(req).groupId, parseQuery(req, logListQuerySchema)));
});

logRouter.get('/export.csv', requireRole('viewer'), async (req, res) => {
  const csv = await exportLogCsv(me(req).groupId, parseQuery(req, logListQuerySchema));
  res.setHeader('Content-Disposition', `attachment; filename="spurwood-log-${new Date().toISOString().slice(0, 10)}.csv"`);
  res.setHeader('Cache-Control', 'private, no-store');
  // The byte-order mark tells spreadsheet programs the file is UTF-8 (en dashes, degree signs).
  res.type('text/csv; charset=utf-8').send(`\uFEFF${csv}`);
});

logRouter.get('/stone-fruit-check', requireRole('viewer'), async (req, res) => {
  const q = parseQuery(req, logGuardQuerySchema);
  res.json(await checkLogCut(me(req).groupId, q.plantIds, q.date));
});

logRouter.get('/report', requireRole('viewer'), async (req, res) => {
  res.json(await seasonReport(me(req).groupId, parseQuery(req, seasonReportQuerySchema)));
});

logRouter.post('/', requireRole('helper'), async (req, res) => {
  const { groupId, userId, role } = me(req);
  res.status(201).json(await log.createLogEntry(groupId, userId, parseBody(req, logEntryCreateSchema), { role }));
});

logRouter.get('/:entryId', requireRole('viewer'), async (req, res) => {
  res.json(await log.getLogEntry(me(req).groupId, entryIdOf(req)));
});

logRouter.delete('/:entryId', requireRole('helper'), async (req, res) => {
  const { groupId, userId, role } = me(req);
  await log.deleteLogEntry(groupId, userId, role, entryIdOf(req));
  res.status(204).end();
});

// The role is checked before multer reads the file, so a refused upload is never held in memory.
logRouter.post('/:entryId/photos', requireRole('helper'), photoFile, async (req, res) => {
  const { groupId, userId, role } = me(req);
  res.status(201).json(await addPhoto(groupId, userId, role, { logEntryId: entryIdOf(req) }, uploadedPhoto(req)));
});
