import type { QueryClient } from '@tanstack/react-query';
import { data, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { findDefectKind } from '#shared/domain/index.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { guidePhotoQueries } from '#src/features/guide/api/guide-photo-queries.ts';
import { DefectKindGuide } from '#src/features/guide/components/defect-kind-guide.tsx';

/** An unknown defect is a 404; the example photos start loading with the page but never hold it up. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const kind = findDefectKind(params.kindId ?? '');
    if (!kind) throw data('The defect guide has no such defect', { status: 404 });
    void queryClient.prefetchQuery(guidePhotoQueries.examples(params.workshopId ?? '', kind.id));
    return null;
  };

export default function GuideKindPage() {
  const { workshopId = '', kindId = '' } = useParams();
  const user = useCurrentUser();
  const kind = findDefectKind(kindId);
  if (!kind || !user) return null;
  return <DefectKindGuide key={kind.id} workshopId={workshopId} kind={kind} temperatureUnit={user.temperatureUnit} />;
}
