import type { LogEntry, LogEntryCreate, LogGuard, LogKind, LogList, Photo } from '../../server/schemas/log';
import type { SeasonReport } from '../../server/schemas/season-report';
import { http, type Query } from './http';
import { uploadFile, type UploadProgress } from './upload';

/** logListQuerySchema as the client sends it. */
export interface LogListParams {
  plantId?: string;
  siteId?: string;
  kind?: LogKind;
  personId?: string;
  from?: string;
  to?: string;
  page?: number;
  pageSize?: number;
}

const group = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}`;
const base = (groupId: string) => `${group(groupId)}/log`;

export const listLog = (groupId: string, query: LogListParams = {}) => http.get<LogList>(base(groupId), { ...query });

export const createLogEntry = (groupId: string, body: LogEntryCreate) => http.post<LogEntry>(base(groupId), body);

export const deleteLogEntry = (groupId: string, entryId: string) => http.delete(`${base(groupId)}/${encodeURIComponent(entryId)}`);

export const checkCut = (groupId: string, date: string, plantIds: string[]) =>
  http.get<LogGuard>(`${base(groupId)}/stone-fruit-check`, { date, plantIds: plantIds.join(',') });

/** A plain link: the browser downloads the file with the session cookie. */
export function logExportUrl(groupId: string, query: Omit<LogListParams, 'page' | 'pageSize'>): string {
  const params = new URLSearchParams(Object.entries(query as Query).filter(([, v]) => v !== undefined && v !== null && v !== '').map(([k, v]) => [k, String(v)]));
  const text = params.toString();
  return `${base(groupId)}/export.csv${text ? `?${text}` : ''}`;
}

export const getSeasonReport = (groupId: string, siteId: string, season?: number) => http.get<SeasonReport>(`${base(groupId)}/report`, { siteId, season });

export const addEntryPhoto = (groupId: string, entryId: string, file: File, onProgress?: UploadProgress) =>
  uploadFile<Photo>(`${base(groupId)}/${encodeURIComponent(entryId)}/photos`, file, {}, onProgress);

export const listPlantPhotos = (groupId: string, plantId: string) => http.get<Photo[]>(`${group(groupId)}/plants/${encodeURIComponent(plantId)}/photos`);

export const addPlantPhoto = (groupId: string, plantId: string, file: File, onProgress?: UploadProgress) =>
  uploadFile<Photo>(`${group(groupId)}/plants/${encodeURIComponent(plantId)}/photos`, file, {}, onProgress);

export const deletePhoto = (groupId: string, photoId: string) => http.delete(`${group(groupId)}/photos/${encodeURIComponent(photoId)}`);
