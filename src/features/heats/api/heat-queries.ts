import { infiniteQueryOptions, queryOptions } from '@tanstack/react-query';
import {
  chargePlanSchema,
  heatDefaultsSchema,
  heatDetailSchema,
  heatPageSchema,
  setpointAdviceSchema,
} from '#shared/heats/heat-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { apiSearchFromFilter, type HeatListFilter } from '../lib/heat-filters.ts';

export const heatsBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`;

/** How many heats one "Load more" brings. */
export const HEAT_PAGE_SIZE = 25;

/** The CSV export of the same filtered list, for a download link (not fetched by Query). */
export function heatsCsvHref(workshopId: string, filter: HeatListFilter): string {
  return `/api${heatsBase(workshopId)}/heats.csv?${apiSearchFromFilter(filter).toString()}`;
}

/**
 * The heat log. The paged table has its own `infinite` branch (an infinite
 * query must never share a key with a plain one); `list` is one page for
 * the equipment pages (a furnace's or a crucible's heats).
 */
export const heatQueries = {
  all: () => ['heats'] as const,

  infinites: () => [...heatQueries.all(), 'infinite'] as const,
  infinite: (workshopId: string, filter: HeatListFilter) =>
    infiniteQueryOptions({
      queryKey: [...heatQueries.infinites(), { workshopId, ...filter }] as const,
      queryFn: async ({ pageParam, signal }) => {
        const params = apiSearchFromFilter(filter);
        params.set('limit', String(HEAT_PAGE_SIZE));
        if (pageParam) params.set('cursor', pageParam);
        return heatPageSchema.parse(await apiClient.get(`${heatsBase(workshopId)}/heats?${params.toString()}`, { signal }));
      },
      initialPageParam: null as string | null,
      getNextPageParam: (lastPage) => lastPage.nextCursor,
    }),

  lists: () => [...heatQueries.all(), 'list'] as const,
  list: (workshopId: string, filter: HeatListFilter, limit: number) =>
    queryOptions({
      queryKey: [...heatQueries.lists(), { workshopId, ...filter, limit }] as const,
      queryFn: async ({ signal }) => {
        const params = apiSearchFromFilter(filter);
        params.set('limit', String(limit));
        return heatPageSchema.parse(await apiClient.get(`${heatsBase(workshopId)}/heats?${params.toString()}`, { signal }));
      },
    }),

  details: () => [...heatQueries.all(), 'detail'] as const,
  detail: (workshopId: string, heatId: string) =>
    queryOptions({
      queryKey: [...heatQueries.details(), { workshopId, heatId }] as const,
      queryFn: async ({ signal }) =>
        heatDetailSchema.parse(await apiClient.get(`${heatsBase(workshopId)}/heats/${encodeURIComponent(heatId)}`, { signal })),
    }),

  defaults: () => [...heatQueries.all(), 'last-defaults'] as const,
  lastDefaults: (workshopId: string, casterId?: string) =>
    queryOptions({
      queryKey: [...heatQueries.defaults(), { workshopId, casterId: casterId ?? null }] as const,
      queryFn: async ({ signal }) => {
        const query = casterId ? `?casterId=${encodeURIComponent(casterId)}` : '';
        return heatDefaultsSchema.parse(await apiClient.get(`${heatsBase(workshopId)}/heats/last-defaults${query}`, { signal }));
      },
      // A new form starts from what the caster used last; that changes only when they log a heat.
      staleTime: 5 * 60_000,
    }),

  setpoints: () => [...heatQueries.all(), 'setpoint'] as const,
  setpoint: (workshopId: string, furnaceId: string, targetC: number) =>
    queryOptions({
      queryKey: [...heatQueries.setpoints(), { workshopId, furnaceId, targetC }] as const,
      queryFn: async ({ signal }) =>
        setpointAdviceSchema.parse(
          await apiClient.get(`${heatsBase(workshopId)}/furnaces/${encodeURIComponent(furnaceId)}/setpoint?targetC=${targetC}`, { signal }),
        ),
    }),

  chargePlans: () => [...heatQueries.all(), 'charge-plan'] as const,
  chargePlan: (workshopId: string, mouldId: string, options: { casterId?: string; alloy?: string }) =>
    queryOptions({
      queryKey: [...heatQueries.chargePlans(), { workshopId, mouldId, casterId: options.casterId ?? null, alloy: options.alloy ?? null }] as const,
      queryFn: async ({ signal }) => {
        const params = new URLSearchParams();
        if (options.casterId) params.set('casterId', options.casterId);
        if (options.alloy) params.set('alloy', options.alloy);
        return chargePlanSchema.parse(
          await apiClient.get(`${heatsBase(workshopId)}/moulds/${encodeURIComponent(mouldId)}/charge-plan?${params.toString()}`, { signal }),
        );
      },
    }),
};
