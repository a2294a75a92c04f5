import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { reportQueries } from '#src/features/reports/api/report-queries.ts';
import { ReviewQueue } from '#src/features/reports/components/review-queue.tsx';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    void queryClient.prefetchQuery(reportQueries.reviewQueue(params.workshopId ?? ''));
    return null;
  };

export default function ReviewPage() {
  const { workshopId = '' } = useParams();
  return (
    <>
      <PageHeader title="Review queue" description="Reports waiting for you, oldest first." />
      <QueryBoundary loading={<SkeletonGroup label="Loading the review queue" lines={5} />}>
        <ReviewQueue
          workshopId={workshopId}
          reportHref={(id) => paths.report.getHref(workshopId, id)}
          studentHref={(userId) => paths.student.getHref(workshopId, userId)}
        />
      </QueryBoundary>
    </>
  );
}
