import type { PlantWindows } from '../../server/schemas/windows';
import { http } from './http';

export const getPlantWindows = (groupId: string, plantId: string, query: { season?: number; on?: string } = {}) =>
  http.get<PlantWindows>(`/api/groups/${encodeURIComponent(groupId)}/plants/${encodeURIComponent(plantId)}/windows`, query);
