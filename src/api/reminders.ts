import type { CalendarFeed, Operations, ReminderPreferences, ReminderPreferencesUpdate } from '../../server/schemas/reminders';
import { http } from './http';

export const getReminderPreferences = () => http.get<ReminderPreferences>('/api/reminders/preferences');

export const updateReminderPreferences = (body: ReminderPreferencesUpdate) => http.patch<ReminderPreferences>('/api/reminders/preferences', body);

/** A new secret calendar link; the old one stops working. */
export const regenerateCalendarFeed = () => http.post<CalendarFeed>('/api/reminders/calendar');

export const getGroupOperations = (groupId: string) => http.get<Operations>(`/api/groups/${encodeURIComponent(groupId)}/operations`);

export const getAllOperations = () => http.get<Operations>('/api/admin/operations');
