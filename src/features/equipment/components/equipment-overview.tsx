import { useSuspenseQuery } from '@tanstack/react-query';
import { Archive, ArchiveRestore, Pencil, Plus, Trash2, Wrench } from 'lucide-react';
import { useState } from 'react';
import { toast } from 'sonner';
import { MOLD_MATERIAL_LABELS, formatMass } from '#shared/domain/index.ts';
import { CRUCIBLE_MATERIAL_LABELS } from '#shared/heats/crucible-life.ts';
import { CRUCIBLE_SHOCK_LABELS, FURNACE_KIND_LABELS, type Crucible, type Furnace, type Mould } from '#shared/heats/equipment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Caution } from '#src/components/ui/caution.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { equipmentQueries } from '../api/equipment-queries.ts';
import { useDeleteCrucible } from '../api/use-delete-crucible.ts';
import { useDeleteFurnace } from '../api/use-delete-furnace.ts';
import { useDeleteMould } from '../api/use-delete-mould.ts';
import { useUpdateCrucible } from '../api/use-update-crucible.ts';
import { ConfirmInline } from '#src/components/ui/confirm-inline.tsx';
import { CrucibleLifeBar } from './crucible-life-bar.tsx';
import { CrucibleLimitsForm } from './crucible-limits-form.tsx';
import { CrucibleForm, FurnaceForm, MouldForm } from './equipment-forms.tsx';

type EquipmentOverviewProps = {
  workshopId: string;
  units: Units;
  /** Casters and admins look after the equipment; everyone else reads it. */
  canManage: boolean;
  /** The workshop-wide crucible limits are an admin's call. */
  canSetLimits: boolean;
};

/** The equipment page: furnaces, crucibles with their life, moulds, and the crucible limits. */
export function EquipmentOverview({ workshopId, units, canManage, canSetLimits }: EquipmentOverviewProps) {
  const { data: furnaces } = useSuspenseQuery(equipmentQueries.furnaceList(workshopId));
  const { data: crucibles } = useSuspenseQuery(equipmentQueries.crucibleList(workshopId));
  const { data: moulds } = useSuspenseQuery(equipmentQueries.mouldList(workshopId));
  const nothingYet = furnaces.length === 0 && crucibles.length === 0 && moulds.length === 0;

  return (
    <div className="flex flex-col gap-6">
      {nothingYet ? (
        <EmptyState
          icon={Wrench}
          title="No equipment yet"
          firstStep={
            canManage ? (
              <p>Add the furnace you melt in and every crucible you use, with its size, so heats can name them. Moulds with their capacity give a weigh-out on the heat form.</p>
            ) : (
              <p>A caster or an admin of the workshop adds the furnaces, crucibles and moulds; ask one to list them.</p>
            )
          }
        >
          <p>
            Each furnace keeps its furnace offset: how far the pour temperature ends up from its setpoint, so the next setpoint can be
            suggested. Each crucible keeps its crucible life: the heats it has been through, and what inspections found.
          </p>
        </EmptyState>
      ) : null}
      <FurnacesCard workshopId={workshopId} furnaces={furnaces} canManage={canManage} />
      <CruciblesCard workshopId={workshopId} crucibles={crucibles} units={units} canManage={canManage} />
      <MouldsCard workshopId={workshopId} moulds={moulds} units={units} canManage={canManage} />
      <Card title="Crucible limits" description="How many heats a crucible of each material goes through before a warning, and before it is due to retire.">
        <QueryBoundary loading={<SkeletonGroup label="Loading the crucible limits" lines={5} />}>
          <CrucibleLimitsForm workshopId={workshopId} editable={canSetLimits} />
        </QueryBoundary>
      </Card>
    </div>
  );
}

function AddButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <Button icon={<Plus aria-hidden className="size-4" />} onClick={onClick}>
      {label}
    </Button>
  );
}

/** What a failed or finished delete says. */
function deletedToasts(name: string) {
  return {
    onSuccess: () => toast.success(`${name} deleted.`),
    onError: (error: unknown) => toast.error(`Not deleted: ${errorMessage(error)}`),
  };
}

/** Edit, and delete behind a confirm for equipment no heat or casting uses. */
function EditOrDelete(props: { name: string; deletable: boolean; pending: boolean; onEdit: () => void; onDelete: () => void }) {
  return (
    <div className="flex flex-wrap gap-2">
      <Button size="sm" variant="quiet" icon={<Pencil aria-hidden className="size-4" />} onClick={props.onEdit}>
        Edit<span className="sr-only"> {props.name}</span>
      </Button>
      {props.deletable ? (
        <ConfirmInline
          trigger={<>Delete<span className="sr-only"> {props.name}</span></>}
          triggerIcon={<Trash2 aria-hidden className="size-4" />}
          question={`Delete ${props.name}?`}
          confirmLabel="Yes, delete"
          pending={props.pending}
          onConfirm={props.onDelete}
        />
      ) : null}
    </div>
  );
}

