import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

/** Deleting works only while no heat names the furnace (else 409 equipment-in-use, with the reason). */
export function useDeleteFurnace(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (furnaceId: string) => apiClient.delete(`${equipmentBase(workshopId)}/furnaces/${encodeURIComponent(furnaceId)}`),
    onSuccess: (_data, furnaceId) => {
      queryClient.removeQueries({ queryKey: equipmentQueries.furnaceDetail(workshopId, furnaceId).queryKey });
      return queryClient.invalidateQueries({ queryKey: equipmentQueries.furnaceList(workshopId).queryKey });
    },
  });
}
