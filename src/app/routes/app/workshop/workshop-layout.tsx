import type { QueryClient } from '@tanstack/react-query';
import { data, Outlet, type LoaderFunctionArgs } from 'react-router-dom';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { rememberWorkshop } from '#src/features/workshops/lib/remembered-workshop.ts';

/** /w/:workshopId/...: the workshop must be one of yours; it becomes the remembered one. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshops = await queryClient.ensureQueryData(workshopQueries.list());
    const workshop = workshops.find((w) => w.id === params.workshopId);
    if (!workshop) throw data('This workshop is not in your list', { status: 404 });
    rememberWorkshop(workshop.id);
    return null;
  };

export default function WorkshopLayout() {
  return <Outlet />;
}
