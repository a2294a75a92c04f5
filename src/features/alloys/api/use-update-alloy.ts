import { useMutation, useQueryClient } from '@tanstack/react-query';
import { alloyEntrySchema, workshopAlloyUpdateSchema, type WorkshopAlloyUpdateInput } from '#shared/alloys/alloy-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { alloyQueries, alloysBase } from './alloy-queries.ts';

/** PATCH /alloys/:alloyId (admins). */
export function useUpdateAlloy(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ alloyId, input }: { alloyId: string; input: WorkshopAlloyUpdateInput }) =>
      alloyEntrySchema.parse(
        await apiClient.patch(`${alloysBase(workshopId)}/${encodeURIComponent(alloyId)}`, workshopAlloyUpdateSchema.parse(input)),
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alloyQueries.list(workshopId).queryKey }),
  });
}