function FurnacesCard({ workshopId, furnaces, canManage }: { workshopId: string; furnaces: Furnace[]; canManage: boolean }) {
  const [editing, setEditing] = useState<string | 'new' | null>(null);
  const remove = useDeleteFurnace(workshopId);
  return (
    <Card title="Furnaces" actions={canManage && editing !== 'new' ? <AddButton label="Add a furnace" onClick={() => setEditing('new')} /> : null}>
      <div className="flex flex-col gap-4">
        {editing === 'new' ? <FurnaceForm workshopId={workshopId} onDone={() => setEditing(null)} /> : null}
        {furnaces.length === 0 ? <p className="text-body text-ink-muted">No furnaces listed yet.</p> : null}
        <ul className="flex flex-col divide-y divide-line">
          {furnaces.map((f) => (
            <li key={f.id} className="flex flex-col gap-2 py-3">
              {editing === f.id ? (
                <FurnaceForm workshopId={workshopId} existing={f} onDone={() => setEditing(null)} />
              ) : (
                <>
                  <div className="flex flex-wrap items-baseline justify-between gap-2">
                    <TextLink to={paths.furnace.getHref(workshopId, f.id)} className="text-lead">
                      {f.name}
                    </TextLink>
                    <span className="text-caption text-ink-muted">
                      {FURNACE_KIND_LABELS[f.kind]} · <span className="figures">{f.heatCount}</span> {f.heatCount === 1 ? 'heat' : 'heats'}
                    </span>
                  </div>
                  {f.notes ? <p className="max-w-prose text-body text-ink">{f.notes}</p> : null}
                  {canManage ? (
                    <EditOrDelete
                      name={f.name}
                      deletable={f.heatCount === 0}
                      pending={remove.isPending}
                      onEdit={() => setEditing(f.id)}
                      onDelete={() => remove.mutate(f.id, deletedToasts(f.name))}
                    />
                  ) : null}
                </>
              )}
            </li>
          ))}
        </ul>
      </div>
    </Card>
  );
}

function CruciblesCard({ workshopId, crucibles, units, canManage }: { workshopId: string; crucibles: Crucible[]; units: Units; canManage: boolean }) {
  const [editing, setEditing] = useState<string | 'new' | null>(null);
  const inService = crucibles.filter((c) => !c.retired);
  const retired = crucibles.filter((c) => c.retired);
  return (
    <Card title="Crucibles" actions={canManage && editing !== 'new' ? <AddButton label="Add a crucible" onClick={() => setEditing('new')} /> : null}>
      <div className="flex flex-col gap-4">
        <Caution heading="Inspect every crucible before each melt" safetySection="crucibles">
          Look inside and out for cracks and thinned walls. A crucible that was dropped or got wet is retired, even if it looks whole. Follow
          the maker’s instructions for preheating and care.
        </Caution>
        {editing === 'new' ? <CrucibleForm workshopId={workshopId} units={units} onDone={() => setEditing(null)} /> : null}
        {crucibles.length === 0 ? <p className="text-body text-ink-muted">No crucibles listed yet.</p> : null}
        <CrucibleList workshopId={workshopId} crucibles={inService} units={units} canManage={canManage} editing={editing} setEditing={setEditing} />
        {retired.length > 0 ? (
          <details>
            <summary className="inline-flex min-h-12 cursor-pointer items-center text-body font-semibold text-ink lg:min-h-10">
              Retired crucibles ({retired.length})
            </summary>
            <CrucibleList workshopId={workshopId} crucibles={retired} units={units} canManage={canManage} editing={editing} setEditing={setEditing} />
          </details>
        ) : null}
      </div>
    </Card>
  );
}

