import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { ArrowLeft, Pencil, Trash2 } from 'lucide-react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { toast } from 'sonner';
import { can } from '#shared/auth/permissions.ts';
import type { Actor } from '#shared/auth/roles.ts';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { ConfirmInline } from '#src/components/ui/confirm-inline.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { PageSkeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { heatQueries } from '#src/features/heats/api/heat-queries.ts';
import { useDeleteHeat } from '#src/features/heats/api/use-delete-heat.ts';
import { HeatDetailView } from '#src/features/heats/components/heat-detail-view.tsx';
import { HeatNotOpen } from '#src/features/heats/components/heat-not-open.tsx';
import { castingQueries } from '#src/features/photos/api/casting-queries.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { ownWorkshop } from '#src/features/workshops/lib/own-workshop.ts';
import { formatDateTime } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    if (!(await ownWorkshop(queryClient, params.workshopId))) return null;
    void queryClient.prefetchQuery(heatQueries.detail(params.workshopId ?? '', params.heatId ?? ''));
    return null;
  };

export default function HeatDetailPage() {
  const { workshopId = '', heatId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <QueryBoundary loading={<PageSkeleton label="Loading the heat" />} fallback={(props) => <HeatNotOpen {...props} workshopId={workshopId} />}>
      <HeatPage
        key={heatId}
        workshopId={workshopId}
        heatId={heatId}
        actor={{ id: user.id, role: workshop.role }}
        units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }}
      />
    </QueryBoundary>
  );
}

function HeatPage({ workshopId, heatId, actor, units }: { workshopId: string; heatId: string; actor: Actor; units: Units }) {
  const navigate = useNavigate();
  const { data: heat } = useSuspenseQuery(heatQueries.detail(workshopId, heatId));
  // The casting pages keep their own copy of the heat, and the equipment its counts.
  const deleteHeat = useDeleteHeat(workshopId, { invalidateAlso: [equipmentQueries.all(), castingQueries.heats()] });
  // Casters and students change their own heats, admins anyone's; a mentor reads a mentee's heat only.
  const owner = { ownerId: heat.casterId };
  const mayEdit = can(actor, 'update', 'heat', owner);
  const mayDelete = can(actor, 'delete', 'heat', owner);

  return (
    <>
      <PageHeader
        title={`${heat.alloy} heat`}
        description={`Poured ${formatDateTime(heat.pouredAt)} by ${heat.casterId === actor.id ? 'you' : heat.casterName}.`}
        actions={
          <>
            <ButtonLink to={paths.heats.getHref(workshopId)} icon={<ArrowLeft aria-hidden className="size-4" />}>
              Heat log
            </ButtonLink>
            {mayEdit ? (
              <ButtonLink to={paths.heatEdit.getHref(workshopId, heat.id)} icon={<Pencil aria-hidden className="size-4" />}>
                Edit
              </ButtonLink>
            ) : null}
          </>
        }
      />
      {!mayEdit ? (
        <Notice tone="info" title="You can read this heat" className="mb-6">
          <p>Only {heat.casterName} or an admin of the workshop can change it.</p>
        </Notice>
      ) : null}
      <HeatDetailView heat={heat} workshopId={workshopId} units={units} />
      {mayDelete ? (
        <div className="mt-8 border-t border-line pt-4">
          <ConfirmInline
            trigger="Delete this heat"
            triggerIcon={<Trash2 aria-hidden className="size-4" />}
            question={`Delete this heat and its ${heat.castings.length} ${heat.castings.length === 1 ? 'casting' : 'castings'}? This cannot be undone.`}
            confirmLabel="Yes, delete the heat"
            pending={deleteHeat.isPending}
            onConfirm={() =>
              deleteHeat.mutate(heat.id, {
                onSuccess: () => {
                  toast.success('Heat deleted.');
                  navigate(paths.heats.getHref(workshopId), { replace: true });
                },
                onError: (error) => toast.error(`Not deleted: ${errorMessage(error)}`),
              })
            }
          />
        </div>
      ) : null}
    </>
  );
}

