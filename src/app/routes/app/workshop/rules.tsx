import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { diagnosisQueries } from '#src/features/diagnosis/api/diagnosis-queries.ts';
import { WorkshopRules } from '#src/features/diagnosis/components/workshop-rules.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    void queryClient.prefetchQuery(diagnosisQueries.rules(params.workshopId ?? ''));
    return null;
  };

export default function RulesPage() {
  const { workshopId = '' } = useParams();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const role = workshops.find((w) => w.id === workshopId)?.role;
  return (
    <>
      <PageHeader title="Rules" description="How the likely causes are ranked here: the shipped rules, this workshop's changes and its own rules." />
      <QueryBoundary loading={<SkeletonGroup label="Loading the rules" lines={8} />}>
        <WorkshopRules workshopId={workshopId} canEdit={role === 'mentor' || role === 'admin'} />
      </QueryBoundary>
    </>
  );
}
