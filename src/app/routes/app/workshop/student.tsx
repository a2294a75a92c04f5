import { useQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { reportQueries } from '#src/features/reports/api/report-queries.ts';
import { StudentOverview } from '#src/features/reports/components/student-overview.tsx';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    void queryClient.prefetchQuery(reportQueries.student(params.workshopId ?? '', params.userId ?? ''));
    return null;
  };

export default function StudentPage() {
  const { workshopId = '', userId = '' } = useParams();
  const overview = useQuery(reportQueries.student(workshopId, userId));
  return (
    <>
      <PageHeader title={overview.data?.student.displayName ?? 'Student'} description="Heats, defect reports and the defects marked, month by month." />
      <QueryBoundary loading={<SkeletonGroup label="Loading the student's overview" lines={6} />}>
        <StudentOverview workshopId={workshopId} userId={userId} reportHref={(id) => paths.report.getHref(workshopId, id)} />
      </QueryBoundary>
    </>
  );
}
