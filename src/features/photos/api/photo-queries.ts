import { infiniteQueryOptions, queryOptions } from '@tanstack/react-query';
import { photoIndexItemSchema, photoPageSchema, photoSchema } from '#shared/photos/photo-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';
import { listQueryString, type GalleryFilters } from '../lib/gallery-filters.ts';

export const photosBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}`;

/** Photos on one page of the gallery's list. */
export const GALLERY_PAGE_SIZE = 40;
/** A casting rarely has more photos than this; its page shows them all at once. */
export const CASTING_PHOTO_LIMIT = 100;

const photoIndexSchema = photoIndexItemSchema.array();

/**
 * Photos of a workshop. `list` is one page (a casting's photos), `infinite`
 * the gallery's keyset pages (its own branch: never share a key between
 * useQuery and useInfiniteQuery), `index` the compact record of every photo
 * for fuzzy search, `detail` one photo with its marks.
 */
export const photoQueries = {
  all: () => ['photos'] as const,

  lists: () => [...photoQueries.all(), 'list'] as const,
  list: (workshopId: string, filters: GalleryFilters & { castingId?: string }) =>
    queryOptions({
      queryKey: [...photoQueries.lists(), { workshopId, ...filters }] as const,
      queryFn: async ({ signal }) =>
        photoPageSchema.parse(
          await apiClient.get(`${photosBase(workshopId)}/photos${listQueryString({ ...filters, limit: CASTING_PHOTO_LIMIT })}`, { signal }),
        ),
    }),

  infinites: () => [...photoQueries.all(), 'infinite'] as const,
  infinite: (workshopId: string, filters: GalleryFilters) =>
    infiniteQueryOptions({
      queryKey: [...photoQueries.infinites(), { workshopId, ...filters }] as const,
      queryFn: async ({ signal, pageParam }) =>
        photoPageSchema.parse(
          await apiClient.get(
            `${photosBase(workshopId)}/photos${listQueryString({ ...filters, cursor: pageParam ?? undefined, limit: GALLERY_PAGE_SIZE })}`,
            { signal },
          ),
        ),
      initialPageParam: null as string | null,
      getNextPageParam: (last) => last.nextCursor,
    }),

  indexes: () => [...photoQueries.all(), 'index'] as const,
  index: (workshopId: string) =>
    queryOptions({
      queryKey: [...photoQueries.indexes(), { workshopId }] as const,
      queryFn: async ({ signal }) => {
        const body = (await apiClient.get(`${photosBase(workshopId)}/photo-index`, { signal })) as { items?: unknown };
        return photoIndexSchema.parse(body?.items);
      },
      // Fetched once per visit; uploads and marks invalidate it.
      staleTime: 5 * 60_000,
    }),

  details: () => [...photoQueries.all(), 'detail'] as const,
  detail: (workshopId: string, photoId: string) =>
    queryOptions({
      queryKey: [...photoQueries.details(), { workshopId, photoId }] as const,
      queryFn: async ({ signal }) =>
        photoSchema.parse(await apiClient.get(`${photosBase(workshopId)}/photos/${encodeURIComponent(photoId)}`, { signal })),
    }),
};
