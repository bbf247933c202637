import { Router, type Request } from 'express';
import { z } from 'zod';
import { notFound } from '../lib/errors';
import { requireRole } from '../middleware/require-role';
import { photoFile as photoUpload, uploadedPhoto } from '../middleware/photo-upload';
import { parseParams, parseQuery } from '../middleware/validate';
import { photoParamsSchema, photoQuerySchema } from '../schemas/photos';
import * as photos from '../services/photo.service';

// Photos: /api/groups/:groupId/photos/:photoId serves the bytes to members only, and
// /api/groups/:groupId/plants/:plantId/photos lists and adds a plant's own photos.
export const photosRouter = Router({ mergeParams: true });
export const plantPhotosRouter = Router({ mergeParams: true });

const plantIdOf = (req: Request) => parseParams(req, z.object({ plantId: z.uuid({ message: 'Not a valid plant id' }) }).loose()).plantId;
const photoIdOf = (req: Request) => parseParams(req, photoParamsSchema).photoId;

photosRouter.get('/:photoId', requireRole('viewer'), async (req, res, next) => {
  const file = await photos.photoFile(req.membership!.groupId, photoIdOf(req), parseQuery(req, photoQuerySchema).size);
  // "private": a shared cache must never keep a group's photo; the browser may, for a day (ids never change).
  const headers = { 'Content-Type': file.contentType, 'Cache-Control': 'private, max-age=86400', 'Content-Disposition': 'inline', 'X-Content-Type-Options': 'nosniff' };
  res.sendFile(file.path, { headers, cacheControl: false, lastModified: false }, (err) => {
    if (err && !res.headersSent) next(notFound('Photo'));
  });
});

photosRouter.delete('/:photoId', requireRole('helper'), async (req, res) => {
  await photos.deletePhoto(req.membership!.groupId, req.user!.id, req.membership!.role, photoIdOf(req));
  res.status(204).end();
});

plantPhotosRouter.get('/', requireRole('viewer'), async (req, res) => {
  res.json(await photos.listPlantPhotos(req.membership!.groupId, plantIdOf(req)));
});

plantPhotosRouter.post('/', requireRole('helper'), photoUpload, async (req, res) => {
  res.status(201).json(await photos.addPhoto(req.membership!.groupId, req.user!.id, req.membership!.role, { plantId: plantIdOf(req) }, uploadedPhoto(req)));
});
