import { useQuery } from '@tanstack/react-query';
import { Scale } from 'lucide-react';
import { useState } from 'react';
import { formatMass, formatNumber } from '#shared/domain/index.ts';
import type { Mould } from '#shared/heats/equipment-schemas.ts';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { Skeleton } from '#src/components/ui/skeleton.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import type { Units } from '#src/lib/unit-input.ts';
import { heatQueries } from '../api/heat-queries.ts';

type WeighOutHintProps = {
  workshopId: string;
  moulds: readonly Mould[];
  /** The mould to plan for until the caster picks one: the first casting's, else the last heat's. */
  suggestedMouldId: string | null;
  /** Whose usual yield to plan with; the signed-in member when left out. */
  casterId?: string;
  /** The alloy to pour, in the library's spelling, when one is chosen. */
  alloy?: string;
  units: Units;
};

/** "Weigh out N g": the charge for one pour into a mould at this caster's usual yield (GET /moulds/:id/charge-plan). */
export function WeighOutHint({ workshopId, moulds, suggestedMouldId, casterId, alloy, units }: WeighOutHintProps) {
  // The caster's own pick wins; until then the plan follows the suggestion.
  const [picked, setPicked] = useState<string | null>(null);
  const mouldId = picked ?? suggestedMouldId ?? '';
  const mould = moulds.find((m) => m.id === mouldId);
  const plan = useQuery({
    ...heatQueries.chargePlan(workshopId, mouldId, { casterId, alloy }),
    enabled: Boolean(mould && mould.capacityG !== null),
  });

  if (moulds.length === 0) return null;
  return (
    <section aria-labelledby="weigh-out-heading" className="flex flex-col gap-3 rounded-md border border-line bg-surface-sunken p-3">
      <h3 id="weigh-out-heading" className="flex items-center gap-2 text-body font-semibold text-ink">
        <Scale aria-hidden className="size-5" /> How much to weigh out
      </h3>
      <SelectField label="For one pour into" value={mouldId} onChange={(e) => setPicked(e.target.value)}>
        <option value="">Choose a mould</option>
        {moulds.map((m) => (
          <option key={m.id} value={m.id}>
            {m.name}
          </option>
        ))}
      </SelectField>
      <div aria-live="polite">
        {!mould ? null : mould.capacityG === null ? (
          <p className="text-body text-ink">Record what {mould.name} holds (its capacity) under Equipment to get a weigh-out for it.</p>
        ) : plan.isPending ? (
          <Skeleton className="h-7 w-48" />
        ) : plan.isError ? (
          <p className="text-body text-ink">{errorMessage(plan.error)}</p>
        ) : (
          <div className="flex flex-col gap-1">
            <p className="text-lead text-ink">
              Weigh out <span className="figures font-semibold">{formatMass(plan.data.chargeG, units.massUnit)}</span>
            </p>
            <p className="text-caption text-ink">
              The cavity takes <span className="figures">{formatMass(plan.data.castingG, units.massUnit)}</span>
              {plan.data.alloy ? ` of ${plan.data.alloy}` : ''}; at{' '}
              {plan.data.basis === 'caster-median'
                ? `the usual yield of ${formatNumber(plan.data.expectedYieldPct, 0)} % over ${plan.data.samples} weighed ${plan.data.samples === 1 ? 'heat' : 'heats'}`
                : `a ${formatNumber(plan.data.expectedYieldPct, 0)} % yield (no weighed heats yet to learn from)`}
              , plus {formatNumber(plan.data.marginPct, 0)} % to spare.
            </p>
          </div>
        )}
      </div>
    </section>
  );
}
