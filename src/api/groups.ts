import type { Group, GroupCreate, GroupUpdate, Role } from '../../server/schemas/group';
import { http } from './http';

/** Not in server/schemas yet; the shape is the one server/routes/README.md promises. */
export interface Member {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

const base = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}`;

export const listGroups = () => http.get<Group[]>('/api/groups');

export const createGroup = (body: GroupCreate) => http.post<Group>('/api/groups', body);

export const getGroup = (groupId: string) => http.get<Group>(base(groupId));

export const updateGroup = (groupId: string, body: GroupUpdate) => http.patch<Group>(base(groupId), body);

export const listMembers = (groupId: string) => http.get<Member[]>(`${base(groupId)}/members`);
