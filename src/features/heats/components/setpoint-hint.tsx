import { useQuery } from '@tanstack/react-query';
import { formatNumber, formatTemperature, formatTemperatureDifference } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Skeleton } from '#src/components/ui/skeleton.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { temperatureInUnit, type Units } from '#src/lib/unit-input.ts';
import { heatQueries } from '../api/heat-queries.ts';

/**
 * Below this a "target" is a half-typed number (7, 72…), not a pour
 * temperature; the lowest-melting casting alloys pour above it.
 */
export const MIN_TARGET_C = 200;

type SetpointHintProps = {
  workshopId: string;
  furnace: { id: string; name: string } | null;
  /** The pour temperature aimed for, °C; null while none is entered. */
  targetC: number | null;
  units: Units;
  /** Puts the suggestion into the setpoint field, in the user's unit. */
  onUse?: (setpointInUnit: number) => void;
};

/** The furnace's suggested setpoint for a target pour temperature, learned from its offset over past heats. */
export function SetpointHint({ workshopId, furnace, targetC, units, onUse }: SetpointHintProps) {
  const ready = furnace !== null && targetC !== null && targetC >= MIN_TARGET_C && targetC <= 1800;
  const advice = useQuery({ ...heatQueries.setpoint(workshopId, furnace?.id ?? '', targetC ?? 0), enabled: ready });
  const unit = units.temperatureUnit;

  if (!furnace) return <p className="text-caption text-ink-muted">Choose the furnace to get a suggested setpoint.</p>;
  if (!ready) return <p className="text-caption text-ink-muted">Enter the pour temperature you aim for to get a setpoint for {furnace.name}.</p>;
  if (advice.isPending) return <Skeleton className="h-12 w-full" />;
  if (advice.isError) return <p className="text-caption text-ink">{errorMessage(advice.error)}</p>;

  const a = advice.data;
  const rounded = Math.round(temperatureInUnit(a.setpointC, unit));
  return (
    <div aria-live="polite" className="flex flex-col gap-2 rounded-md bg-surface-sunken px-3 py-2">
      <p className="text-body text-ink">
        Set <span className="figures font-semibold text-heat">{formatTemperature(a.setpointC, unit)}</span> to pour at{' '}
        <span className="figures text-heat">{formatTemperature(a.targetC, unit)}</span>
      </p>
      <p className="text-caption text-ink">
        {a.basis === 'history'
          ? `${furnace.name} reads ${formatTemperatureDifference(Math.abs(a.offsetC), unit)} ${a.offsetC < 0 ? 'below' : 'above'} its setpoint at the pour (median of ${a.samples} ${a.samples === 1 ? 'heat' : 'heats'}, give or take ${formatTemperatureDifference(a.spreadC, unit)}).`
          : `No heats on ${furnace.name} with both a setpoint and a pour temperature yet, so the setpoint is the target itself.`}
      </p>
      {onUse ? (
        <Button size="sm" className="self-start" onClick={() => onUse(rounded)}>
          Use {formatNumber(rounded, 0)} °{unit}
        </Button>
      ) : null}
    </div>
  );
}
