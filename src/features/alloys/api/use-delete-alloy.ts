import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { alloyQueries, alloysBase } from './alloy-queries.ts';

/** DELETE /alloys/:alloyId (admins). */
export function useDeleteAlloy(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (alloyId: string) => {
      await apiClient.delete(`${alloysBase(workshopId)}/${encodeURIComponent(alloyId)}`);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alloyQueries.list(workshopId).queryKey }),
  });
}
