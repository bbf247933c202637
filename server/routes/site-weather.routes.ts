import { Router, type Request } from 'express';
import { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { normalsUpdateSchema, stationLinkSchema, weatherQuerySchema } from '../schemas/weather';
import * as normals from '../services/site-normals.service';
import { siteWeather } from '../services/site-weather.service';
import { linkStation } from '../services/station.service';

// Mounted under /api/groups/:groupId/sites/:siteId/weather: the season's chart data, the site's
// monthly normals and its station link. Owners and growers change them (DESIGN.md §2).
export const siteWeatherRouter = Router({ mergeParams: true });

const siteParams = z.object({ siteId: z.uuid({ message: 'Not a valid site id' }) }).loose();
const siteIdOf = (req: Request) => parseParams(req, siteParams).siteId;

siteWeatherRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await siteWeather(req.membership!.groupId, siteIdOf(req), parseQuery(req, weatherQuerySchema)));
});

siteWeatherRouter.get('/normals', requireRole('viewer'), async (req, res) => {
  res.json(await normals.getNormals(req.membership!.groupId, siteIdOf(req)));
});

siteWeatherRouter.put('/normals', requireRole('grower'), async (req, res) => {
  res.json(await normals.saveNormals(req.membership!.groupId, siteIdOf(req), parseBody(req, normalsUpdateSchema)));
});

siteWeatherRouter.post('/normals/compute', requireRole('grower'), async (req, res) => {
  res.json(await normals.computeNormals(req.membership!.groupId, siteIdOf(req)));
});

siteWeatherRouter.delete('/normals', requireRole('grower'), async (req, res) => {
  res.json(await normals.clearNormals(req.membership!.groupId, siteIdOf(req)));
});

siteWeatherRouter.put('/station', requireRole('grower'), async (req, res) => {
  res.json(await linkStation(req.membership!.groupId, siteIdOf(req), parseBody(req, stationLinkSchema).stationId));
});
