import { keepPreviousData, useQuery, type QueryKey, type UseQueryOptions } from '@tanstack/react-query';
import { useDeferredValue, useState } from 'react';
import { formatTemperature, formatTemperatureDifference, type TemperatureUnit } from '#shared/domain/index.ts';
import type { Furnace } from '#shared/heats/equipment-schemas.ts';
import type { SetpointAdvice } from '#shared/heats/heat-schemas.ts';
import { SETPOINT_HISTORY_HEATS } from '#shared/heats/heat-schemas.ts';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { temperatureFromInput, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { SETPOINT_METHOD_SOURCE } from '../lib/calculator-sources.ts';
import { CalculatorLayout, Formula, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

const other = (unit: TemperatureUnit): TemperatureUnit => (unit === 'C' ? 'F' : 'C');

/** Query options for the server's advice; the app layer passes the heats feature's factory. */
export type SetpointQuery<K extends QueryKey> = (furnaceId: string, targetC: number) => UseQueryOptions<SetpointAdvice, Error, SetpointAdvice, K>;

type SetpointCalculatorProps<K extends QueryKey> = {
  units: Units;
  /** The workshop's furnaces; undefined while they load. */
  furnaces?: readonly Furnace[];
  furnacesFailed?: boolean;
  /** The server's advice for one furnace and target (GET …/furnaces/:furnaceId/setpoint). */
  setpointQuery: SetpointQuery<K>;
  equipmentHref: string;
};

/**
 * The setpoint to dial in so the metal reaches a target: the server learns
 * this furnace's offset from its own heats (the trade core's suggestSetpoint)
 * and this page shows it with how much it varies and how many heats it rests on.
 */
export function SetpointCalculator<K extends QueryKey>({ units, furnaces, furnacesFailed, setpointQuery, equipmentHref }: SetpointCalculatorProps<K>) {
  const unit = units.temperatureUnit;
  const [furnaceId, setFurnaceId] = useState('');
  const [target, setTarget] = useState('');
  const deferredTarget = useDeferredValue(target);
  const furnace = furnaces?.find((f) => f.id === furnaceId) ?? furnaces?.[0];
  const typed = readNumber(deferredTarget);
  // A tenth of a degree is finer than any thermocouple; it keeps °F entries from asking twice.
  const targetC = typeof typed === 'number' ? Math.round(temperatureFromInput(typed, unit) * 10) / 10 : null;
  const usable = targetC !== null && targetC >= 0 && targetC <= 1800;
  const advice = useQuery({
    ...setpointQuery(furnace?.id ?? '', targetC ?? 0),
    enabled: Boolean(furnace) && usable,
    placeholderData: keepPreviousData,
  });

  if (furnaces !== undefined && furnaces.length === 0) {
    return (
      <Notice tone="info" title="No furnace yet">
        <p>
          Add the furnace you melt in on the <TextLink to={equipmentHref}>Equipment</TextLink> page. Log the setpoint and the measured pour
          temperature with each heat; after a few heats this page knows how far your furnace's reading sits from the metal.
        </p>
      </Notice>
    );
  }

  return (
    <CalculatorLayout
      inputs={
        <>
          {furnaces === undefined ? (
            <p className="text-body text-ink-muted" role="status">
              {furnacesFailed ? 'The furnaces did not load. Reload the page to try again.' : 'Loading the workshop’s furnaces…'}
            </p>
          ) : (
            <SelectField label="Furnace" value={furnace?.id ?? ''} onChange={(e) => setFurnaceId(e.target.value)}>
              {furnaces.map((f) => (
                <option key={f.id} value={f.id}>
                  {f.name} ({f.heatCount} {f.heatCount === 1 ? 'heat' : 'heats'})
                </option>
              ))}
            </SelectField>
          )}
          <NumberInput
            label="Target pour temperature"
            unit={temperatureSymbol(unit)}
            value={target}
            onChange={setTarget}
            problem={targetC !== null && !usable ? `Between ${formatTemperature(0, unit)} and ${formatTemperature(1800, unit)}` : undefined}
          />
        </>
      }
      results={
        !furnace || !usable ? (
          <WaitingForInput>Pick the furnace and the pour temperature you want the metal at.</WaitingForInput>
        ) : advice.isPending ? (
          <p role="status" className="text-body text-ink-muted">
            Working it out from the furnace's heats…
          </p>
        ) : advice.isError ? (
          <Notice tone="danger" role="alert" title="No answer from the server">
            <p>{isApiError(advice.error) ? advice.error.message : 'Try again in a moment.'}</p>
          </Notice>
        ) : (
          <>
            <Readout
              label="Set the furnace to"
              tone="heat"
              value={formatTemperature(advice.data.setpointC, unit)}
              other={formatTemperature(advice.data.setpointC, other(unit))}
            />
            {advice.data.basis === 'no-history' ? (
              <Notice tone="info" title="No history on this furnace yet">
                <p>
                  None of its heats has both a setpoint and a measured pour temperature, so this is the target itself. Log both with the next
                  few heats and the offset will show here.
                </p>
              </Notice>
            ) : (
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-body">
                <dt className="text-ink-muted">Offset</dt>
                <dd className="text-ink">
                  <span className="figures">{formatTemperatureDifference(Math.abs(advice.data.offsetC), unit)}</span>{' '}
                  {advice.data.offsetC < 0 ? 'cooler' : advice.data.offsetC > 0 ? 'hotter' : 'no different'} than the setpoint, typically
                </dd>
                <dt className="text-ink-muted">Spread</dt>
                <dd className="text-ink">
                  <span className="figures">± {formatTemperatureDifference(advice.data.spreadC, unit)}</span> from heat to heat
                </dd>
                <dt className="text-ink-muted">From</dt>
                <dd className="figures text-ink">
                  {advice.data.samples} {advice.data.samples === 1 ? 'heat' : 'heats'}
                </dd>
              </dl>
            )}
          </>
        )
      }
      formula={
        <>
          <Formula>offset = median of (measured pour − setpoint)</Formula>
          <Formula>setpoint = target − offset</Formula>
          <p>
            Over the furnace's newest {SETPOINT_HISTORY_HEATS} heats that have both readings, whoever poured them. The spread is the median
            distance of a heat's offset from that median.
          </p>
        </>
      }
      sources={[SETPOINT_METHOD_SOURCE]}
    />
  );
}
