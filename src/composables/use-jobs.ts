import { computed } from 'vue';
import type { JobDone, JobList } from '../../server/schemas/team';
import type { Member } from '../../server/schemas/team';
import { listMembers } from '../api/groups';
import { assignJob, completeJob, listJobs } from '../api/team';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

/** "My jobs" and, for growers and owners, this week's open windows with the people who can take them. */
export function useJobs() {
  const groups = useGroupsStore();
  const canAssign = computed(() => groups.role === 'owner' || groups.role === 'grower');
  const jobs = useResource<JobList | null>(async () => (groups.currentGroupId ? listJobs(groups.currentGroupId) : null), [() => groups.currentGroupId]);
  const members = useResource<Member[]>(
    async () => (groups.currentGroupId && canAssign.value ? listMembers(groups.currentGroupId) : []),
    [() => groups.currentGroupId, canAssign],
  );
  // Viewers log no work, so they cannot be handed a job.
  const people = computed(() => (members.data.value ?? []).filter((m) => m.role !== 'viewer'));
  const groupId = (): string => {
    if (!groups.currentGroupId) throw new Error('Choose a group first.');
    return groups.currentGroupId;
  };
  return {
    jobs, people, canAssign,
    assign: (windowId: string, userId: string | null) => assignJob(groupId(), windowId, userId),
    complete: (windowId: string, body: JobDone) => completeJob(groupId(), windowId, body),
  };
}
