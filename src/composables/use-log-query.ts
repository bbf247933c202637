import { computed } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { logKinds, type LogKind } from '../../server/schemas/log';
import type { LogListParams } from '../api/log';

const text = (value: unknown) => (typeof value === 'string' && value !== '' ? value : undefined);
const day = (value: unknown) => (typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value) ? value : undefined);
export const logPageSizes = [25, 50, 100] as const;

/** The log's filters and page live in the address, so the back button and a shared link land on the same view. */
export function useLogQuery() {
  const route = useRoute();
  const router = useRouter();
  const params = computed<LogListParams>(() => {
    const q = route.query;
    const page = Number(text(q.page) ?? 1);
    const pageSize = Number(text(q.pageSize) ?? 25);
    return {
      plantId: text(q.plantId), personId: text(q.personId), from: day(q.from), to: day(q.to),
      kind: logKinds.includes(q.kind as LogKind) ? (q.kind as LogKind) : undefined,
      page: Number.isInteger(page) && page > 0 ? page : 1,
      pageSize: (logPageSizes as readonly number[]).includes(pageSize) ? pageSize : 25,
    };
  });
  const filters = computed(() => ({ plantId: params.value.plantId, kind: params.value.kind, personId: params.value.personId, from: params.value.from, to: params.value.to }));
  const hasFilters = computed(() => Object.values(filters.value).some(Boolean));

  /** Any change but paging starts again at page 1. */
  function update(patch: Partial<LogListParams>): void {
    const next: LogListParams = { ...params.value, page: 1, ...patch };
    const query: Record<string, string> = {};
    for (const [key, value] of Object.entries(next)) if (value !== undefined && value !== '') query[key] = String(value);
    if (query.page === '1') delete query.page;
    if (query.pageSize === '25') delete query.pageSize;
    void router.replace({ name: 'log', query });
  }

  return { params, filters, hasFilters, update };
}
