import { queryOptions } from '@tanstack/react-query';
import type { DefectKindId } from '#shared/domain/index.ts';
import { photoPageSchema } from '#shared/photos/photo-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

/** Example photos on a defect's guide page. */
export const GUIDE_PHOTO_LIMIT = 8;

/**
 * The workshop's photos marked with one defect kind. The key sits in the
 * photos' list branch (['photos', 'list', …]) on purpose: when a mark is
 * added or removed, the gallery invalidates that branch and the guide's
 * examples follow. The `purpose` segment keeps it apart from the gallery's
 * own lists, which fetch a different page size.
 */
export const guidePhotoQueries = {
  examples: (workshopId: string, kind: DefectKindId) =>
    queryOptions({
      queryKey: ['photos', 'list', { workshopId, kind, limit: GUIDE_PHOTO_LIMIT, purpose: 'guide-examples' }] as const,
      queryFn: async ({ signal }) =>
        photoPageSchema.parse(
          await apiClient.get(
            `/workshops/${encodeURIComponent(workshopId)}/photos?kind=${encodeURIComponent(kind)}&limit=${GUIDE_PHOTO_LIMIT}`,
            { signal },
          ),
        ),
    }),
};
