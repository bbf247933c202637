import type { PlantCsvImportResult, PlantCsvPreview } from '../../server/schemas/plant-csv';
import { http } from './http';

const base = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}/plants/csv`;

/** A plain link downloads the file with the session cookie; no script needs to hold it. */
export const plantCsvUrl = (groupId: string) => base(groupId);
export const previewPlantCsv = (groupId: string, csv: string) => http.post<PlantCsvPreview>(`${base(groupId)}/preview`, { csv });
export const importPlantCsv = (groupId: string, csv: string) => http.post<PlantCsvImportResult>(`${base(groupId)}/import`, { csv });
