import { heatFilterSchema, type HeatSort, type SortDirection } from '#shared/heats/heat-schemas.ts';

/** The heat log's filters as they sit in the URL and in query keys: ids and days as text, the sort always set. */
export type HeatListFilter = {
  alloy?: string;
  casterId?: string;
  furnaceId?: string;
  crucibleId?: string;
  /** YYYY-MM-DD, poured on or after. */
  from?: string;
  /** YYYY-MM-DD, poured on or before (the whole day). */
  to?: string;
  sort: HeatSort;
  dir: SortDirection;
};

export const FILTER_KEYS = ['alloy', 'casterId', 'furnaceId', 'crucibleId', 'from', 'to'] as const;
export type FilterKey = (typeof FILTER_KEYS)[number];

export const DEFAULT_SORT: Pick<HeatListFilter, 'sort' | 'dir'> = { sort: 'pouredAt', dir: 'desc' };

/**
 * The filters in a URL's query. Each parameter is checked with the API's
 * own filter schema on its own, so one bad value (a hand-edited link) is
 * dropped instead of emptying the whole list. The raw text is kept (not the
 * schema's canonical spelling) so the URL and the form controls agree.
 */
export function filterFromSearch(search: URLSearchParams): HeatListFilter {
  const filter: HeatListFilter = { ...DEFAULT_SORT };
  for (const key of FILTER_KEYS) {
    const value = search.get(key)?.trim();
    if (!value) continue;
    if (heatFilterSchema.shape[key].safeParse(value).success) filter[key] = value;
  }
  const sort = heatFilterSchema.shape.sort.safeParse(search.get('sort') ?? undefined);
  const dir = heatFilterSchema.shape.dir.safeParse(search.get('dir') ?? undefined);
  if (sort.success) filter.sort = sort.data;
  if (dir.success) filter.dir = dir.data;
  return filter;
}

/** The filter as query parameters, defaults left out so URLs stay short. */
export function searchFromFilter(filter: HeatListFilter): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of FILTER_KEYS) {
    const value = filter[key];
    if (value) params.set(key, value);
  }
  if (filter.sort !== DEFAULT_SORT.sort || filter.dir !== DEFAULT_SORT.dir) {
    params.set('sort', filter.sort);
    params.set('dir', filter.dir);
  }
  return params;
}

/** The same filter for the API: sort and direction always spelled out. */
export function apiSearchFromFilter(filter: HeatListFilter): URLSearchParams {
  const params = searchFromFilter(filter);
  params.set('sort', filter.sort);
  params.set('dir', filter.dir);
  return params;
}

export function hasFilters(filter: HeatListFilter): boolean {
  return FILTER_KEYS.some((key) => Boolean(filter[key]));
}
