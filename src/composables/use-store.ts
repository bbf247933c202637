import { ref } from 'vue';
import type { StoreBatchCreate, StoreList } from '../../server/schemas/store';
import { deleteBatch, listStore, setBatchUsed, storeBatch } from '../api/store';
import { useGroupsStore } from '../stores/groups';
import { useResource } from './use-resource';

/** The current group's store: batches in store (or all, used ones too) and the keep table. */
export function useStore() {
  const groups = useGroupsStore();
  const includeUsed = ref(false);
  const list = useResource<StoreList | null>(
    async () => (groups.currentGroupId ? listStore(groups.currentGroupId, includeUsed.value) : null),
    [() => groups.currentGroupId, includeUsed],
  );
  const groupId = (): string => {
    if (!groups.currentGroupId) throw new Error('Choose a group first.');
    return groups.currentGroupId;
  };
  return {
    list, includeUsed,
    add: (body: StoreBatchCreate) => storeBatch(groupId(), body),
    setUsed: (batchId: string, usedOn: string | null) => setBatchUsed(groupId(), batchId, usedOn),
    remove: (batchId: string) => deleteBatch(groupId(), batchId),
  };
}
