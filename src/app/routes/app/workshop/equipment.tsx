import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { EquipmentOverview } from '#src/features/equipment/components/equipment-overview.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    const workshopId = params.workshopId ?? '';
    void queryClient.prefetchQuery(equipmentQueries.furnaceList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.crucibleList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.mouldList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.crucibleLimits(workshopId));
    return null;
  };

export default function EquipmentPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  const actor = { id: user.id, role: workshop.role };
  return (
    <>
      <PageHeader title="Equipment" description="Furnaces, crucibles and moulds: what each heat names, and the life each crucible has had." />
      <QueryBoundary loading={<SkeletonGroup label="Loading the equipment" lines={8} />}>
        <EquipmentOverview
          workshopId={workshopId}
          units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }}
          canManage={can(actor, 'create', 'equipment')}
          // Limits apply to every crucible in the workshop, so they are the workshop admins' setting.
          canSetLimits={can(actor, 'update', 'workshop')}
        />
      </QueryBoundary>
    </>
  );
}
