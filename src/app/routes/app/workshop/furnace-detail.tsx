import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Card } from '#src/components/ui/card.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { PageSkeleton, Skeleton } from '#src/components/ui/skeleton.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { EquipmentNotFound } from '#src/features/equipment/components/equipment-not-found.tsx';
import { FurnaceSummary } from '#src/features/equipment/components/furnace-summary.tsx';
import { heatQueries } from '#src/features/heats/api/heat-queries.ts';
import { FurnaceOffsetHistory } from '#src/features/heats/components/furnace-offset-history.tsx';
import { SetpointSuggester } from '#src/features/heats/components/setpoint-suggester.tsx';
import { DEFAULT_SORT } from '#src/features/heats/lib/heat-filters.ts';
import { SETPOINT_HISTORY_HEATS } from '#shared/heats/heat-schemas.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';
import type { Units } from '#src/lib/unit-input.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    const workshopId = params.workshopId ?? '';
    const furnaceId = params.furnaceId ?? '';
    void queryClient.prefetchQuery(equipmentQueries.furnaceDetail(workshopId, furnaceId));
    void queryClient.prefetchQuery(heatQueries.list(workshopId, { ...DEFAULT_SORT, furnaceId }, SETPOINT_HISTORY_HEATS));
    return null;
  };

export default function FurnaceDetailPage() {
  const { workshopId = '', furnaceId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  const units = { temperatureUnit: user.temperatureUnit, massUnit: user.massUnit };
  return (
    <QueryBoundary loading={<PageSkeleton label="Loading the furnace" />} fallback={(props) => <EquipmentNotFound {...props} workshopId={workshopId} what="furnace" />}>
      <FurnacePage key={furnaceId} workshopId={workshopId} furnaceId={furnaceId} units={units} />
    </QueryBoundary>
  );
}

function FurnacePage({ workshopId, furnaceId, units }: { workshopId: string; furnaceId: string; units: Units }) {
  const { data: furnace } = useSuspenseQuery(equipmentQueries.furnaceDetail(workshopId, furnaceId));
  return (
    <>
      <FurnaceSummary workshopId={workshopId} furnaceId={furnaceId} />
      <div className="flex max-w-4xl flex-col gap-6">
        <Card
          title="Setpoint for a pour"
          description="From the furnace offset: the median gap between setpoint and pour temperature over its newest heats, everyone’s."
        >
          <SetpointSuggester workshopId={workshopId} furnace={furnace} units={units} />
        </Card>
        <Card title="Furnace offset, heat by heat" description="The heats on this furnace you can see, with both a setpoint and a pour temperature.">
          <QueryBoundary loading={<Skeleton className="h-56 w-full" />}>
            <FurnaceOffsetHistory workshopId={workshopId} furnaceId={furnaceId} units={units} />
          </QueryBoundary>
        </Card>
      </div>
    </>
  );
}
