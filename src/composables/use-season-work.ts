import type { SeasonWork } from '../../server/schemas/team';
import { seasonWork } from '../api/team';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

/** Owners only: the season's work by person. Others get null and no request. */
export function useSeasonWork() {
  const groups = useGroupsStore();
  return useResource<SeasonWork | null>(
    async () => (groups.currentGroupId && groups.role === 'owner' ? seasonWork(groups.currentGroupId) : null),
    [() => groups.currentGroupId, () => groups.role],
  );
}
