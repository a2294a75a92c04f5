import { queryOptions } from '@tanstack/react-query';
import {
  crucibleCyclesSchema,
  defectFrequencySchema,
  defectRateByBandSchema,
  furnaceOffsetSchema,
  yieldTrendSchema,
  type InsightName,
} from '#shared/insights/insight-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { queryString, type InsightView } from '../lib/insight-filters.ts';

const url = (workshopId: string, name: InsightName, params: Record<string, string | undefined>) =>
  `/workshops/${encodeURIComponent(workshopId)}/insights/${name}${queryString(params)}`;

type Filters = Omit<InsightView, 'kind'>;

/**
 * One query per insight; the key holds every filter the request sends, so
 * a filter change is a new cache entry and going back is instant.
 */
export const insightQueries = {
  all: () => ['insights'] as const,
  details: () => [...insightQueries.all(), 'detail'] as const,
  defectFrequency: (workshopId: string, f: Filters) =>
    queryOptions({
      queryKey: [...insightQueries.details(), 'defect-frequency', { workshopId, ...f }] as const,
      queryFn: async ({ signal }) => defectFrequencySchema.parse(await apiClient.get(url(workshopId, 'defect-frequency', f), { signal })),
    }),
  pourBand: (workshopId: string, f: Filters & { alloy: string; kind?: string }) =>
    queryOptions({
      queryKey: [...insightQueries.details(), 'defect-rate-by-pour-band', { workshopId, ...f }] as const,
      queryFn: async ({ signal }) =>
        defectRateByBandSchema.parse(await apiClient.get(url(workshopId, 'defect-rate-by-pour-band', f), { signal })),
    }),
  mouldPreheatBand: (workshopId: string, f: Filters & { kind?: string }) =>
    queryOptions({
      queryKey: [...insightQueries.details(), 'defect-rate-by-mould-preheat-band', { workshopId, ...f }] as const,
      queryFn: async ({ signal }) =>
        defectRateByBandSchema.parse(await apiClient.get(url(workshopId, 'defect-rate-by-mould-preheat-band', f), { signal })),
    }),
  yieldTrend: (workshopId: string, f: Filters) =>
    queryOptions({
      queryKey: [...insightQueries.details(), 'yield-trend', { workshopId, ...f }] as const,
      queryFn: async ({ signal }) => yieldTrendSchema.parse(await apiClient.get(url(workshopId, 'yield-trend', f), { signal })),
    }),
  crucibleCycles: (workshopId: string, f: Filters) =>
    queryOptions({
      queryKey: [...insightQueries.details(), 'crucible-cycles', { workshopId, ...f }] as const,
      queryFn: async ({ signal }) => crucibleCyclesSchema.parse(await apiClient.get(url(workshopId, 'crucible-cycles', f), { signal })),
    }),
  furnaceOffset: (workshopId: string, f: Filters) =>
    queryOptions({
      queryKey: [...insightQueries.details(), 'furnace-offset', { workshopId, ...f }] as const,
      queryFn: async ({ signal }) => furnaceOffsetSchema.parse(await apiClient.get(url(workshopId, 'furnace-offset', f), { signal })),
    }),
};
