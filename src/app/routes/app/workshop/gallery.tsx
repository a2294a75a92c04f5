import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Zap } from 'lucide-react';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { photoQueries } from '#src/features/photos/api/photo-queries.ts';
import { GalleryView } from '#src/features/photos/components/gallery-view.tsx';
import { filtersOf, parseGalleryView } from '#src/features/photos/lib/gallery-filters.ts';
import { memberQueries } from '#src/features/workshops/api/workshop-queries.ts';

/** The first page of photos and the members (for the caster filter) start loading with the page. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshopId = params.workshopId ?? '';
    const view = parseGalleryView(new URL(request.url).searchParams);
    if (!view.q) void queryClient.prefetchInfiniteQuery(photoQueries.infinite(workshopId, filtersOf(view)));
    else void queryClient.prefetchQuery(photoQueries.index(workshopId));
    void queryClient.prefetchQuery(memberQueries.list(workshopId));
    return null;
  };

export default function GalleryPage() {
  const { workshopId = '' } = useParams();
  // The caster filter lists the members; if they do not load, the filter offers "Anyone" only.
  const members = useQuery(memberQueries.list(workshopId));
  const casters = useMemo(
    () => (members.data ?? []).map((m) => ({ id: m.userId, name: m.displayName })).sort((a, b) => a.name.localeCompare(b.name)),
    [members.data],
  );
  return (
    <>
      <PageHeader
        title="Gallery"
        description="Photos of the workshop's castings, with their marked defects."
        actions={
          <ButtonLink to={paths.quickCheck.getHref(workshopId)} variant="primary" icon={<Zap aria-hidden className="size-4" />}>
            Quick check
          </ButtonLink>
        }
      />
      <GalleryView workshopId={workshopId} casters={casters} />
    </>
  );
}
