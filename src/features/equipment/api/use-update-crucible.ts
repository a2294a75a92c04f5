import { useMutation, useQueryClient } from '@tanstack/react-query';
import { crucibleDetailSchema, crucibleUpdateSchema, type CrucibleUpdateInput } from '#shared/heats/equipment-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { equipmentBase, equipmentQueries } from './equipment-queries.ts';

/** Edits a crucible; `{ retired: true }` retires it (the server stamps today), `{ retired: false }` brings it back. */
export function useUpdateCrucible(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ crucibleId, input }: { crucibleId: string; input: CrucibleUpdateInput }) =>
      crucibleDetailSchema.parse(
        await apiClient.patch(`${equipmentBase(workshopId)}/crucibles/${encodeURIComponent(crucibleId)}`, crucibleUpdateSchema.parse(input)),
      ),
    onSuccess: (crucible) => {
      queryClient.setQueryData(equipmentQueries.crucibleDetail(workshopId, crucible.id).queryKey, crucible);
      return queryClient.invalidateQueries({ queryKey: equipmentQueries.crucibleList(workshopId).queryKey });
    },
  });
}
