import { computed } from 'vue';
import type { Role } from '../../server/schemas/group';
import type { Invitation, InvitationCreate, Member } from '../../server/schemas/team';
import { listMembers } from '../api/groups';
import * as teamApi from '../api/team';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

/** The current group's people and, for those who may invite, the invitations still waiting. */
export function useMembers() {
  const groups = useGroupsStore();
  const canInvite = computed(() => groups.role === 'owner' || groups.role === 'grower');
  const members = useResource<Member[]>(async () => (groups.currentGroupId ? listMembers(groups.currentGroupId) : []), [() => groups.currentGroupId]);
  const invitations = useResource<Invitation[]>(
    async () => (groups.currentGroupId && canInvite.value ? teamApi.listInvitations(groups.currentGroupId) : []),
    [() => groups.currentGroupId, canInvite],
  );
  const groupId = (): string => {
    if (!groups.currentGroupId) throw new Error('Choose a group first.');
    return groups.currentGroupId;
  };
  return {
    members, invitations, canInvite,
    invite: (body: InvitationCreate) => teamApi.invite(groupId(), body),
    withdraw: (id: string) => teamApi.withdrawInvitation(groupId(), id),
    changeRole: (userId: string, role: Role) => teamApi.changeRole(groupId(), userId, role),
    remove: (userId: string) => teamApi.removeMember(groupId(), userId),
    leave: () => teamApi.leaveGroup(groupId()),
  };
}
