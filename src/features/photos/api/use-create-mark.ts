import { useMutation, useQueryClient } from '@tanstack/react-query';
import { markCreateSchema, markSchema, type MarkCreateInput } from '#shared/photos/photo-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateAfterPhotoChange } from './photo-invalidation.ts';
import { photoQueries, photosBase } from './photo-queries.ts';

export function useCreateMark(workshopId: string, photoId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: MarkCreateInput) =>
      markSchema.parse(
        await apiClient.post(`${photosBase(workshopId)}/photos/${encodeURIComponent(photoId)}/marks`, markCreateSchema.parse(input)),
      ),
    onSuccess: (mark) => {
      // Show the saved mark at once; the refetch then confirms it.
      queryClient.setQueryData(photoQueries.detail(workshopId, photoId).queryKey, (photo) =>
        photo ? { ...photo, marks: [...photo.marks, mark] } : photo,
      );
      return invalidateAfterPhotoChange(queryClient, workshopId, photoId);
    },
  });
}
