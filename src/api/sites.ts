import type { Site, SiteCreate, SiteUpdate } from '../../server/schemas/site';
import { http } from './http';

const base = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}/sites`;
const one = (groupId: string, siteId: string) => `${base(groupId)}/${encodeURIComponent(siteId)}`;

export const listSites = (groupId: string, options: { includeArchived?: boolean } = {}) =>
  http.get<Site[]>(base(groupId), { includeArchived: options.includeArchived ? 'true' : undefined });

export const createSite = (groupId: string, body: SiteCreate) => http.post<Site>(base(groupId), body);

export const getSite = (groupId: string, siteId: string) => http.get<Site>(one(groupId, siteId));

export const updateSite = (groupId: string, siteId: string, body: SiteUpdate) =>
  http.patch<Site>(one(groupId, siteId), body);

export const archiveSite = (groupId: string, siteId: string) => http.post<Site>(`${one(groupId, siteId)}/archive`);

export const restoreSite = (groupId: string, siteId: string) => http.post<Site>(`${one(groupId, siteId)}/restore`);

export const deleteSite = (groupId: string, siteId: string) => http.delete(one(groupId, siteId));
