import type { Ref } from 'vue';
import type { Plant, PlantCreate, PlantList, PlantUpdate } from '../../server/schemas/plant';
import {
  archivePlant, createPlant, getPlant, listPlants, restorePlant, updatePlant, type PlantListParams,
} from '../api/plants';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

const emptyList: PlantList = { items: [], total: 0, page: 1, pageSize: 25 };

/** One page of the current group's plants for the given query; reloads on every query or group change. */
export function usePlantList(query: Readonly<Ref<PlantListParams>>) {
  const groups = useGroupsStore();
  return useResource<PlantList>(
    async () => (groups.currentGroupId ? listPlants(groups.currentGroupId, query.value) : emptyList),
    [() => groups.currentGroupId, query],
  );
}

export function usePlant(plantId: Readonly<Ref<string>>) {
  const groups = useGroupsStore();
  return useResource<Plant | null>(
    async () => (groups.currentGroupId ? getPlant(groups.currentGroupId, plantId.value) : null),
    [() => groups.currentGroupId, plantId],
  );
}

/** Writes for the current group's plants; views call these and then reload what they show. */
export function usePlantActions() {
  const groups = useGroupsStore();
  const groupId = (): string => {
    if (!groups.currentGroupId) throw new Error('Choose or create a group first.');
    return groups.currentGroupId;
  };
  return {
    create: (body: PlantCreate) => createPlant(groupId(), body),
    update: (plantId: string, body: PlantUpdate) => updatePlant(groupId(), plantId, body),
    archive: (plantId: string) => archivePlant(groupId(), plantId),
    restore: (plantId: string) => restorePlant(groupId(), plantId),
  };
}
