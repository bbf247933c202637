import { z } from 'zod';
import { isoDateSchema } from './common';

// Reminder preferences, the calendar feed and the operator view: the API's contract for them.

/**
 * The care engine's task codes and their labels (server/care/catalogue.ts), repeated here because the
 * client imports schemas but never the engine; tests/api/reminder-preferences.test.ts checks that the
 * two lists agree.
 */
export const reminderTaskCodes = [
  'winter-prune', 'summer-prune', 'formative-prune', 'stone-fruit-prune', 'remedial-cut',
  'spring-feed', 'fruiting-feed', 'mulch', 'fruit-thinning', 'lateral-pinching', 'bunch-thinning',
  'leaf-picking', 'cane-cutting-out', 'tying-in', 'harvest',
] as const;
export type ReminderTaskCode = (typeof reminderTaskCodes)[number];
export const reminderTaskSchema = z.enum(reminderTaskCodes);

export const reminderTaskLabels: Record<ReminderTaskCode, string> = {
  'winter-prune': 'Winter pruning',
  'summer-prune': 'Summer pruning',
  'formative-prune': 'Shaping a young plant',
  'stone-fruit-prune': 'Pruning stone fruit (summer)',
  'remedial-cut': 'Cutting out dead or diseased wood',
  'spring-feed': 'Spring feed',
  'fruiting-feed': 'Feeding while fruiting',
  mulch: 'Mulching',
  'fruit-thinning': 'Thinning the fruit',
  'lateral-pinching': 'Pinching out side shoots',
  'bunch-thinning': 'Thinning bunches',
  'leaf-picking': 'Picking vine leaves',
  'cane-cutting-out': 'Cutting out old canes',
  'tying-in': 'Tying in new shoots',
  harvest: 'Picking the crop',
};

export const LEAD_DAYS_MAX = 21;
export const DEFAULT_LEAD_DAYS = 3;

export const calendarFeedSchema = z.object({ url: z.string(), createdAt: z.string() });
export type CalendarFeed = z.infer<typeof calendarFeedSchema>;

export const reminderPreferencesSchema = z.object({
  /** Off after a one-click unsubscribe; nothing is sent while it is off. */
  isEnabled: z.boolean(),
  leadDays: z.number(),
  tasks: z.array(reminderTaskSchema),
  isOpeningOn: z.boolean(),
  isClosingOn: z.boolean(),
  isWeeklyOn: z.boolean(),
  pausedUntil: z.string().nullable(),
  calendar: calendarFeedSchema.nullable(),
});
export type ReminderPreferences = z.infer<typeof reminderPreferencesSchema>;

export const reminderPreferencesUpdateSchema = z.object({
  isEnabled: z.boolean({ message: 'Choose on or off' }),
  leadDays: z.number({ message: 'Give a number of days' }).int('Use whole days').min(0, 'Use 0 or more days').max(LEAD_DAYS_MAX, `Use at most ${LEAD_DAYS_MAX} days`),
  tasks: z.array(reminderTaskSchema).max(reminderTaskCodes.length),
  isOpeningOn: z.boolean({ message: 'Choose on or off' }),
  isClosingOn: z.boolean({ message: 'Choose on or off' }),
  isWeeklyOn: z.boolean({ message: 'Choose on or off' }),
  pausedUntil: isoDateSchema.nullable(),
}).partial();
export type ReminderPreferencesUpdate = z.input<typeof reminderPreferencesUpdateSchema>;

// ---- Operator view ----

export const sitePassSchema = z.object({
  date: z.string(),
  status: z.enum(['done', 'failed']),
  finishedAt: z.string(),
  plants: z.number(),
  windowsWritten: z.number(),
  reminders: z.number(),
  error: z.string().nullable(),
});

export const operationsSiteSchema = z.object({
  siteId: z.string(),
  siteName: z.string(),
  groupId: z.string(),
  groupName: z.string(),
  timeZone: z.string(),
  lastPass: sitePassSchema.nullable(),
});

export const operationsMailSchema = z.object({
  id: z.string(),
  kind: z.string(),
  to: z.string(),
  status: z.enum(['pending', 'sending', 'sent', 'failed']),
  attempts: z.number(),
  nextAttemptAt: z.string(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type OperationsMail = z.infer<typeof operationsMailSchema>;

export const operationsSchema = z.object({
  sites: z.array(operationsSiteSchema),
  queued: z.array(operationsMailSchema),
  failed: z.array(operationsMailSchema),
  counts: z.object({ sites: z.number(), queued: z.number(), failed: z.number(), sentLastDay: z.number() }),
});
export type Operations = z.infer<typeof operationsSchema>;
export type OperationsSite = z.infer<typeof operationsSiteSchema>;
