import { z } from 'zod';

/** The one error envelope of the API (DESIGN.md §4, STYLE.md "Errors"). */
export const errorCodes = {
  VALIDATION_FAILED: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  CSRF_FAILED: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  PAYLOAD_TOO_LARGE: 413,
  UNPROCESSABLE: 422,
  RATE_LIMITED: 429,
  INTERNAL: 500,
  UNAVAILABLE: 503,
} as const;
export type ErrorCode = keyof typeof errorCodes;

export const errorIssueSchema = z.object({ path: z.string(), message: z.string() });
export type ErrorIssue = z.infer<typeof errorIssueSchema>;

export const errorEnvelopeSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    issues: z.array(errorIssueSchema).optional(),
    requestId: z.string().optional(),
  }),
});
export type ErrorEnvelope = z.infer<typeof errorEnvelopeSchema>;
