import { useMutation, useQueryClient } from '@tanstack/react-query';
import { alloyEntrySchema, workshopAlloyCreateSchema, type WorkshopAlloyCreateInput } from '#shared/alloys/alloy-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { alloyQueries, alloysBase } from './alloy-queries.ts';

/** POST /alloys (admins): a workshop alloy; the library list refetches before the form closes. */
export function useCreateAlloy(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: WorkshopAlloyCreateInput) =>
      alloyEntrySchema.parse(await apiClient.post(alloysBase(workshopId), workshopAlloyCreateSchema.parse(input))),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alloyQueries.list(workshopId).queryKey }),
  });
}
