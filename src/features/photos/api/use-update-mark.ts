import { useMutation, useQueryClient } from '@tanstack/react-query';
import { markSchema, markUpdateSchema, type MarkUpdateInput } from '#shared/photos/photo-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateAfterPhotoChange } from './photo-invalidation.ts';
import { photoQueries, photosBase } from './photo-queries.ts';

export function useUpdateMark(workshopId: string, photoId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ markId, input }: { markId: string; input: MarkUpdateInput }) =>
      markSchema.parse(
        await apiClient.patch(
          `${photosBase(workshopId)}/photos/${encodeURIComponent(photoId)}/marks/${encodeURIComponent(markId)}`,
          markUpdateSchema.parse(input),
        ),
      ),
    onSuccess: (mark) => {
      queryClient.setQueryData(photoQueries.detail(workshopId, photoId).queryKey, (photo) =>
        photo ? { ...photo, marks: photo.marks.map((m) => (m.id === mark.id ? mark : m)) } : photo,
      );
      return invalidateAfterPhotoChange(queryClient, workshopId, photoId);
    },
  });
}
