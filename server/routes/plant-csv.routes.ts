import { Router } from 'express';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseQuery } from '../middleware/validate';
import { plantCsvExportQuerySchema, plantCsvUploadSchema } from '../schemas/plant-csv';
import * as plantCsv from '../services/plant-csv.service';

// Mounted under /api/groups/:groupId/plants/csv, ahead of the plants router so "csv" is never read
// as a plant id. Everyone in the group may export; growers and owners import (DESIGN.md §2).
export const plantCsvRouter = Router({ mergeParams: true });

plantCsvRouter.get('/', requireRole('viewer'), async (req, res) => {
  const csv = await plantCsv.exportPlantCsv(req.membership!.groupId, parseQuery(req, plantCsvExportQuerySchema).includeArchived);
  res.setHeader('Content-Disposition', `attachment; filename="spurwood-plants-${new Date().toISOString().slice(0, 10)}.csv"`);
  res.setHeader('Cache-Control', 'private, no-store');
  res.type('text/csv; charset=utf-8').send(csv);
});

plantCsvRouter.post('/preview', requireRole('grower'), async (req, res) => {
  res.json(await plantCsv.previewPlantCsv(req.membership!.groupId, parseBody(req, plantCsvUploadSchema).csv));
});

plantCsvRouter.post('/import', requireRole('grower'), async (req, res) => {
  res.status(201).json(await plantCsv.importPlantCsv(req.membership!.groupId, parseBody(req, plantCsvUploadSchema).csv));
});
