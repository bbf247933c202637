import { Router, type Request } from 'express';
import { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { siteCreateSchema, siteListQuerySchema, siteUpdateSchema } from '../schemas/site';
import * as sites from '../services/site.service';
import { readingsRouter } from './readings.routes';
import { siteWeatherRouter } from './site-weather.routes';

export const sitesRouter = Router({ mergeParams: true });

const siteParams = z.object({ siteId: z.uuid({ message: 'Not a valid site id' }) }).loose();
const siteIdOf = (req: Request) => parseParams(req, siteParams).siteId;

sitesRouter.use('/:siteId/readings', readingsRouter);
sitesRouter.use('/:siteId/weather', siteWeatherRouter);

sitesRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await sites.listSites(req.membership!.groupId, parseQuery(req, siteListQuerySchema).includeArchived));
});

sitesRouter.post('/', requireRole('owner'), async (req, res) => {
  res.status(201).json(await sites.createSite(req.membership!.groupId, parseBody(req, siteCreateSchema)));
});

sitesRouter.get('/:siteId', requireRole('viewer'), async (req, res) => {
  res.json(await sites.getSite(req.membership!.groupId, siteIdOf(req)));
});

sitesRouter.patch('/:siteId', requireRole('owner'), async (req, res) => {
  res.json(await sites.updateSite(req.membership!.groupId, siteIdOf(req), parseBody(req, siteUpdateSchema)));
});

sitesRouter.post('/:siteId/archive', requireRole('owner'), async (req, res) => {
  res.json(await sites.setSiteArchived(req.membership!.groupId, siteIdOf(req), true));
});

sitesRouter.post('/:siteId/restore', requireRole('owner'), async (req, res) => {
  res.json(await sites.setSiteArchived(req.membership!.groupId, siteIdOf(req), false));
});

sitesRouter.delete('/:siteId', requireRole('owner'), async (req, res) => {
  await sites.deleteSite(req.membership!.groupId, siteIdOf(req));
  res.status(204).end();
});
