import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

/** Deleting works only while no casting names the mould (else 409 equipment-in-use). */
export function useDeleteMould(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (mouldId: string) => apiClient.delete(`${equipmentBase(workshopId)}/moulds/${encodeURIComponent(mouldId)}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentQueries.mouldList(workshopId).queryKey }),
  });
}
