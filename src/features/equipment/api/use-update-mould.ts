import { useMutation, useQueryClient } from '@tanstack/react-query';
import { mouldSchema, mouldUpdateSchema, type MouldUpdateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

export function useUpdateMould(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ mouldId, input }: { mouldId: string; input: MouldUpdateInput }) =>
      mouldSchema.parse(await apiClient.patch(`${equipmentBase(workshopId)}/moulds/${encodeURIComponent(mouldId)}`, mouldUpdateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentQueries.mouldList(workshopId).queryKey }),
  });
}
