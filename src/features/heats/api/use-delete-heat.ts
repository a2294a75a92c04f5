import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateHeatLog, type RelatedKeys } from './heat-invalidation.ts';
import { heatQueries, heatsBase } from './heat-queries.ts';

/** Deletes a heat with its charge lines and castings. */
export function useDeleteHeat(workshopId: string, related: RelatedKeys = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (heatId: string) => apiClient.delete(`${heatsBase(workshopId)}/heats/${encodeURIComponent(heatId)}`),
    onSuccess: (_data, heatId) => {
      queryClient.removeQueries({ queryKey: heatQueries.detail(workshopId, heatId).queryKey });
      return invalidateHeatLog(queryClient, related);
    },
  });
}
