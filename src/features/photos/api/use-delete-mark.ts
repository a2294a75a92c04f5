import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateAfterPhotoChange } from './photo-invalidation.ts';
import { photoQueries, photosBase } from './photo-queries.ts';

export function useDeleteMark(workshopId: string, photoId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (markId: string) => {
      await apiClient.delete(`${photosBase(workshopId)}/photos/${encodeURIComponent(photoId)}/marks/${encodeURIComponent(markId)}`);
      return markId;
    },
    onSuccess: (markId) => {
      queryClient.setQueryData(photoQueries.detail(workshopId, photoId).queryKey, (photo) =>
        photo ? { ...photo, marks: photo.marks.filter((m) => m.id !== markId) } : photo,
      );
      return invalidateAfterPhotoChange(queryClient, workshopId, photoId);
    },
  });
}
