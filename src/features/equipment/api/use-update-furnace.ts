import { useMutation, useQueryClient } from '@tanstack/react-query';
import { furnaceSchema, furnaceUpdateSchema, type FurnaceUpdateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

export function useUpdateFurnace(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ furnaceId, input }: { furnaceId: string; input: FurnaceUpdateInput }) =>
      furnaceSchema.parse(
        await apiClient.patch(`${equipmentBase(workshopId)}/furnaces/${encodeURIComponent(furnaceId)}`, furnaceUpdateSchema.parse(input)),
      ),
    onSuccess: (furnace) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: equipmentQueries.furnaceList(workshopId).queryKey }),
        queryClient.invalidateQueries({ queryKey: equipmentQueries.furnaceDetail(workshopId, furnace.id).queryKey }),
      ]),
  });
}
