import type { ZodError } from 'zod';
import { errorCodes, type ErrorCode, type ErrorIssue } from '../schemas/error';

/** An error the API answers with on purpose; the error handler turns it into the envelope. */
export class AppError extends Error {
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: ErrorIssue[],
  ) {
    super(message);
    this.status = errorCodes[code];
  }
}

export const notFound = (what: string) => new AppError('NOT_FOUND', `${what} was not found`);
export const forbidden = (message = 'Your role in this group does not allow that') => new AppError('FORBIDDEN', message);
export const unauthenticated = (message = 'Sign in first') => new AppError('UNAUTHENTICATED', message);
export const conflict = (message: string, issues?: ErrorIssue[]) => new AppError('CONFLICT', message, issues);

export function validationFailed(issues: ErrorIssue[], message = 'Some fields need attention'): AppError {
  return new AppError('VALIDATION_FAILED', message, issues);
}

export function fromZodError(error: ZodError, prefix = ''): AppError {
  const issues = error.issues.map((issue) => ({
    path: [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '(body)',
    message: issue.message,
  }));
  return validationFailed(issues);
}
