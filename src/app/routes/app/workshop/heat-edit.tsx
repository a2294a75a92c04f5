import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { toast } from 'sonner';
import { can } from '#shared/auth/permissions.ts';
import type { Actor } from '#shared/auth/roles.ts';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { heatQueries } from '#src/features/heats/api/heat-queries.ts';
import { useUpdateHeat } from '#src/features/heats/api/use-update-heat.ts';
import { HeatForm } from '#src/features/heats/components/heat-form.tsx';
import { HeatNotOpen } from '#src/features/heats/components/heat-not-open.tsx';
import { heatChangesOf, valuesFromHeat } from '#src/features/heats/lib/heat-form-values.ts';
import { castingQueries } from '#src/features/photos/api/casting-queries.ts';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';
import type { Units } from '#src/lib/unit-input.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    const workshopId = params.workshopId ?? '';
    void queryClient.prefetchQuery(heatQueries.detail(workshopId, params.heatId ?? ''));
    void queryClient.prefetchQuery(equipmentQueries.furnaceList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.crucibleList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.mouldList(workshopId));
    void queryClient.prefetchQuery(memberQueries.list(workshopId));
    return null;
  };

export default function HeatEditPage() {
  const { workshopId = '', heatId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <QueryBoundary loading={<SkeletonGroup label="Loading the heat" lines={10} />} fallback={(props) => <HeatNotOpen {...props} workshopId={workshopId} />}>
      <EditHeat
        key={heatId}
        workshopId={workshopId}
        heatId={heatId}
        actor={{ id: user.id, role: workshop.role }}
        units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }}
      />
    </QueryBoundary>
  );
}

function EditHeat({ workshopId, heatId, actor, units }: { workshopId: string; heatId: string; actor: Actor; units: Units }) {
  const navigate = useNavigate();
  const { data: heat } = useSuspenseQuery(heatQueries.detail(workshopId, heatId));
  const { data: furnaces } = useSuspenseQuery(equipmentQueries.furnaceList(workshopId));
  const { data: crucibles } = useSuspenseQuery(equipmentQueries.crucibleList(workshopId));
  const { data: moulds } = useSuspenseQuery(equipmentQueries.mouldList(workshopId));
  const { data: members } = useSuspenseQuery(memberQueries.list(workshopId));
  const updateHeat = useUpdateHeat(workshopId, heatId, { invalidateAlso: [equipmentQueries.all(), castingQueries.heats()] });
  const back = paths.heat.getHref(workshopId, heatId);

  if (!can(actor, 'update', 'heat', { ownerId: heat.casterId })) {
    return (
      <>
        <PageHeader title={`${heat.alloy} heat`} />
        <Notice tone="info" title="You can read this heat but not change it">
          <p>
            Only {heat.casterName} or an admin can edit it. <TextLink to={back}>Back to the heat</TextLink>
          </p>
        </Notice>
      </>
    );
  }

  return (
    <>
      <PageHeader title={`Edit the ${heat.alloy} heat`} description="Only what you change is saved." actions={<TextLink to={back}>Back to the heat</TextLink>} />
      <HeatForm
        workshopId={workshopId}
        units={units}
        defaultValues={valuesFromHeat(heat, units)}
        equipment={{ furnaces, crucibles, moulds }}
        casters={
          can(actor, 'update', 'heat', { ownerId: '' })
            ? members.map((m) => ({ userId: m.userId, displayName: m.userId === actor.id ? `${m.displayName} (you)` : m.displayName }))
            : undefined
        }
        defaultMouldId={heat.castings.find((k) => k.mouldId)?.mouldId ?? null}
        storedCrucibleCycle={heat.crucibleId ? { crucibleId: heat.crucibleId, cycle: heat.figures.crucibleCycle } : undefined}
        submitLabel="Save the changes"
        pendingLabel="Saving…"
        onSave={async (saved, { values, dirtyFields }) => {
          await updateHeat.mutateAsync(heatChangesOf(saved, values, dirtyFields as Parameters<typeof heatChangesOf>[2], heat));
          toast.success('Heat saved.');
          navigate(back);
        }}
      />
    </>
  );
}
