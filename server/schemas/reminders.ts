import { z } from 'zod';
import { taskCodes, taskCodeSchema, taskLabels, type TaskCode } from './catalogue';
import { isoDateSchema } from './common';

// Reminder preferences, the calendar feed and the operator view: the API's contract for them.

// Reminders can be turned on and off per task, over the same task list the engine's rules use.
export const reminderTaskCodes = taskCodes;
export type ReminderTaskCode = TaskCode;
export const reminderTaskSchema = taskCodeSchema;
export const reminderTaskLabels = taskLabels;

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
