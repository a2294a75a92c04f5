import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { ArrowLeft } from 'lucide-react';
import { data, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { LikelyCausesView } from '#src/features/diagnosis/components/likely-causes-view.tsx';
import { reportQueries } from '#src/features/reports/api/report-queries.ts';
import { ReportView } from '#src/features/reports/components/report-view.tsx';
import { memberQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { isApiError } from '#src/lib/api-client.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshopId = params.workshopId ?? '';
    try {
      await queryClient.ensureQueryData(reportQueries.detail(workshopId, params.reportId ?? ''));
    } catch (error) {
      if (isApiError(error) && (error.status === 404 || error.status === 400)) throw data('This report is not open to you, or no longer exists', { status: 404 });
      throw error;
    }
    void queryClient.prefetchQuery(reportQueries.comments(workshopId, params.reportId ?? ''));
    return null;
  };

export default function ReportPage() {
  const { workshopId = '', reportId = '' } = useParams();
  const user = useCurrentUser();
  const { data: report } = useSuspenseQuery(reportQueries.detail(workshopId, reportId));
  const members = useQuery(memberQueries.list(workshopId));
  if (!user) return null;
  return (
    <>
      <PageHeader
        title={report.title}
        description="A defect report: the photos and marks, the question, the likely causes and the review."
        actions={
          <ButtonLink to={paths.reports.getHref(workshopId)} icon={<ArrowLeft aria-hidden className="size-4" />}>
            Reports
          </ButtonLink>
        }
      />
      <ReportView
        key={reportId}
        workshopId={workshopId}
        reportId={reportId}
        currentUserId={user.id}
        members={(members.data ?? []).filter((m) => m.userId !== user.id)}
        renderDiagnosis={(diagnosis, heading) => (
          <LikelyCausesView diagnosis={diagnosis} temperatureUnit={user.temperatureUnit} heading={heading} withWhatIf={heading !== 'Likely causes' ? false : true} openCount={2} />
        )}
      />
    </>
  );
}
