import { useMutation, useQueryClient } from '@tanstack/react-query';
import { heatCreateSchema, heatDetailSchema, type HeatCreateDraft } from '#shared/heats/heat-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateHeatLog, type RelatedKeys } from './heat-invalidation.ts';
import { heatQueries, heatsBase } from './heat-queries.ts';

/** Logs a heat with its charge lines and castings in one request; the new heat's page opens from the cache. */
export function useCreateHeat(workshopId: string, related: RelatedKeys = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: HeatCreateDraft) =>
      heatDetailSchema.parse(await apiClient.post(`${heatsBase(workshopId)}/heats`, heatCreateSchema.parse(input))),
    onSuccess: (heat) => {
      queryClient.setQueryData(heatQueries.detail(workshopId, heat.id).queryKey, heat);
      return invalidateHeatLog(queryClient, related);
    },
  });
}
