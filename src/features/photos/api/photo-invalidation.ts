import type { QueryClient } from '@tanstack/react-query';
import { photoQueries } from './photo-queries.ts';

/** After an upload: the casting's photos, the gallery's pages and the search index. */
export function invalidateAfterUpload(queryClient: QueryClient, workshopId: string, castingId: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: photoQueries.list(workshopId, { castingId }).queryKey }),
    queryClient.invalidateQueries({ queryKey: photoQueries.infinites() }),
    queryClient.invalidateQueries({ queryKey: photoQueries.indexes() }),
  ]);
}

/**
 * After a mark or a photo's title changed: that photo, and every list that
 * shows its mark count, badges or title, and the search index.
 */
export function invalidateAfterPhotoChange(queryClient: QueryClient, workshopId: string, photoId: string) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: photoQueries.detail(workshopId, photoId).queryKey }),
    queryClient.invalidateQueries({ queryKey: photoQueries.lists() }),
    queryClient.invalidateQueries({ queryKey: photoQueries.infinites() }),
    queryClient.invalidateQueries({ queryKey: photoQueries.indexes() }),
  ]);
}
