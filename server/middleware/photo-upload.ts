import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { AppError, validationFailed } from '../lib/errors';
import { PHOTO_LIMIT_BYTES } from '../schemas/photos';

// One photo per request, held in memory: nothing reaches the disk until the photo service has
// checked what the bytes are, so a refused upload leaves no file behind.

const megabytes = Math.round(PHOTO_LIMIT_BYTES / (1024 * 1024));

function toAppError(err: unknown): AppError {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new AppError('PAYLOAD_TOO_LARGE', `The photo is larger than ${megabytes} MB. Take it again at a lower size, or share a smaller copy.`, [{ path: 'file', message: `Larger than ${megabytes} MB` }]);
    if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') return validationFailed([{ path: 'file', message: 'Send one photo, in the field named "file"' }], 'Send one photo at a time');
    return validationFailed([{ path: 'file', message: err.message }], 'The photo could not be read');
  }
  if (err instanceof AppError) return err;
  return validationFailed([{ path: 'file', message: 'The upload could not be read' }], 'The photo could not be read; try again');
}

const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_LIMIT_BYTES, files: 1, fields: 2, fieldSize: 1024 } }).single('file');

export const photoFile: RequestHandler = (req, res, next) => handler(req, res, (err: unknown) => next(err ? toAppError(err) : undefined));

export function uploadedPhoto(req: Request): Buffer {
  if (!req.file || req.file.size === 0) throw validationFailed([{ path: 'file', message: 'Choose a photo to upload' }], 'Choose a photo to upload');
  return req.file.buffer;
}
