import { computed, type Ref } from 'vue';
import type { Site, SiteCreate, SiteUpdate } from '../../server/schemas/site';
import { archiveSite, createSite, getSite, listSites, restoreSite, updateSite } from '../api/sites';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

/** The current group's sites; reloads when the person switches group. */
export function useSites() {
  const groups = useGroupsStore();
  const resource = useResource<Site[]>(
    async () => (groups.currentGroupId ? listSites(groups.currentGroupId) : []),
    [() => groups.currentGroupId],
  );
  const sites = computed(() => resource.data.value ?? []);
  return { ...resource, sites };
}

export function useSite(siteId: Readonly<Ref<string>>) {
  const groups = useGroupsStore();
  return useResource<Site | null>(
    async () => (groups.currentGroupId ? getSite(groups.currentGroupId, siteId.value) : null),
    [() => groups.currentGroupId, siteId],
  );
}

/** Writes for the current group's sites (owners only; the server checks the role as well). */
export function useSiteActions() {
  const groups = useGroupsStore();
  const groupId = (): string => {
    if (!groups.currentGroupId) throw new Error('Choose or create a group first.');
    return groups.currentGroupId;
  };
  return {
    create: (body: SiteCreate) => createSite(groupId(), body),
    update: (siteId: string, body: SiteUpdate) => updateSite(groupId(), siteId, body),
    archive: (siteId: string) => archiveSite(groupId(), siteId),
    restore: (siteId: string) => restoreSite(groupId(), siteId),
  };
}
