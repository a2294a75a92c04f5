import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

/** Deleting works only for a crucible no heat used; a used one answers 409 and is retired instead. */
export function useDeleteCrucible(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (crucibleId: string) => apiClient.delete(`${equipmentBase(workshopId)}/crucibles/${encodeURIComponent(crucibleId)}`),
    onSuccess: (_data, crucibleId) => {
      queryClient.removeQueries({ queryKey: equipmentQueries.crucibleDetail(workshopId, crucibleId).queryKey });
      return queryClient.invalidateQueries({ queryKey: equipmentQueries.crucibleList(workshopId).queryKey });
    },
  });
}
