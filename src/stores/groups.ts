import { defineStore } from 'pinia';
import { computed, ref, watch } from 'vue';
import type { Group, GroupCreate } from '../../server/schemas/group';
import * as groupsApi from '../api/groups';
import { storageKeys } from '../config';

function readStoredId(): string | null {
  try {
    return localStorage.getItem(storageKeys.currentGroupId);
  } catch {
    return null; // Private browsing can refuse storage; the first group is a fine fallback.
  }
}

export const useGroupsStore = defineStore('groups', () => {
  const groups = ref<Group[]>([]);
  const isLoaded = ref(false);
  const loadError = ref<unknown>(null);
  const preferredId = ref<string | null>(readStoredId());
  let loading: Promise<void> | null = null;

  // A stored id from another person or a group left since falls back to the first group.
  const currentGroup = computed<Group | null>(
    () => groups.value.find((g) => g.id === preferredId.value) ?? groups.value[0] ?? null,
  );
  const currentGroupId = computed(() => currentGroup.value?.id ?? null);
  const role = computed(() => currentGroup.value?.role ?? null);
  const hasGroups = computed(() => groups.value.length > 0);
  const canEditPlants = computed(() => role.value === 'grower' || role.value === 'owner');
  const canEditSites = computed(() => role.value === 'owner');

  watch(preferredId, (id) => {
    try {
      if (id) localStorage.setItem(storageKeys.currentGroupId, id);
    } catch {
      // Storage refused: the choice lasts for this visit only, which is acceptable.
    }
  });

  async function load(): Promise<void> {
    try {
      groups.value = await groupsApi.listGroups();
      loadError.value = null;
      isLoaded.value = true;
    } catch (err) {
      loadError.value = err;
    } finally {
      loading = null;
    }
  }

  function ensureLoaded(): Promise<void> {
    if (isLoaded.value) return Promise.resolve();
    loading ??= load();
    return loading;
  }

  async function create(body: GroupCreate): Promise<Group> {
    const group = await groupsApi.createGroup(body);
    groups.value = [...groups.value, group];
    preferredId.value = group.id;
    return group;
  }

  function switchTo(groupId: string): void {
    if (groups.value.some((g) => g.id === groupId)) preferredId.value = groupId;
  }

  function clear(): void {
    groups.value = [];
    isLoaded.value = false;
    loadError.value = null;
  }

  return {
    groups, isLoaded, loadError, currentGroup, currentGroupId, role, hasGroups, canEditPlants, canEditSites,
    load, ensureLoaded, create, switchTo, clear,
  };
});
