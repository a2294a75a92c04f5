import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { photoSchema, photoUpdateSchema } from '#shared/photos/photo-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { invalidateAfterPhotoChange } from './photo-invalidation.ts';
import { photoQueries, photosBase } from './photo-queries.ts';

export type PhotoUpdateInput = z.input<typeof photoUpdateSchema>;

/** The owner changes a photo's title and notes. */
export function useUpdatePhoto(workshopId: string, photoId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: PhotoUpdateInput) =>
      photoSchema.parse(
        await apiClient.patch(`${photosBase(workshopId)}/photos/${encodeURIComponent(photoId)}`, photoUpdateSchema.parse(input)),
      ),
    onSuccess: (photo) => {
      queryClient.setQueryData(photoQueries.detail(workshopId, photoId).queryKey, photo);
      return invalidateAfterPhotoChange(queryClient, workshopId, photoId);
    },
  });
}
