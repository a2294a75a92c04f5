import { useMutation, useQueryClient } from '@tanstack/react-query';
import { workshopSchema, workshopUpdateSchema, type WorkshopUpdateInput } from '#shared/workshops/workshop-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { workshopQueries } from './workshop-queries.ts';

/** PATCH /workshops/:workshopId (admins): the workshop's settings; the list refetches. */
export function useUpdateWorkshop(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: WorkshopUpdateInput) =>
      workshopSchema.parse(
        await apiClient.patch(`/workshops/${encodeURIComponent(workshopId)}`, workshopUpdateSchema.parse(input)),
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workshopQueries.lists() }),
  });
}
