import type { PlantTypeCode } from '../../server/schemas/catalogue';
import type { Plant, PlantCreate, PlantList, PlantUpdate, plantSortFields } from '../../server/schemas/plant';
import { http } from './http';

export type PlantSortField = (typeof plantSortFields)[number];

/** plantListQuerySchema as the client sends it (the schema's input type is loose because it coerces text). */
export interface PlantListParams {
  search?: string;
  siteId?: string;
  typeCode?: PlantTypeCode;
  includeArchived?: boolean;
  sort?: PlantSortField;
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

const base = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}/plants`;
const one = (groupId: string, plantId: string) => `${base(groupId)}/${encodeURIComponent(plantId)}`;

export const listPlants = (groupId: string, query: PlantListParams = {}) =>
  http.get<PlantList>(base(groupId), { ...query, includeArchived: query.includeArchived ? 'true' : undefined });

export const createPlant = (groupId: string, body: PlantCreate) => http.post<Plant>(base(groupId), body);

export const getPlant = (groupId: string, plantId: string) => http.get<Plant>(one(groupId, plantId));

export const updatePlant = (groupId: string, plantId: string, body: PlantUpdate) =>
  http.patch<Plant>(one(groupId, plantId), body);

export const archivePlant = (groupId: string, plantId: string) => http.post<Plant>(`${one(groupId, plantId)}/archive`);

export const restorePlant = (groupId: string, plantId: string) => http.post<Plant>(`${one(groupId, plantId)}/restore`);

export const deletePlant = (groupId: string, plantId: string) => http.delete(one(groupId, plantId));
