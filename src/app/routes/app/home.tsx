import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { PageSkeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { pickWorkshop } from '#src/features/workshops/lib/remembered-workshop.ts';

/** "/" opens the last workshop used here, or the first; someone with none creates one. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshops = await queryClient.ensureQueryData(workshopQueries.list());
    const workshop = pickWorkshop(workshops);
    throw redirect(workshop ? paths.heats.getHref(workshop.id) : paths.createWorkshop.getHref());
  };

export default function HomePage() {
  return <PageSkeleton />;
}
