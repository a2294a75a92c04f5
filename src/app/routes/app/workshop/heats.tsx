import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import type { Actor } from '#shared/auth/roles.ts';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { Skeleton, SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { heatQueries } from '#src/features/heats/api/heat-queries.ts';
import { HeatLog } from '#src/features/heats/components/heat-log.tsx';
import { filterFromSearch } from '#src/features/heats/lib/heat-filters.ts';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';
import type { Units } from '#src/lib/unit-input.ts';

/** Starts the log (with the URL's filters) and the filter choices loading with the page. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    const workshopId = params.workshopId ?? '';
    void queryClient.prefetchInfiniteQuery(heatQueries.infinite(workshopId, filterFromSearch(new URL(request.url).searchParams)));
    void queryClient.prefetchQuery(memberQueries.list(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.furnaceList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.crucibleList(workshopId));
    return null;
  };

export default function HeatsPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  const actor: Actor = { id: user.id, role: workshop.role };
  return (
    <>
      <PageHeader title="Heats" description="The heat log: one entry for each melt, with its castings and figures." />
      <QueryBoundary loading={<HeatLogSkeleton />}>
        <HeatLogWithChoices workshopId={workshopId} actor={actor} units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }} />
      </QueryBoundary>
    </>
  );
}

function HeatLogWithChoices({ workshopId, actor, units }: { workshopId: string; actor: Actor; units: Units }) {
  const { data: members } = useSuspenseQuery(memberQueries.list(workshopId));
  const { data: furnaces } = useSuspenseQuery(equipmentQueries.furnaceList(workshopId));
  const { data: crucibles } = useSuspenseQuery(equipmentQueries.crucibleList(workshopId));
  // Only people whose heats this member may read are worth filtering by.
  const casters = members.filter((m) => can(actor, 'read', 'heat', { ownerId: m.userId, ownerMentorIds: m.mentorIds }));
  return <HeatLog workshopId={workshopId} units={units} choices={{ casters, furnaces, crucibles }} canLog={can(actor, 'create', 'heat')} />;
}

function HeatLogSkeleton() {
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap gap-3">
        <Skeleton className="h-12 w-36" />
        <Skeleton className="h-12 w-40" />
      </div>
      <Skeleton className="h-12 w-full" />
      <SkeletonGroup label="Loading the heat log" lines={8} />
    </div>
  );
}
