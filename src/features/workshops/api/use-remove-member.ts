import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { memberQueries, workshopQueries } from './workshop-queries.ts';

export function useRemoveMember(workshopId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) =>
      apiClient.delete(`/workshops/${encodeURIComponent(workshopId)}/members/${encodeURIComponent(userId)}`),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: memberQueries.list(workshopId).queryKey }),
        // member counts
        queryClient.invalidateQueries({ queryKey: workshopQueries.lists() }),
      ]),
  });
}
