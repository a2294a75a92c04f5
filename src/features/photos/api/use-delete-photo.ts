import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { photoQueries, photosBase } from './photo-queries.ts';

export function useDeletePhoto(workshopId: string, photoId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiClient.delete(`${photosBase(workshopId)}/photos/${encodeURIComponent(photoId)}`),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: photoQueries.detail(workshopId, photoId).queryKey });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: photoQueries.lists() }),
        queryClient.invalidateQueries({ queryKey: photoQueries.infinites() }),
        queryClient.invalidateQueries({ queryKey: photoQueries.indexes() }),
      ]);
    },
  });
}
