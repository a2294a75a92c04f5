import { queryOptions } from '@tanstack/react-query';
import {
  candidateCastingSchema,
  heatTreatmentDetailSchema,
  heatTreatmentSummarySchema,
} from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

export const heatTreatmentsBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}/heat-treatments`;
export const heatTreatmentUrl = (workshopId: string, id: string) => `${heatTreatmentsBase(workshopId)}/${encodeURIComponent(id)}`;

/** Plans and records of a workshop; candidates are the castings a new plan can hold. */
export const heatTreatmentQueries = {
  all: () => ['heat-treatments'] as const,
  lists: () => [...heatTreatmentQueries.all(), 'list'] as const,
  list: (workshopId: string) =>
    queryOptions({
      queryKey: [...heatTreatmentQueries.lists(), { workshopId }] as const,
      queryFn: async ({ signal }) => heatTreatmentSummarySchema.array().parse(await apiClient.get(heatTreatmentsBase(workshopId), { signal })),
    }),
  details: () => [...heatTreatmentQueries.all(), 'detail'] as const,
  detail: (workshopId: string, id: string) =>
    queryOptions({
      queryKey: [...heatTreatmentQueries.details(), { workshopId, id }] as const,
      queryFn: async ({ signal }) => heatTreatmentDetailSchema.parse(await apiClient.get(heatTreatmentUrl(workshopId, id), { signal })),
    }),
  candidateLists: () => [...heatTreatmentQueries.all(), 'candidates'] as const,
  candidates: (workshopId: string) =>
    queryOptions({
      queryKey: [...heatTreatmentQueries.candidateLists(), { workshopId }] as const,
      queryFn: async ({ signal }) =>
        candidateCastingSchema.array().parse(await apiClient.get(`${heatTreatmentsBase(workshopId)}/candidates`, { signal })),
    }),
};
