import type { z } from 'zod';
import { config } from '../config';
import { sequelize } from '../db';
import { calendarToken, newCalendarNonce, readUnsubscribeToken, sha256Hex } from '../lib/signed-tokens';
import { OutboxMessage, ReminderPreference, User } from '../models';
import {
  DEFAULT_LEAD_DAYS, reminderTaskCodes,
  type CalendarFeed, type ReminderPreferences, type reminderPreferencesUpdateSchema,
} from '../schemas/reminders';

type Update = z.output<typeof reminderPreferencesUpdateSchema>;

// A person's own reminder settings. Every call is keyed by the signed-in person's id, so nobody can
// read or change anyone else's; a person who never saved anything has the defaults.

const calendarUrl = (userId: string, nonce: string) => `${config.APP_URL}/api/calendar/${calendarToken(userId, nonce)}.ics`;

function toPreferences(userId: string, row: ReminderPreference | null): ReminderPreferences {
  const tasks = row?.tasks;
  return {
    isEnabled: row?.isEnabled ?? true,
    leadDays: row?.leadDays ?? DEFAULT_LEAD_DAYS,
    tasks: tasks ? reminderTaskCodes.filter((t) => tasks.includes(t)) : [...reminderTaskCodes],
    isOpeningOn: row?.isOpeningOn ?? true,
    isClosingOn: row?.isClosingOn ?? true,
    isWeeklyOn: row?.isWeeklyOn ?? true,
    pausedUntil: row?.pausedUntil ?? null,
    calendar: row?.calendarNonce && row.calendarCreatedAt ? { url: calendarUrl(userId, row.calendarNonce), createdAt: row.calendarCreatedAt.toISOString() } : null,
  };
}

const blankRow = (userId: string) => ({ userId, tasks: null, pausedUntil: null, calendarTokenHash: null, calendarNonce: null, calendarCreatedAt: null });

export async function getPreferences(userId: string): Promise<ReminderPreferences> {
  return toPreferences(userId, await ReminderPreference.findByPk(userId));
}

export async function updatePreferences(userId: string, input: Update): Promise<ReminderPreferences> {
  const values: Partial<ReminderPreference> = {};
  if (input.isEnabled !== undefined) values.isEnabled = input.isEnabled;
  if (input.leadDays !== undefined) values.leadDays = input.leadDays;
  if (input.isOpeningOn !== undefined) values.isOpeningOn = input.isOpeningOn;
  if (input.isClosingOn !== undefined) values.isClosingOn = input.isClosingOn;
  if (input.isWeeklyOn !== undefined) values.isWeeklyOn = input.isWeeklyOn;
  if (input.pausedUntil !== undefined) values.pausedUntil = input.pausedUntil;
  // Every task ticked is stored as "all", so a task added to the catalogue later is included too.
  if (input.tasks !== undefined) values.tasks = reminderTaskCodes.every((t) => input.tasks!.includes(t)) ? null : [...new Set(input.tasks)];
  const row = await sequelize.transaction(async (transaction) => {
    const [found] = await ReminderPreference.findOrCreate({ where: { userId }, defaults: blankRow(userId), transaction });
    return found.update(values, { transaction });
  });
  return toPreferences(userId, row);
}

/** A new secret link for the calendar feed; the old one stops working at once. */
export async function regenerateCalendar(userId: string): Promise<CalendarFeed> {
  const nonce = newCalendarNonce();
  const row = await sequelize.transaction(async (transaction) => {
    const [found] = await ReminderPreference.findOrCreate({ where: { userId }, defaults: blankRow(userId), transaction });
    return found.update({ calendarNonce: nonce, calendarTokenHash: sha256Hex(calendarToken(userId, nonce)), calendarCreatedAt: new Date() }, { transaction });
  });
  return { url: calendarUrl(userId, nonce), createdAt: row.calendarCreatedAt!.toISOString() };
}

/**
 * The one-click unsubscribe: reminders off, and any digest still waiting in the outbox withdrawn.
 * Answers the person's name, or null for a token we did not sign.
 */
export async function unsubscribe(token: string): Promise<{ name: string } | null> {
  const userId = readUnsubscribeToken(token);
  const user = userId ? await User.findByPk(userId, { attributes: ['id', 'name', 'email'] }) : null;
  if (!user) return null;
  await sequelize.transaction(async (transaction) => {
    const [found] = await ReminderPreference.findOrCreate({ where: { userId: user.id }, defaults: blankRow(user.id), transaction });
    await found.update({ isEnabled: false }, { transaction });
    await OutboxMessage.update(
      { status: 'failed', lastError: 'Withdrawn: the person turned reminders off' },
      { where: { kind: 'reminder-digest', toAddress: user.email, status: 'pending' }, transaction },
    );
  });
  return { name: user.name };
}
