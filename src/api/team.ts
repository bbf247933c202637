import type { Role } from '../../server/schemas/group';
import type { LogEntry } from '../../server/schemas/log';
import type {
  Invitation, InvitationAccept, InvitationAccepted, InvitationCreate, InvitationPreview, Job, JobDone, JobList, Member, SeasonWork,
} from '../../server/schemas/team';
import { http } from './http';

const base = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}`;

export const changeRole = (groupId: string, userId: string, role: Role) => http.patch<Member>(`${base(groupId)}/members/${encodeURIComponent(userId)}`, { role });
export const removeMember = (groupId: string, userId: string) => http.delete(`${base(groupId)}/members/${encodeURIComponent(userId)}`);
export const leaveGroup = (groupId: string) => http.delete(`${base(groupId)}/members/me`);
export const seasonWork = (groupId: string, season?: number) => http.get<SeasonWork>(`${base(groupId)}/members/work`, { season });

export const listInvitations = (groupId: string) => http.get<Invitation[]>(`${base(groupId)}/invitations`);
export const invite = (groupId: string, body: InvitationCreate) => http.post<Invitation>(`${base(groupId)}/invitations`, body);
export const withdrawInvitation = (groupId: string, id: string) => http.delete(`${base(groupId)}/invitations/${encodeURIComponent(id)}`);

// The link's token travels in the body so it never lands in a request log.
export const previewInvitation = (token: string) => http.post<InvitationPreview>('/api/invitations/preview', { token }, { isUnauthenticatedExpected: true });
export const acceptInvitation = (token: string, body: InvitationAccept = {}) =>
  http.post<InvitationAccepted>('/api/invitations/accept', { token, ...body }, { isUnauthenticatedExpected: true });

export const listJobs = (groupId: string) => http.get<JobList>(`${base(groupId)}/jobs`);
export const assignJob = (groupId: string, windowId: string, userId: string | null) => http.put<Job>(`${base(groupId)}/jobs/${encodeURIComponent(windowId)}/assignee`, { userId });
export const completeJob = (groupId: string, windowId: string, body: JobDone) => http.post<LogEntry>(`${base(groupId)}/jobs/${encodeURIComponent(windowId)}/done`, body);
