import { useMutation, useQueryClient } from '@tanstack/react-query';
import { furnaceCreateSchema, furnaceSchema, type FurnaceCreateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

export function useCreateFurnace(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: FurnaceCreateInput) =>
      furnaceSchema.parse(await apiClient.post(`${equipmentBase(workshopId)}/furnaces`, furnaceCreateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: equipmentQueries.furnaceList(workshopId).queryKey }),
  });
}
