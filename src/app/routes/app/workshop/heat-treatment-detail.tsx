import { useQueries, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { ArrowLeft } from 'lucide-react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import type { Actor } from '#shared/auth/roles.ts';
import type { TemperatureUnit } from '#shared/domain/index.ts';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { ErrorPanel, type ErrorFallbackProps } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { PageSkeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { heatTreatmentQueries } from '#src/features/heat-treatment/api/heat-treatment-queries.ts';
import { HeatTreatmentRecordView, type PhotoOption } from '#src/features/heat-treatment/components/heat-treatment-record-view.tsx';
import { photoQueries } from '#src/features/photos/api/photo-queries.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDate } from '#src/lib/format.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    void queryClient.prefetchQuery(heatTreatmentQueries.detail(params.workshopId ?? '', params.heatTreatmentId ?? ''));
    return null;
  };

const back = (workshopId: string) => (
  <ButtonLink to={paths.heatTreatment.getHref(workshopId)} icon={<ArrowLeft aria-hidden className="size-4" />}>
    All plans
  </ButtonLink>
);

export default function HeatTreatmentDetailPage() {
  const { workshopId = '', heatTreatmentId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <QueryBoundary loading={<PageSkeleton label="Loading the plan" />} fallback={(props) => <PlanNotOpen {...props} workshopId={workshopId} />}>
      <Detail workshopId={workshopId} id={heatTreatmentId} actor={{ id: user.id, role: workshop.role }} unit={user.temperatureUnit} />
    </QueryBoundary>
  );
}

function Detail({ workshopId, id, actor, unit }: { workshopId: string; id: string; actor: Actor; unit: TemperatureUnit }) {
  const { data: plan } = useSuspenseQuery(heatTreatmentQueries.detail(workshopId, id));
  // Photos of the plan's castings, composed here from the photos feature, so the record can link them to its outcome.
  const photoLists = useQueries({ queries: plan.castings.map((c) => photoQueries.list(workshopId, { castingId: c.id })) });
  const photoOptions: PhotoOption[] = plan.castings.flatMap((c, i) =>
    (photoLists[i]?.data?.items ?? []).map((p) => ({
      id: p.id,
      castingId: c.id,
      label: `Casting No. ${c.number}: ${p.title ?? p.fileName ?? 'photo'} (${formatDate(p.createdAt)})`,
    })),
  );
  return (
    <>
      <PageHeader
        title={`${plan.alloy} ${plan.temper} in ${plan.oven}`}
        description={plan.plan.description}
        actions={back(workshopId)}
      />
      <HeatTreatmentRecordView
        workshopId={workshopId}
        plan={plan}
        unit={unit}
        mayRecord={can(actor, 'update', 'heat', { ownerId: plan.casterId })}
        photoOptions={photoOptions}
      />
    </>
  );
}

function PlanNotOpen({ error, reset, workshopId }: ErrorFallbackProps & { workshopId: string }) {
  if (isApiError(error) && (error.status === 404 || error.status === 400)) {
    return (
      <>
        <PageHeader title="Plan not found" actions={back(workshopId)} />
        <Notice tone="info" title="This plan is not open to you, or no longer exists">
          <p>Casters and students see their own plans; mentors see their students’ plans; admins see every plan.</p>
        </Notice>
      </>
    );
  }
  return <ErrorPanel error={error} reset={reset} title="The plan did not load" />;
}
