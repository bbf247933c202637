import { forbidden, notFound, validationFailed } from '../lib/errors';
import { detectImageType, filePath, makeThumbnail, randomName, removeFiles, writeFile } from '../lib/photo-files';
import { logger } from '../lib/logger';
import { LogEntry, Photo, Plant } from '../models';
import type { Role } from '../schemas/group';
import type { Photo as PhotoDto } from '../schemas/log';
import { sequelize } from '../db';
import { namesOf, toPhoto } from './log-read.service';

// Photos of plants and of log entries. Order of work for an upload: check the bytes, make the
// thumbnail, write the files, then the row in a transaction; if the row fails the files go again,
// so a failed upload leaves neither a row nor a file.

export type PhotoTarget = { plantId: string } | { logEntryId: string };

async function assertTarget(groupId: string, userId: string, role: Role, target: PhotoTarget): Promise<void> {
  if ('plantId' in target) {
    if (!(await Plant.findOne({ where: { id: target.plantId, groupId }, attributes: ['id'] }))) throw notFound('Plant');
    return;
  }
  const entry = await LogEntry.findOne({ where: { id: target.logEntryId, groupId }, attributes: ['id', 'recordedBy'] });
  if (!entry) throw notFound('Log entry');
  if (entry.recordedBy !== userId && role !== 'owner') throw forbidden('Only the person who recorded this entry, or an owner, may add photos to it');
}

async function thumbnailOf(bytes: Buffer, type: string): Promise<Buffer | null> {
  // jimp reads JPEG and PNG without any native code; a WebP photo is shown scaled down by the browser instead.
  if (type === 'image/webp') return null;
  try {
    return await makeThumbnail(bytes);
  } catch {
    throw validationFailed([{ path: 'file', message: 'The photo is damaged or not a whole image' }], 'The photo could not be read');
  }
}

export async function addPhoto(groupId: string, userId: string, role: Role, target: PhotoTarget, bytes: Buffer): Promise<PhotoDto> {
  const contentType = detectImageType(bytes);
  if (!contentType) throw validationFailed([{ path: 'file', message: 'Send a JPEG, PNG or WebP photo' }], 'That file is not a JPEG, PNG or WebP photo');
  await assertTarget(groupId, userId, role, target);
  const thumb = await thumbnailOf(bytes, contentType);
  const fileName = randomName();
  const thumbName = thumb ? `${randomName()}-thumb` : null;
  try {
    await writeFile(groupId, fileName, bytes);
    if (thumb && thumbName) await writeFile(groupId, thumbName, thumb);
    const photo = await sequelize.transaction((t) => Photo.create({
      groupId, plantId: 'plantId' in target ? target.plantId : null, logEntryId: 'logEntryId' in target ? target.logEntryId : null,
      fileName, thumbName, contentType, byteSize: bytes.length, uploadedBy: userId,
    }, { transaction: t }));
    return toPhoto(photo, await namesOf([userId]));
  } catch (err) {
    await removeFiles(groupId, [fileName, thumbName]);
    throw err;
  }
}

export async function listPlantPhotos(groupId: string, plantId: string): Promise<PhotoDto[]> {
  if (!(await Plant.findOne({ where: { id: plantId, groupId }, attributes: ['id'] }))) throw notFound('Plant');
  const photos = await Photo.findAll({ where: { groupId, plantId }, order: [['createdAt', 'DESC']] });
  const names = await namesOf(photos.map((p) => p.uploadedBy));
  return photos.map((p) => toPhoto(p, names));
}

/** Where a member's browser gets the bytes from; the thumbnail falls back to the photo itself. */
export async function photoFile(groupId: string, photoId: string, size: 'full' | 'thumb'): Promise<{ path: string; contentType: string }> {
  const photo = await Photo.findOne({ where: { id: photoId, groupId } });
  if (!photo) throw notFound('Photo');
  const useThumb = size === 'thumb' && photo.thumbName;
  return { path: filePath(groupId, useThumb ? photo.thumbName! : photo.fileName), contentType: useThumb ? 'image/jpeg' : photo.contentType };
}

export async function deletePhoto(groupId: string, userId: string, role: Role, photoId: string): Promise<void> {
  const photo = await Photo.findOne({ where: { id: photoId, groupId } });
  if (!photo) throw notFound('Photo');
  if (photo.uploadedBy !== userId && role !== 'owner') throw forbidden('Only the person who added this photo, or an owner, may delete it');
  await photo.destroy();
  await removePhotoFiles([photo]);
}

/** After the rows are gone; a file that will not go is logged, never a reason to fail the request. */
export async function removePhotoFiles(photos: Pick<Photo, 'groupId' | 'fileName' | 'thumbName'>[]): Promise<void> {
  for (const p of photos) {
    await removeFiles(p.groupId, [p.fileName, p.thumbName]).catch((err: unknown) => logger.warn({ err }, 'could not remove a photo file'));
  }
}
