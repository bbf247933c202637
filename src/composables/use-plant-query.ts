import { computed } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { plantTypeCodes, type PlantTypeCode } from '../../server/schemas/catalogue';
import { plantSortFields } from '../../server/schemas/plant';
import type { PlantListParams, PlantSortField } from '../api/plants';
import { defaultPlantPageSize, plantPageSizes } from '../config';

const text = (value: unknown) => (typeof value === 'string' && value !== '' ? value : undefined);
const isTypeCode = (value: unknown): value is PlantTypeCode => plantTypeCodes.includes(value as PlantTypeCode);
const isSortField = (value: unknown): value is PlantSortField => plantSortFields.includes(value as PlantSortField);

/**
 * The plant table's search, filters, sort and page live in the address, so the back button, a
 * bookmark and the site page's "see its plants" link all land on the same view.
 */
export function usePlantQuery() {
  const route = useRoute();
  const router = useRouter();

  const params = computed<PlantListParams>(() => {
    const q = route.query;
    const page = Number(text(q.page) ?? 1);
    const pageSize = Number(text(q.pageSize) ?? defaultPlantPageSize);
    return {
      search: text(q.search),
      siteId: text(q.siteId),
      typeCode: isTypeCode(q.typeCode) ? q.typeCode : undefined,
      sort: isSortField(q.sort) ? q.sort : 'cultivar',
      order: q.order === 'desc' ? 'desc' : 'asc',
      page: Number.isInteger(page) && page > 0 ? page : 1,
      pageSize: (plantPageSizes as readonly number[]).includes(pageSize) ? pageSize : defaultPlantPageSize,
    };
  });

  const hasFilters = computed(() => Boolean(params.value.search || params.value.siteId || params.value.typeCode));

  /** Any change but paging starts again at page 1, or a narrower search could land past the end. */
  function update(patch: Partial<PlantListParams>): void {
    const next: PlantListParams = { ...params.value, page: 1, ...patch };
    const query: Record<string, string> = {};
    for (const [key, value] of Object.entries(next)) {
      if (value !== undefined && value !== '') query[key] = String(value);
    }
    // Defaults stay out of the address to keep shared links short.
    if (query.sort === 'cultivar') delete query.sort;
    if (query.order === 'asc') delete query.order;
    if (query.page === '1') delete query.page;
    if (query.pageSize === String(defaultPlantPageSize)) delete query.pageSize;
    void router.replace({ name: 'plants', query });
  }

  return { params, hasFilters, update };
}
