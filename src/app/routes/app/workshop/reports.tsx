import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { ClipboardList, Inbox, Zap } from 'lucide-react';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { DEFECT_KIND_IDS, type DefectKindId } from '#shared/domain/index.ts';
import { REPORT_STATES, type ReportState } from '#shared/reports/report-states.ts';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { reportQueries, type ReportFilters } from '#src/features/reports/api/report-queries.ts';
import { ReportList } from '#src/features/reports/components/report-list.tsx';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';

function filtersFrom(search: URLSearchParams): ReportFilters {
  const state = search.get('state');
  const defect = search.get('defect');
  return {
    state: REPORT_STATES.includes(state as ReportState) ? (state as ReportState) : undefined,
    studentId: search.get('student') ?? undefined,
    defect: DEFECT_KIND_IDS.includes(defect as DefectKindId) ? (defect as DefectKindId) : undefined,
  };
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    void queryClient.prefetchInfiniteQuery(reportQueries.infinite(params.workshopId ?? '', filtersFrom(new URL(request.url).searchParams)));
    return null;
  };

export default function ReportsPage() {
  const { workshopId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  const reviewer = workshop?.role === 'mentor' || workshop?.role === 'admin';
  const members = useQuery({ ...memberQueries.list(workshopId), enabled: reviewer });
  const students = (members.data ?? []).filter((m) => m.role === 'student' || m.role === 'caster');
  const filters = filtersFrom(search);
  return (
    <>
      <PageHeader
        title="Reports"
        description="Defect reports: questions about castings, and their answers."
        actions={
          <div className="flex flex-wrap gap-2">
            <ButtonLink to={paths.quickCheck.getHref(workshopId)} variant="primary" icon={<Zap aria-hidden className="size-4" />}>
              Quick check
            </ButtonLink>
            {reviewer ? (
              <ButtonLink to={paths.review.getHref(workshopId)} icon={<Inbox aria-hidden className="size-4" />}>
                Review queue
              </ButtonLink>
            ) : null}
          </div>
        }
      />
      <QueryBoundary loading={<SkeletonGroup label="Loading the reports" lines={6} />}>
        <ReportList
          workshopId={workshopId}
          filters={filters}
          students={students}
          onFiltersChange={(f) => {
            const next = new URLSearchParams();
            if (f.state) next.set('state', f.state);
            if (f.studentId) next.set('student', f.studentId);
            if (f.defect) next.set('defect', f.defect);
            setSearch(next, { replace: true });
          }}
          reportHref={(id) => paths.report.getHref(workshopId, id)}
          studentHref={reviewer ? (userId) => paths.student.getHref(workshopId, userId) : undefined}
          empty={
            <EmptyState
              icon={ClipboardList}
              title="No defect reports yet"
              firstStep={
                <p>
                  Start a <TextLink to={paths.quickCheck.getHref(workshopId)}>quick check</TextLink>: photograph the casting, mark the defect, answer a few
                  questions, then ask a mentor.
                </p>
              }
            >
              <p>
                A report asks “what went wrong with this casting?”. It holds the casting's photos and marks, the likely causes read from its heat, each with its
                evidence and a fix to try.
              </p>
              <p>
                A report moves from draft to submitted, in review and resolved. Students' reports go to their mentors' review queue, where a mentor comments and
                records the confirmed cause.
              </p>
            </EmptyState>
          }
        />
      </QueryBoundary>
    </>
  );
}
