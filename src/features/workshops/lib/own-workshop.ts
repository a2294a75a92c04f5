import type { QueryClient } from '@tanstack/react-query';
import type { Workshop } from '#shared/workshops/workshop-schemas.ts';
import { workshopQueries } from '../api/workshop-queries.ts';

/**
 * For page loaders under /w/:workshopId: the workshop when it is one of the
 * user's, else null. React Router runs a page's loader beside the workshop
 * layout's, so a page checks this before prefetching rather than sending
 * requests for a workshop the layout is about to refuse.
 */
export async function ownWorkshop(queryClient: QueryClient, workshopId: string | undefined): Promise<Workshop | null> {
  const workshops = await queryClient.ensureQueryData(workshopQueries.list());
  return workshops.find((w) => w.id === workshopId) ?? null;
}
