import { shallowRef } from 'vue';
import type { ReminderPreferences, ReminderPreferencesUpdate } from '../../server/schemas/reminders';
import * as remindersApi from '../api/reminders';
import { useResource } from './use-resource';

/** The signed-in person's reminder settings: load, save, and a new calendar link. */
export function useReminderPreferences() {
  const resource = useResource(remindersApi.getReminderPreferences);
  const isRegenerating = shallowRef(false);

  async function save(body: ReminderPreferencesUpdate): Promise<ReminderPreferences> {
    const saved = await remindersApi.updateReminderPreferences(body);
    resource.data.value = saved;
    return saved;
  }

  async function regenerateCalendar(): Promise<void> {
    isRegenerating.value = true;
    try {
      const calendar = await remindersApi.regenerateCalendarFeed();
      if (resource.data.value) resource.data.value = { ...resource.data.value, calendar };
    } finally {
      isRegenerating.value = false;
    }
  }

  return { ...resource, isRegenerating, save, regenerateCalendar };
}