function CrucibleList({
  workshopId,
  crucibles,
  units,
  canManage,
  editing,
  setEditing,
}: {
  workshopId: string;
  crucibles: Crucible[];
  units: Units;
  canManage: boolean;
  editing: string | null;
  setEditing: (id: string | null) => void;
}) {
  const update = useUpdateCrucible(workshopId);
  const remove = useDeleteCrucible(workshopId);
  const setRetired = (c: Crucible, retiredNow: boolean) =>
    update.mutate(
      { crucibleId: c.id, input: { retired: retiredNow } },
      {
        onSuccess: () => toast.success(retiredNow ? `${c.name} retired.` : `${c.name} is back in service.`),
        onError: (error) => toast.error(`Not changed: ${errorMessage(error)}`),
      },
    );
  return (
    <ul className="flex flex-col divide-y divide-line">
      {crucibles.map((c) => (
        <li key={c.id} className="flex flex-col gap-3 py-3">
          {editing === c.id ? (
            <CrucibleForm workshopId={workshopId} existing={c} units={units} onDone={() => setEditing(null)} />
          ) : (
            <>
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <TextLink to={paths.crucible.getHref(workshopId, c.id)} className="text-lead">
                  {c.name}
                </TextLink>
                <span className="text-caption text-ink-muted">
                  {CRUCIBLE_MATERIAL_LABELS[c.material]}
                  {c.capacityG === null ? '' : ` · holds ${formatMass(c.capacityG, units.massUnit)}`}
                  {c.inServiceSince ? ` · since ${formatDate(c.inServiceSince)}` : ''}
                </span>
              </div>
              <CrucibleLifeBar crucible={c} />
              {c.lastShock ? (
                <p className="text-caption text-ink">
                  Last shock: {CRUCIBLE_SHOCK_LABELS[c.lastShock.kind]} on {formatDate(c.lastShock.pouredAt)}.
                </p>
              ) : null}
              {canManage ? (
                <div className="flex flex-wrap gap-2">
                  <Button size="sm" variant="quiet" icon={<Pencil aria-hidden className="size-4" />} onClick={() => setEditing(c.id)}>
                    Edit<span className="sr-only"> {c.name}</span>
                  </Button>
                  {c.retired ? (
                    <Button size="sm" variant="quiet" icon={<ArchiveRestore aria-hidden className="size-4" />} onClick={() => setRetired(c, false)}>
                      Back in service<span className="sr-only">: {c.name}</span>
                    </Button>
                  ) : (
                    <ConfirmInline
                      trigger={<>Retire<span className="sr-only"> {c.name}</span></>}
                      triggerIcon={<Archive aria-hidden className="size-4" />}
                      question={`Retire ${c.name}? It stays in the heats that used it.`}
                      confirmLabel="Yes, retire it"
                      pending={update.isPending}
                      onConfirm={() => setRetired(c, true)}
                    />
                  )}
                  {c.cycleCount === 0 ? (
                    <ConfirmInline
                      trigger={<>Delete<span className="sr-only"> {c.name}</span></>}
                      triggerIcon={<Trash2 aria-hidden className="size-4" />}
                      question={`Delete ${c.name}?`}
                      confirmLabel="Yes, delete"
                      pending={remove.isPending}
                      onConfirm={() => remove.mutate(c.id, deletedToasts(c.name))}
                    />
                  ) : null}
                </div>
              ) : null}
            </>
          )}
        </li>
      ))}
    </ul>
  );
}

function MouldsCard({ workshopId, moulds, units, canManage }: { workshopId: string; moulds: Mould[]; units: Units; canManage: boolean }) {
  const [editing, setEditing] = useState<string | 'new' | null>(null);
  const remove = useDeleteMould(workshopId);
  return (
    <Card title="Moulds" actions={canManage && editing !== 'new' ? <AddButton label="Add a mould" onClick={() => setEditing('new')} /> : null}>
      <div className="flex flex-col gap-4">
        {editing === 'new' ? <MouldForm workshopId={workshopId} units={units} onDone={() => setEditing(null)} /> : null}
        {moulds.length === 0 ? (
          <p className="text-body text-ink-muted">No moulds listed yet. A mould with its capacity gives a “weigh out” figure on the heat form.</p>
        ) : null}
        <ul className="flex flex-col divide-y divide-line">
          {moulds.map((m) => (
            <li key={m.id} className="flex flex-col gap-2 py-3">
              {editing === m.id ? (
                <MouldForm workshopId={workshopId} existing={m} units={units} onDone={() => setEditing(null)} />
              ) : (
                <>
                  <div className="flex flex-wrap items-baseline justify-between gap-2">
                    <span className="text-lead font-semibold text-ink">{m.name}</span>
                    <span className="text-caption text-ink-muted">
                      {MOLD_MATERIAL_LABELS[m.material]}
                      {m.hasRiser ? ' · with riser' : ''} · <span className="figures">{m.castingCount}</span> {m.castingCount === 1 ? 'casting' : 'castings'}
                    </span>
                  </div>
                  <p className="text-body text-ink">
                    {m.capacityG === null ? (
                      <span className="text-ink-muted">Capacity not recorded</span>
                    ) : (
                      <>
                        Cavity holds <span className="figures">{formatMass(m.capacityG, units.massUnit)}</span>
                        {m.capacityAlloy ? ` of ${m.capacityAlloy}` : ''}
                      </>
                    )}
                    {m.coating ? ` · coated with ${m.coating}` : ''}
                  </p>
                  {m.notes ? <p className="max-w-prose text-body text-ink">{m.notes}</p> : null}
                  {canManage ? (
                    <EditOrDelete
                      name={m.name}
                      deletable={m.castingCount === 0}
                      pending={remove.isPending}
                      onEdit={() => setEditing(m.id)}
                      onDelete={() => remove.mutate(m.id, deletedToasts(m.name))}
                    />
                  ) : null}
                </>
              )}
            </li>
          ))}
        </ul>
      </div>
    </Card>
  );
}
