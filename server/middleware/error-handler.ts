import type { ErrorRequestHandler } from 'express';
import { CareInputError } from '../care';
import { AppError } from '../lib/errors';
import type { ErrorEnvelope } from '../schemas/error';

interface HttpishError { status?: number; statusCode?: number; type?: string; code?: string }

// Errors from body-parser and csrf-sync arrive as plain errors with a status; give them our codes.
function translate(err: unknown): AppError | null {
  if (err instanceof AppError) return err;
  // The care engine's own input checks, for anything the zod schemas let through.
  if (err instanceof CareInputError) return new AppError('VALIDATION_FAILED', 'Some fields need attention', [{ path: err.path, message: err.message }]);
  const e = (err ?? {}) as HttpishError;
  if (e.type === 'entity.parse.failed') return new AppError('VALIDATION_FAILED', 'The request body is not valid JSON', [{ path: '(body)', message: 'Malformed JSON' }]);
  if (e.type === 'entity.too.large') return new AppError('PAYLOAD_TOO_LARGE', 'The request body is too large');
  if (e.code === 'EBADCSRFTOKEN') return new AppError('CSRF_FAILED', 'The security token is missing or stale; reload the page and try again');
  const status = e.status ?? e.statusCode;
  if (status === 415) return new AppError('VALIDATION_FAILED', 'Send the body as application/json');
  if (status && status >= 400 && status < 500) return new AppError('VALIDATION_FAILED', 'The request could not be read');
  return null;
}

// The only place that builds an error body. It must never throw itself.
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = translate(err);
  const body: ErrorEnvelope = known
    ? { error: { code: known.code, message: known.message, ...(known.issues ? { issues: known.issues } : {}), requestId: String(req.id) } }
    : { error: { code: 'INTERNAL', message: 'Something went wrong on our side; please try again', requestId: String(req.id) } };
  if (!known) req.log?.error({ err, requestId: req.id }, 'unhandled error');
  if (res.headersSent) return;
  res.status(known ? known.status : 500).json(body);
};
