import { queryOptions } from '@tanstack/react-query';
import {
  crucibleDetailSchema,
  crucibleLimitRowSchema,
  crucibleSchema,
  furnaceSchema,
  mouldSchema,
} from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

export const equipmentBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`;

/**
 * Furnaces, crucibles and moulds under one root, so a heat written or
 * deleted (which moves heat counts, crucible cycles and casting counts) can
 * refresh all of them with `equipmentQueries.all()`.
 */
export const equipmentQueries = {
  all: () => ['equipment'] as const,

  furnaces: () => [...equipmentQueries.all(), 'furnaces'] as const,
  furnaceLists: () => [...equipmentQueries.furnaces(), 'list'] as const,
  furnaceList: (workshopId: string) =>
    queryOptions({
      queryKey: [...equipmentQueries.furnaceLists(), { workshopId }] as const,
      queryFn: async ({ signal }) => furnaceSchema.array().parse(await apiClient.get(`${equipmentBase(workshopId)}/furnaces`, { signal })),
    }),
  furnaceDetail: (workshopId: string, furnaceId: string) =>
    queryOptions({
      queryKey: [...equipmentQueries.furnaces(), 'detail', { workshopId, furnaceId }] as const,
      queryFn: async ({ signal }) =>
        furnaceSchema.parse(await apiClient.get(`${equipmentBase(workshopId)}/furnaces/${encodeURIComponent(furnaceId)}`, { signal })),
    }),

  crucibles: () => [...equipmentQueries.all(), 'crucibles'] as const,
  crucibleLists: () => [...equipmentQueries.crucibles(), 'list'] as const,
  crucibleList: (workshopId: string) =>
    queryOptions({
      queryKey: [...equipmentQueries.crucibleLists(), { workshopId }] as const,
      queryFn: async ({ signal }) => crucibleSchema.array().parse(await apiClient.get(`${equipmentBase(workshopId)}/crucibles`, { signal })),
    }),
  crucibleDetail: (workshopId: string, crucibleId: string) =>
    queryOptions({
      queryKey: [...equipmentQueries.crucibles(), 'detail', { workshopId, crucibleId }] as const,
      queryFn: async ({ signal }) =>
        crucibleDetailSchema.parse(await apiClient.get(`${equipmentBase(workshopId)}/crucibles/${encodeURIComponent(crucibleId)}`, { signal })),
    }),
  crucibleLimits: (workshopId: string) =>
    queryOptions({
      queryKey: [...equipmentQueries.crucibles(), 'limits', { workshopId }] as const,
      queryFn: async ({ signal }) =>
        crucibleLimitRowSchema.array().parse(await apiClient.get(`${equipmentBase(workshopId)}/crucible-limits`, { signal })),
    }),

  moulds: () => [...equipmentQueries.all(), 'moulds'] as const,
  mouldLists: () => [...equipmentQueries.moulds(), 'list'] as const,
  mouldList: (workshopId: string) =>
    queryOptions({
      queryKey: [...equipmentQueries.mouldLists(), { workshopId }] as const,
      queryFn: async ({ signal }) => mouldSchema.array().parse(await apiClient.get(`${equipmentBase(workshopId)}/moulds`, { signal })),
    }),
};
