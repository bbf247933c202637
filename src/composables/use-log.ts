import { computed, type Ref } from 'vue';
import type { LogEntryCreate, LogList } from '../../server/schemas/log';
import type { PlantList } from '../../server/schemas/plant';
import { plantTypeLabels } from '../../server/schemas/catalogue';
import { listMembers, type Member } from '../api/groups';
import { addEntryPhoto, addPlantPhoto, createLogEntry, deleteLogEntry, deletePhoto, listLog, listPlantPhotos, type LogListParams } from '../api/log';
import { listPlants } from '../api/plants';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';
import { shrinkPhoto } from './use-photo-shrink';

const emptyLog: LogList = { items: [], total: 0, page: 1, pageSize: 25 };

/** One page of the current group's log for the given filters; reloads on every change. */
export function useLogList(query: Readonly<Ref<LogListParams>>) {
  const groups = useGroupsStore();
  return useResource<LogList>(
    async () => (groups.currentGroupId ? listLog(groups.currentGroupId, query.value) : emptyLog),
    [() => groups.currentGroupId, query],
  );
}

export interface PlantOption { id: string; label: string; siteId: string; siteName: string }

/** Every current plant of the group, for the log form's picker and the filters (200 is the API's page limit). */
export function useGroupPlants() {
  const groups = useGroupsStore();
  const resource = useResource<PlantList | null>(
    async () => (groups.currentGroupId ? listPlants(groups.currentGroupId, { pageSize: 200, sort: 'siteName' }) : null),
    [() => groups.currentGroupId],
  );
  const options = computed<PlantOption[]>(() => (resource.data.value?.items ?? []).map((p) => {
    const type = plantTypeLabels[p.typeCode];
    const name = p.cultivar ? (p.cultivar.toLowerCase().includes(type.toLowerCase()) ? p.cultivar : `${p.cultivar} ${type.toLowerCase()}`) : type;
    return { id: p.id, label: p.positionLabel ? `${name} · ${p.positionLabel}` : name, siteId: p.siteId, siteName: p.siteName };
  }));
  return { ...resource, options };
}

export function useMembers() {
  const groups = useGroupsStore();
  const resource = useResource<Member[]>(async () => (groups.currentGroupId ? listMembers(groups.currentGroupId) : []), [() => groups.currentGroupId]);
  return { ...resource, members: computed(() => resource.data.value ?? []) };
}

export function usePlantPhotos(plantId: Readonly<Ref<string>>) {
  const groups = useGroupsStore();
  return useResource(async () => (groups.currentGroupId ? listPlantPhotos(groups.currentGroupId, plantId.value) : []), [() => groups.currentGroupId, plantId]);
}

/** Writes to the current group's log; views call these and then reload what they show. */
export function useLogActions() {
  const groups = useGroupsStore();
  const groupId = (): string => {
    if (!groups.currentGroupId) throw new Error('Choose or create a group first.');
    return groups.currentGroupId;
  };
  return {
    create: (body: LogEntryCreate) => createLogEntry(groupId(), body),
    remove: (entryId: string) => deleteLogEntry(groupId(), entryId),
    addEntryPhoto: async (entryId: string, file: File) => addEntryPhoto(groupId(), entryId, await shrinkPhoto(file)),
    addPlantPhoto: async (plantId: string, file: File) => addPlantPhoto(groupId(), plantId, await shrinkPhoto(file)),
    removePhoto: (photoId: string) => deletePhoto(groupId(), photoId),
  };
}
