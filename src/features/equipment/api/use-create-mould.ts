import { useMutation, useQueryClient } from '@tanstack/react-query';
import { mouldCreateSchema, mouldSchema, type MouldCreateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

export function useCreateMould(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: MouldCreateInput) =>
      mouldSchema.parse(await apiClient.post(`${equipmentBase(workshopId)}/moulds`, mouldCreateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentQueries.mouldList(workshopId).queryKey }),
  });
}
