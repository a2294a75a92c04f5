import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { data, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { photoQueries } from '#src/features/photos/api/photo-queries.ts';
import { PhotoWorkspace } from '#src/features/photos/components/photo-workspace.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { isApiError } from '#src/lib/api-client.ts';

/** The photo and its marks arrive with the page, so its box is reserved from the first paint. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    try {
      await queryClient.ensureQueryData(photoQueries.detail(params.workshopId ?? '', params.photoId ?? ''));
    } catch (error) {
      if (isApiError(error) && (error.status === 404 || error.status === 400)) {
        throw data('This photo is not in this workshop', { status: 404 });
      }
      throw error;
    }
    return null;
  };

export default function PhotoPage() {
  const { workshopId = '', photoId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return <PhotoWorkspace key={photoId} workshopId={workshopId} photoId={photoId} actor={{ id: user.id, role: workshop.role }} />;
}
