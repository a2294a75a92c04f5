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
import { useCreateHeat } from '#src/features/heats/api/use-create-heat.ts';
import { HeatForm } from '#src/features/heats/components/heat-form.tsx';
import { valuesFromDefaults } from '#src/features/heats/lib/heat-form-values.ts';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';
import { formatDateTime } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    const workshopId = params.workshopId ?? '';
    void queryClient.prefetchQuery(heatQueries.lastDefaults(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.furnaceList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.crucibleList(workshopId));
    void queryClient.prefetchQuery(equipmentQueries.mouldList(workshopId));
    void queryClient.prefetchQuery(memberQueries.list(workshopId));
    return null;
  };

export default function HeatNewPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <>
      <PageHeader title="Log a heat" description="Fill it in as you go; the figures work themselves out beside the readings." />
      <QueryBoundary loading={<SkeletonGroup label="Loading the heat form" lines={10} />}>
        <NewHeat
          workshopId={workshopId}
          actor={{ id: user.id, role: workshop.role }}
          units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }}
        />
      </QueryBoundary>
    </>
  );
}

function NewHeat({ workshopId, actor, units }: { workshopId: string; actor: Actor; units: Units }) {
  const navigate = useNavigate();
  const { data: defaults } = useSuspenseQuery(heatQueries.lastDefaults(workshopId));
  const { data: furnaces } = useSuspenseQuery(equipmentQueries.furnaceList(workshopId));
  const { data: crucibles } = useSuspenseQuery(equipmentQueries.crucibleList(workshopId));
  const { data: moulds } = useSuspenseQuery(equipmentQueries.mouldList(workshopId));
  // A heat changes the equipment's counts (crucible cycles, heats per furnace, castings per mould).
  const createHeat = useCreateHeat(workshopId, { invalidateAlso: [equipmentQueries.all()] });
  const { data: members } = useSuspenseQuery(memberQueries.list(workshopId));
  // Logging for someone else takes the right to change anyone's heats (admins); an owner no one is checks exactly that.
  const logsForOthers = can(actor, 'update', 'heat', { ownerId: '' });

  return (
    <>
      <HeatForm
        workshopId={workshopId}
        units={units}
        defaultValues={valuesFromDefaults(defaults, units)}
        equipment={{ furnaces, crucibles, moulds }}
        casters={logsForOthers ? members.filter((m) => m.userId !== actor.id) : undefined}
        defaultMouldId={defaults.mouldId}
        intro={
          defaults.basedOnHeatId ? (
            <Notice tone="info" title="Started from your last heat">
              <p>
                The alloy, furnace, crucible, setpoint, flux, degassing and mould are as in{' '}
                <TextLink to={paths.heat.getHref(workshopId, defaults.basedOnHeatId)}>your last heat</TextLink>. Change anything that differs today.
              </p>
            </Notice>
          ) : null
        }
        submitLabel="Save the heat"
        pendingLabel="Saving…"
        onSave={async (saved) => {
          const heat = await createHeat.mutateAsync(saved);
          toast.success(`Heat logged: ${heat.alloy}, ${formatDateTime(heat.pouredAt)}.`);
          navigate(paths.heat.getHref(workshopId, heat.id));
        }}
      />
    </>
  );
}

