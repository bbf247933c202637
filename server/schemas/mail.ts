import { z } from 'zod';

// What each kind of queued message carries; the worker renders the e-mail from it when it sends.
export const mailPayloadSchemas = {
  'password-reset': z.object({ name: z.string(), resetUrl: z.string().url(), expiresInMinutes: z.number() }),
} as const;

export type MailKind = keyof typeof mailPayloadSchemas;
export type MailPayload<K extends MailKind> = z.infer<(typeof mailPayloadSchemas)[K]>;
