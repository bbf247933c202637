import { computed, ref, type Ref } from 'vue';
import type { ReadingCreate, ReadingUpdate } from '../../server/schemas/readings';
import type { NormalsUpdate } from '../../server/schemas/weather';
import * as api from '../api/readings';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

export type ChartBase = 5 | 10;

/**
 * A site's weather for the site page: the season's chart data and the readings behind it. The
 * readings follow the season shown, from its first day to today (or its last day).
 */
export function useSiteWeather(siteId: Readonly<Ref<string>>) {
  const groups = useGroupsStore();
  const season = ref<number | undefined>(undefined);
  const base = ref<ChartBase>(5);
  const weather = useResource(
    async () => (groups.currentGroupId ? api.getWeather(groups.currentGroupId, siteId.value, { season: season.value, base: base.value }) : null),
    [() => groups.currentGroupId, siteId, season, base],
  );
  const range = computed(() => {
    const w = weather.data.value;
    return w && w.degreeDays.through >= w.start ? { from: w.start, to: w.degreeDays.through } : null;
  });
  const readings = useResource(
    async () => (groups.currentGroupId && range.value ? api.listReadings(groups.currentGroupId, siteId.value, range.value) : null),
    [() => groups.currentGroupId, siteId, () => range.value?.from, () => range.value?.to],
  );
  async function reload(): Promise<void> {
    await Promise.all([weather.reload(), readings.reload()]);
  }
  return { season, base, weather, readings, reload };
}

/** Writes to a site's weather (owners and growers: DESIGN.md §2; the server checks the role as well). */
export function useWeatherActions(siteId: Readonly<Ref<string>>) {
  const groups = useGroupsStore();
  const ids = (): [string, string] => {
    if (!groups.currentGroupId) throw new Error('Choose or create a group first.');
    return [groups.currentGroupId, siteId.value];
  };
  return {
    // Growers edit weather data as well as owners; the store's plant flag is exactly that pair of roles.
    canEdit: computed(() => groups.canEditPlants),
    create: (body: ReadingCreate) => api.createReading(...ids(), body),
    update: (date: string, body: ReadingUpdate) => api.updateReading(...ids(), date, body),
    remove: (date: string) => api.deleteReading(...ids(), date),
    pullStation: () => api.pullStation(...ids()),
    linkStation: (stationId: string | null) => api.linkStation(...ids(), stationId),
    saveNormals: (body: NormalsUpdate) => api.saveNormals(...ids(), body),
    computeNormals: () => api.computeNormals(...ids()),
    clearNormals: () => api.clearNormals(...ids()),
  };
}
