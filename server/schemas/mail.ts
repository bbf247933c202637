import { z } from 'zod';

// The daily reminder digest carries facts, not finished text: the worker works out the cautions,
// ladder figures and daylight from them when it sends, with the care engine of that moment.
const digestSchema = z.object({
  name: z.string(),
  date: z.string(),
  appUrl: z.string().url(),
  preferencesUrl: z.string().url(),
  unsubscribeUrl: z.string().url(),
  sites: z.array(z.object({
    id: z.string(), name: z.string(), groupName: z.string(), latitude: z.number(), longitude: z.number(), timeZone: z.string(), hazards: z.array(z.string()),
  })),
  plants: z.array(z.object({
    id: z.string(), siteId: z.string(), typeCode: z.string(), cultivar: z.string(), form: z.string(), positionLabel: z.string(), heightM: z.number().nullable(),
  })),
  jobs: z.array(z.object({
    windowId: z.string(), plantId: z.string(), kind: z.enum(['opening', 'closing', 'assigned']), task: z.string(), opens: z.string(), closes: z.string(),
    basis: z.enum(['readings', 'projection', 'calendar']), reason: z.string(),
    degreeDays: z.object({ total: z.number(), baseC: z.number(), since: z.string(), reachedOn: z.string().nullable() }).nullable(),
  })),
  weekly: z.array(z.object({
    groupId: z.string(), groupName: z.string(), more: z.number(),
    jobs: z.array(z.object({ plantId: z.string(), task: z.string(), opens: z.string(), closes: z.string() })),
  })),
});

// What each kind of queued message carries; the worker renders the e-mail from it when it sends.
export const mailPayloadSchemas = {
  'password-reset': z.object({ name: z.string(), resetUrl: z.string().url(), expiresInMinutes: z.number() }),
  'reminder-digest': digestSchema,
  invitation: z.object({
    groupName: z.string(), inviterName: z.string(), role: z.enum(['owner', 'grower', 'helper', 'viewer']), acceptUrl: z.string().url(), expiresOn: z.string(),
  }),
  'store-expiry': z.object({
    name: z.string(), groupName: z.string(), what: z.string(), method: z.string(), quantity: z.string(), storedOn: z.string(), useBy: z.string(),
    storeUrl: z.string().url(), preferencesUrl: z.string().url(),
  }),
} as const;

export type MailKind = keyof typeof mailPayloadSchemas;
export type MailPayload<K extends MailKind> = z.infer<(typeof mailPayloadSchemas)[K]>;
