import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import type { z } from 'zod';
import { AppError, fromZodError, validationFailed } from '../lib/errors';

// One CSV file per request, held in memory and never written to disk: a refused or failed upload
// leaves nothing behind, and the web server stays stateless.

function describeLimit(bytes: number): string {
  return `${Math.round(bytes / (1024 * 1024))} MB`;
}

function toAppError(err: unknown, limitBytes: number): AppError {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new AppError('PAYLOAD_TOO_LARGE', `The file is larger than ${describeLimit(limitBytes)}. Split it into several files (a few years each) and upload them one by one.`, [{ path: 'file', message: `Larger than ${describeLimit(limitBytes)}` }]);
    if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') return validationFailed([{ path: 'file', message: 'Send one file, in the field named "file"' }], 'Send one CSV file at a time');
    return validationFailed([{ path: 'file', message: err.message }], 'The upload could not be read');
  }
  if (err instanceof AppError) return err;
  return validationFailed([{ path: 'file', message: 'The upload could not be read' }], 'The upload could not be read; try again');
}

/** multer for one file named `file`, with its errors turned into our envelope. */
export function singleFile(limitBytes: number): RequestHandler {
  const handler = multer({ storage: multer.memoryStorage(), limits: { fileSize: limitBytes, files: 1, fields: 5, fieldSize: 16_384 } }).single('file');
  return (req, res, next) => handler(req, res, (err: unknown) => next(err ? toAppError(err, limitBytes) : undefined));
}

export function uploadedFile(req: Request): Buffer {
  if (!req.file) throw validationFailed([{ path: 'file', message: 'Choose a CSV file to upload' }], 'Choose a CSV file to upload');
  return req.file.buffer;
}

/** The `options` text field beside the file: JSON, parsed with the shared schema. */
export function uploadOptions<S extends z.ZodType>(req: Request, schema: S): z.output<S> {
  const raw = (req.body as Record<string, unknown> | undefined)?.options;
  let value: unknown = {};
  if (typeof raw === 'string' && raw.trim() !== '') {
    try {
      value = JSON.parse(raw) as unknown;
    } catch {
      throw validationFailed([{ path: 'options', message: 'Not valid JSON' }], 'The upload options could not be read');
    }
  }
  const result = schema.safeParse(value);
  if (!result.success) throw fromZodError(result.error, 'options');
  return result.data;
}
