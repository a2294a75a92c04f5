import { queryOptions } from '@tanstack/react-query';
import { alloyEntrySchema } from '#shared/alloys/alloy-schemas.ts';
import { apiClient } from '#src/lib/api-client.ts';

export const alloysBase = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}/alloys`;

/**
 * The alloy library as one workshop sees it: the library's alloys and the
 * workshop's own. One list per workshop; it is small (a few dozen rows), so
 * search and sort run on the client.
 */
export const alloyQueries = {
  all: () => ['alloys'] as const,
  lists: () => [...alloyQueries.all(), 'list'] as const,
  list: (workshopId: string) =>
    queryOptions({
      queryKey: [...alloyQueries.lists(), { workshopId }] as const,
      queryFn: async ({ signal }) => alloyEntrySchema.array().parse(await apiClient.get(alloysBase(workshopId), { signal })),
      // The library changes only when an admin edits the workshop's own alloys.
      staleTime: 5 * 60_000,
    }),
};
