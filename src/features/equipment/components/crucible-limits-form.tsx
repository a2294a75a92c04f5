import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { toast } from 'sonner';
import { CRUCIBLE_MATERIAL_LABELS, DEFAULT_CRUCIBLE_CYCLE_LIMITS, type CrucibleMaterial } from '#shared/heats/crucible-life.ts';
import { crucibleLimitsUpdateSchema } from '#shared/heats/equipment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { equipmentQueries } from '../api/equipment-queries.ts';
import { useUpdateCrucibleLimits } from '../api/use-update-crucible-limits.ts';

type Row = { material: CrucibleMaterial; warnAt: string; limitAt: string };

/**
 * The workshop's cycle warning and limit per crucible material. A material
 * left at the defaults is not sent, so it follows them if they change.
 */
export function CrucibleLimitsForm({ workshopId, editable }: { workshopId: string; editable: boolean }) {
  const { data: limits } = useSuspenseQuery(equipmentQueries.crucibleLimits(workshopId));
  const save = useUpdateCrucibleLimits(workshopId);
  const initial = (): Row[] => limits.map((l) => ({ material: l.material, warnAt: String(l.warnAt), limitAt: String(l.limitAt) }));
  const [rows, setRows] = useState<Row[]>(initial);
  const [problem, setProblem] = useState<string | null>(null);
  const d = DEFAULT_CRUCIBLE_CYCLE_LIMITS;

  if (!editable) {
    return (
      <ul className="flex flex-col gap-1 text-body">
        {limits.map((l) => (
          <li key={l.material}>
            {CRUCIBLE_MATERIAL_LABELS[l.material]}: warn at <span className="figures">{l.warnAt}</span>, limit{' '}
            <span className="figures">{l.limitAt}</span> heats{l.isDefault ? ' (default)' : ''}
          </li>
        ))}
      </ul>
    );
  }

  const submit = () => {
    setProblem(null);
    const own = rows
      .map((r) => ({ material: r.material, warnAt: Number(r.warnAt), limitAt: Number(r.limitAt) }))
      .filter((r) => !(r.warnAt === d.warnAt && r.limitAt === d.limitAt));
    const parsed = crucibleLimitsUpdateSchema.safeParse({ limits: own });
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const index = issue?.path[1];
      const material = typeof index === 'number' ? own[index]?.material : undefined;
      setProblem(`${material ? `${CRUCIBLE_MATERIAL_LABELS[material]}: ` : ''}${issue?.message ?? 'Check the figures'}. Use whole heats, warning at or before the limit.`);
      return;
    }
    save.mutate(parsed.data, {
      onSuccess: () => toast.success('Crucible limits saved.'),
      onError: (error) => setProblem(errorMessage(error)),
    });
  };

  return (
    <form
      noValidate
      aria-label="Crucible limits"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
      className="flex flex-col gap-4"
    >
      {problem ? (
        <Notice tone="danger" role="alert" title="Not saved">
          {problem}
        </Notice>
      ) : null}
      <div className="flex flex-col gap-3">
        {rows.map((row, i) => (
          <fieldset key={row.material} className="grid gap-3 sm:grid-cols-[12rem_1fr_1fr] sm:items-end">
            <legend className="text-body font-semibold text-ink sm:sr-only">{CRUCIBLE_MATERIAL_LABELS[row.material]}</legend>
            <span aria-hidden className="hidden min-h-10 items-center text-body font-semibold sm:flex">
              {CRUCIBLE_MATERIAL_LABELS[row.material]}
            </span>
            {(['warnAt', 'limitAt'] as const).map((key) => (
              <TextField
                key={key}
                label={key === 'warnAt' ? 'Warn at' : 'Limit'}
                inputMode="numeric"
                autoComplete="off"
                suffix="heats"
                value={row[key]}
                onChange={(e) => setRows((rs) => rs.map((r, j) => (j === i ? { ...r, [key]: e.target.value } : r)))}
              />
            ))}
          </fieldset>
        ))}
      </div>
      <p className="text-caption text-ink-muted">
        Defaults: warn at {d.warnAt}, limit {d.limitAt} for every material, after common practice for clay-graphite crucibles heated and cooled
        quickly. Follow the maker’s figures where you have them.
      </p>
      <Button type="submit" className="self-start" pending={save.isPending} pendingLabel="Saving…">
        Save the limits
      </Button>
    </form>
  );
}
