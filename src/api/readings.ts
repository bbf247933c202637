import type { Reading, ReadingCreate, ReadingList, ReadingUpdate, UploadOptions, UploadPreview, UploadResult } from '../../server/schemas/readings';
import type { NormalsUpdate, SiteNormals, SiteWeather, StationPull } from '../../server/schemas/weather';
import { http } from './http';
import { uploadFile, type UploadProgress } from './upload';

const site = (groupId: string, siteId: string) => `/api/groups/${encodeURIComponent(groupId)}/sites/${encodeURIComponent(siteId)}`;
const readings = (groupId: string, siteId: string) => `${site(groupId, siteId)}/readings`;
const weather = (groupId: string, siteId: string) => `${site(groupId, siteId)}/weather`;

export const listReadings = (groupId: string, siteId: string, range: { from?: string; to?: string } = {}) =>
  http.get<ReadingList>(readings(groupId, siteId), range);

export const createReading = (groupId: string, siteId: string, body: ReadingCreate) => http.post<Reading>(readings(groupId, siteId), body);

export const updateReading = (groupId: string, siteId: string, date: string, body: ReadingUpdate) =>
  http.put<Reading>(`${readings(groupId, siteId)}/${date}`, body);

export const deleteReading = (groupId: string, siteId: string, date: string) => http.delete(`${readings(groupId, siteId)}/${date}`);

export const previewUpload = (groupId: string, siteId: string, file: File, options: UploadOptions, onProgress?: UploadProgress) =>
  uploadFile<UploadPreview>(`${readings(groupId, siteId)}/upload/preview`, file, { options: JSON.stringify(options) }, onProgress);

export const importUpload = (groupId: string, siteId: string, file: File, options: UploadOptions, onProgress?: UploadProgress) =>
  uploadFile<UploadResult>(`${readings(groupId, siteId)}/upload`, file, { options: JSON.stringify(options) }, onProgress);

export const pullStation = (groupId: string, siteId: string) => http.post<StationPull>(`${readings(groupId, siteId)}/station-pull`);

export const getWeather = (groupId: string, siteId: string, query: { season?: number; base?: number } = {}) =>
  http.get<SiteWeather>(weather(groupId, siteId), query);

export const saveNormals = (groupId: string, siteId: string, body: NormalsUpdate) => http.put<SiteNormals>(`${weather(groupId, siteId)}/normals`, body);

export const computeNormals = (groupId: string, siteId: string) => http.post<SiteNormals>(`${weather(groupId, siteId)}/normals/compute`);

export const clearNormals = (groupId: string, siteId: string) => http.delete<SiteNormals>(`${weather(groupId, siteId)}/normals`);

export const linkStation = (groupId: string, siteId: string, stationId: string | null) =>
  http.put<{ stationId: string | null }>(`${weather(groupId, siteId)}/station`, { stationId });
