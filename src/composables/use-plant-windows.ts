import type { Ref } from 'vue';
import { getPlantWindows } from '../api/windows';
import type { Plant } from '../../server/schemas/plant';
import type { PlantWindow, PlantWindows } from '../../server/schemas/windows';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

export interface WindowLane {
  task: string;
  label: string;
  windows: PlantWindow[];
}

export interface YearOfWindows {
  /** The calendar year the lanes run across. */
  year: number;
  on: string;
  lanes: WindowLane[];
  /** The next window to open, even past the end of the year: December's answer to "what now?". */
  nextUp: PlantWindow | null;
  stoneFruitCheck: PlantWindows['stoneFruitCheck'];
  basisNote: string;
}

const overlapsYear = (w: PlantWindow, year: number) => w.opens <= `${year}-12-31` && w.closes >= `${year}-01-01`;

/**
 * A plant's windows across this calendar year. A season's winter work opens the autumn before
 * (and in the south a season runs July to June), so one season never fills a calendar year: this
 * asks for the seasons either side as well and keeps every window that touches the year. Next
 * winter's pruning then shows in November, where a grower looks for it.
 */
async function loadYear(groupId: string, plantId: string): Promise<YearOfWindows> {
  const current = await getPlantWindows(groupId, plantId);
  const year = Number(current.on.slice(0, 4));
  const others = await Promise.all(
    [year - 1, year, year + 1].filter((s) => s !== current.season).map((season) => getPlantWindows(groupId, plantId, { season, on: current.on })),
  );
  const byTask = new Map<string, WindowLane>();
  const fetched = [current, ...others].flatMap((answer) => answer.windows);
  const nextUp = fetched.filter((w) => w.state === 'upcoming').sort((a, b) => (a.opens < b.opens ? -1 : 1))[0] ?? null;
  const all = fetched.filter((w) => overlapsYear(w, year));
  for (const w of all.sort((a, b) => (a.opens < b.opens ? -1 : a.opens > b.opens ? 1 : 0))) {
    const lane = byTask.get(w.task) ?? { task: w.task, label: w.label, windows: [] };
    // The same window can come back from two seasons' answers only if the seasons overlap; skip twins.
    if (!lane.windows.some((x) => x.key === w.key && x.opens === w.opens)) lane.windows.push(w);
    byTask.set(w.task, lane);
  }
  return { year, on: current.on, lanes: [...byTask.values()], nextUp, stoneFruitCheck: current.stoneFruitCheck, basisNote: current.basisNote };
}

/** Reloads when the plant is saved too: a new form or health flag changes its windows. */
export function usePlantWindows(plant: Readonly<Ref<Pick<Plant, 'id' | 'updatedAt'>>>) {
  const groups = useGroupsStore();
  return useResource<YearOfWindows | null>(
    async () => (groups.currentGroupId ? loadYear(groups.currentGroupId, plant.value.id) : null),
    [() => groups.currentGroupId, () => plant.value.id, () => plant.value.updatedAt],
  );
}
