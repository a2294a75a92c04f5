import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { PageSkeleton, SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { CrucibleDetailView } from '#src/features/equipment/components/crucible-detail-view.tsx';
import { EquipmentNotFound } from '#src/features/equipment/components/equipment-not-found.tsx';
import { CrucibleHeatList } from '#src/features/heats/components/crucible-heat-list.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    void queryClient.prefetchQuery(equipmentQueries.crucibleDetail(params.workshopId ?? '', params.crucibleId ?? ''));
    return null;
  };

export default function CrucibleDetailPage() {
  const { workshopId = '', crucibleId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  const actor = { id: user.id, role: workshop.role };
  const units = { temperatureUnit: user.temperatureUnit, massUnit: user.massUnit };
  return (
    <QueryBoundary loading={<PageSkeleton label="Loading the crucible" />} fallback={(props) => <EquipmentNotFound {...props} workshopId={workshopId} what="crucible" />}>
      <CrucibleDetailView
        key={crucibleId}
        workshopId={workshopId}
        crucibleId={crucibleId}
        units={units}
        canManage={can(actor, 'update', 'equipment')}
        canAddNotes={can(actor, 'create', 'heat')}
        heats={
          <QueryBoundary loading={<SkeletonGroup label="Loading its heats" lines={4} />}>
            <CrucibleHeatList workshopId={workshopId} crucibleId={crucibleId} units={units} />
          </QueryBoundary>
        }
      />
    </QueryBoundary>
  );
}

