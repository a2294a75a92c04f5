import { useMutation, useQueryClient } from '@tanstack/react-query';
import { crucibleCreateSchema, crucibleDetailSchema, type CrucibleCreateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

export function useCreateCrucible(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CrucibleCreateInput) =>
      crucibleDetailSchema.parse(await apiClient.post(`${equipmentBase(workshopId)}/crucibles`, crucibleCreateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentQueries.crucibleList(workshopId).queryKey }),
  });
}
