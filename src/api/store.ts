import type { StoreBatch, StoreBatchCreate, StoreList } from '../../server/schemas/store';
import { http } from './http';

const base = (groupId: string) => `/api/groups/${encodeURIComponent(groupId)}/store`;

export const listStore = (groupId: string, includeUsed = false) => http.get<StoreList>(base(groupId), { includeUsed: includeUsed ? 'true' : undefined });
export const storeBatch = (groupId: string, body: StoreBatchCreate) => http.post<StoreBatch>(base(groupId), body);
export const setBatchUsed = (groupId: string, batchId: string, usedOn: string | null) => http.put<StoreBatch>(`${base(groupId)}/${encodeURIComponent(batchId)}/used`, { usedOn });
export const deleteBatch = (groupId: string, batchId: string) => http.delete(`${base(groupId)}/${encodeURIComponent(batchId)}`);
