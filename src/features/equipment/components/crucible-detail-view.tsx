import { useSuspenseQuery } from '@tanstack/react-query';
import { Archive, ArchiveRestore } from 'lucide-react';
import type { ReactNode } from 'react';
import { toast } from 'sonner';
import { formatMass } from '#shared/domain/index.ts';
import { CRUCIBLE_MATERIAL_LABELS } from '#shared/heats/crucible-life.ts';
import { CRUCIBLE_SHOCK_LABELS } from '#shared/heats/equipment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Caution } from '#src/components/ui/caution.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { equipmentQueries } from '../api/equipment-queries.ts';
import { useUpdateCrucible } from '../api/use-update-crucible.ts';
import { ConfirmInline } from '#src/components/ui/confirm-inline.tsx';
import { CrucibleLifeBar } from './crucible-life-bar.tsx';
import { CrucibleNotes } from './crucible-notes.tsx';

type CrucibleDetailViewProps = {
  workshopId: string;
  crucibleId: string;
  units: Units;
  canManage: boolean;
  canAddNotes: boolean;
  /** The heats it went through, from the heat log (composed by the route). */
  heats: ReactNode;
};

/** A crucible's life: cycles against its limits, shocks, condition notes and retirement. */
export function CrucibleDetailView({ workshopId, crucibleId, units, canManage, canAddNotes, heats }: CrucibleDetailViewProps) {
  const { data: crucible } = useSuspenseQuery(equipmentQueries.crucibleDetail(workshopId, crucibleId));
  const update = useUpdateCrucible(workshopId);
  const setRetired = (retired: boolean) =>
    update.mutate(
      { crucibleId, input: { retired } },
      {
        onSuccess: () => toast.success(retired ? `${crucible.name} retired.` : `${crucible.name} is back in service.`),
        onError: (error) => toast.error(`Not changed: ${errorMessage(error)}`),
      },
    );

  return (
    <>
      <PageHeader
        title={crucible.name}
        description={[
          CRUCIBLE_MATERIAL_LABELS[crucible.material],
          crucible.capacityG === null ? null : `holds ${formatMass(crucible.capacityG, units.massUnit)}`,
          crucible.inServiceSince ? `in service since ${formatDate(crucible.inServiceSince)}` : null,
        ]
          .filter(Boolean)
          .join(' · ')}
        actions={<TextLink to={paths.equipment.getHref(workshopId)}>All equipment</TextLink>}
      />
      <div className="flex max-w-3xl flex-col gap-6">
        <Caution heading="Inspect it before each melt" level={crucible.status === 'past-limit' ? 'danger' : 'caution'} safetySection="crucibles">
          Look inside and out for cracks and thinned walls. A crucible that was dropped or got wet is retired, even if it looks whole. Follow the
          maker’s instructions for preheating, charging and care.
        </Caution>
        <Card title="Crucible life">
          <div className="flex flex-col gap-4">
            <CrucibleLifeBar crucible={crucible} />
            <p className="text-body text-ink">
              {crucible.lastShock ? (
                <>
                  Last shock: {CRUCIBLE_SHOCK_LABELS[crucible.lastShock.kind]} on{' '}
                  <TextLink to={paths.heat.getHref(workshopId, crucible.lastShock.heatId)}>{formatDate(crucible.lastShock.pouredAt)}</TextLink>. Look it over for
                  cracks before the next melt.
                </>
              ) : (
                'No fast heat-up or quench logged for it.'
              )}
            </p>
            {canManage ? (
              crucible.retired ? (
                <Button className="self-start" icon={<ArchiveRestore aria-hidden className="size-4" />} pending={update.isPending} onClick={() => setRetired(false)}>
                  Put it back in service
                </Button>
              ) : (
                <ConfirmInline
                  trigger="Retire this crucible"
                  triggerIcon={<Archive aria-hidden className="size-4" />}
                  question={`Retire ${crucible.name}? It stays in the heats that used it and is no longer offered for new ones.`}
                  confirmLabel="Yes, retire it"
                  pending={update.isPending}
                  onConfirm={() => setRetired(true)}
                />
              )
            ) : null}
          </div>
        </Card>
        <Card title="Condition notes" description="What inspections found, with the day they were seen.">
          <CrucibleNotes workshopId={workshopId} crucible={crucible} canAdd={canAddNotes} />
        </Card>
        <Card title="Heats in this crucible" description="Newest first; heats that shocked it are marked.">
          {heats}
        </Card>
      </div>
    </>
  );
}
