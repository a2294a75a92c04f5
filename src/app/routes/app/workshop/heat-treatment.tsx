import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { Thermometer } from 'lucide-react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { findAlloy } from '#shared/domain/index.ts';
import { Card } from '#src/components/ui/card.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { heatTreatmentQueries } from '#src/features/heat-treatment/api/heat-treatment-queries.ts';
import { HeatTreatmentCautions } from '#src/features/heat-treatment/components/heat-treatment-cautions.tsx';
import { HeatTreatmentList } from '#src/features/heat-treatment/components/heat-treatment-list.tsx';
import { PlanForm } from '#src/features/heat-treatment/components/plan-form.tsx';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshopId = params.workshopId ?? '';
    void queryClient.prefetchQuery(heatTreatmentQueries.list(workshopId));
    void queryClient.prefetchQuery(heatTreatmentQueries.candidates(workshopId));
    return null;
  };

export default function HeatTreatmentPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  if (!user) return null;
  return (
    <>
      <PageHeader
        title="Heat treatment"
        description="Heat-treatment plans from the alloy’s published schedules, and the record of what the oven and the quench tank actually did."
      />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="flex min-w-0 flex-col gap-6">
          <QueryBoundary loading={<SkeletonGroup label="Loading the plans" lines={4} />}>
            <Plans workshopId={workshopId} user={user} />
          </QueryBoundary>
          <Card title="Plan a heat treatment" description="Pick the alloy, a temper its schedules give, and the castings that go in the oven together.">
            <QueryBoundary loading={<SkeletonGroup label="Loading your castings" lines={4} />}>
              <NewPlan workshopId={workshopId} user={user} />
            </QueryBoundary>
          </Card>
        </div>
        <HeatTreatmentCautions unit={user.temperatureUnit} solidusC={findAlloy('A356.0')?.solidusC} designation="A356.0" hasQuench />
      </div>
    </>
  );
}

function Plans({ workshopId, user }: { workshopId: string; user: CurrentUser }) {
  const { data: plans } = useSuspenseQuery(heatTreatmentQueries.list(workshopId));
  if (!plans.length) {
    return (
      <EmptyState
        icon={Thermometer}
        title="No heat-treatment plans yet"
        firstStep={
          <p>
            Log the heat and its castings in the <TextLink to={paths.heats.getHref(workshopId)}>heat log</TextLink>, then plan the treatment below:
            the steps come from the alloy’s published schedule, and a printable sheet goes to the oven with blanks for the actual times.
          </p>
        }
      >
        <p>
          A plan lists the steps for an alloy and temper, such as A356.0 T6: solution treatment, quench and ageing, each with its temperature and time.
          The record beside it logs what actually happened, and flags what strayed: an oven too hot, a quench too slow.
        </p>
      </EmptyState>
    );
  }
  return (
    <Card title="Plans and records">
      <HeatTreatmentList workshopId={workshopId} plans={plans} currentUserId={user.id} />
    </Card>
  );
}

function NewPlan({ workshopId, user }: { workshopId: string; user: CurrentUser }) {
  const { data: candidates } = useSuspenseQuery(heatTreatmentQueries.candidates(workshopId));
  return <PlanForm workshopId={workshopId} candidates={candidates} units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }} />;
}
