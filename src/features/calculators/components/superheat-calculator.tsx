import { useState } from 'react';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import {
  ALLOYS,
  formatNumber,
  formatTemperature,
  formatTemperatureDifference,
  superheatC,
  type Alloy,
  type Range,
  type SourceNote,
  type TemperatureUnit,
} from '#shared/domain/index.ts';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { temperatureFromInput, temperatureInUnit, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { CalculatorLayout, Formula, NumberInput, Readout, readNumber, WaitingForInput, InputProblem } from './calculator-parts.tsx';

const other = (unit: TemperatureUnit): TemperatureUnit => (unit === 'C' ? 'F' : 'C');

export const DEFAULT_SUPERHEAT_ALLOY = 'A356.0';

function rangeText(range: Range, unit: TemperatureUnit) {
  return `${formatNumber(temperatureInUnit(range.min, unit))}–${formatTemperature(range.max, unit)}`;
}

/** Where a pour sits against one pouring range, in words with the gap in the user's unit. */
export function pourAgainstRange(pourC: number, range: Range, unit: TemperatureUnit): string {
  if (pourC < range.min) return `${formatTemperatureDifference(range.min - pourC, unit)} below the range`;
  if (pourC > range.max) return `${formatTemperatureDifference(pourC - range.max, unit)} above the range`;
  return 'within the range';
}

type SuperheatCalculatorProps = {
  units: Units;
  /** The library and the workshop's own alloys; the library alone until they load. */
  alloys?: readonly AlloyEntry[];
};

/** Superheat = pour − liquidus, with the alloy's pouring ranges for sand and permanent moulds beside it. */
export function SuperheatCalculator({ units, alloys }: SuperheatCalculatorProps) {
  const unit = units.temperatureUnit;
  const t = temperatureSymbol(unit);
  const library = alloys?.filter((e) => e.origin === 'library').map((e) => e.alloy) ?? ALLOYS;
  const own = alloys?.filter((e) => e.origin === 'workshop').map((e) => e.alloy) ?? [];
  const [designation, setDesignation] = useState(DEFAULT_SUPERHEAT_ALLOY);
  const [pour, setPour] = useState('');

  const alloy: Alloy | undefined = [...library, ...own].find((a) => a.designation === designation) ?? library[0];
  const typed = readNumber(pour);
  const pourC = typeof typed === 'number' ? temperatureFromInput(typed, unit) : null;
  const result = alloy && pourC !== null ? attempt(() => superheatC(pourC, alloy), { pourTempC: 'Pour temperature' }) : null;

  const ranges = alloy
    ? ([
        ['Sand mould', alloy.pourRangeC.sand],
        ['Permanent mould', alloy.pourRangeC.permanentMould],
      ] as const)
    : [];

  const sources: SourceNote[] = [];
  if (alloy?.sources.solidusLiquidus) sources.push(alloy.sources.solidusLiquidus);
  if (alloy?.sources.pourRange) sources.push(alloy.sources.pourRange);

  return (
    <CalculatorLayout
      inputs={
        <>
          <SelectField label="Alloy" value={alloy?.designation ?? ''} onChange={(e) => setDesignation(e.target.value)}>
            <optgroup label="Alloy library">
              {library.map((a) => (
                <option key={a.designation} value={a.designation}>
                  {a.designation}: {a.commonName}
                </option>
              ))}
            </optgroup>
            {own.length > 0 ? (
              <optgroup label="This workshop's alloys">
                {own.map((a) => (
                  <option key={a.designation} value={a.designation}>
                    {a.designation}: {a.commonName}
                  </option>
                ))}
              </optgroup>
            ) : null}
          </SelectField>
          <NumberInput
            label="Pour temperature"
            unit={t}
            value={pour}
            onChange={setPour}
            hint="As the thermocouple reads it in the crucible, just before the pour."
          />
          {alloy ? (
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-body">
              <dt className="text-ink-muted">Liquidus</dt>
              <dd className="figures text-ink">{formatTemperature(alloy.liquidusC, unit)}</dd>
              <dt className="text-ink-muted">Solidus</dt>
              <dd className="figures text-ink">{formatTemperature(alloy.solidusC, unit)}</dd>
              {ranges.map(([label, range]) => (
                <div key={label} className="contents">
                  <dt className="text-ink-muted">Pour, {label.toLowerCase()}</dt>
                  <dd className="figures text-ink">{range ? rangeText(range, unit) : 'no range stored'}</dd>
                </div>
              ))}
            </dl>
          ) : null}
          {alloy?.source ? (
            <p className="text-body text-ink-muted">
              Workshop's note on {alloy.designation}: {alloy.source}
            </p>
          ) : null}
        </>
      }
      results={
        result === null ? (
          <WaitingForInput>Enter the pour temperature to see its superheat over the liquidus of {alloy?.designation}.</WaitingForInput>
        ) : !result.ok ? (
          <InputProblem>{result.problem}</InputProblem>
        ) : (
          <>
            <Readout
              label="Superheat"
              tone="heat"
              value={formatTemperatureDifference(result.value, unit)}
              other={formatTemperatureDifference(result.value, other(unit))}
              note={
                result.value < 0
                  ? `Below the liquidus: ${alloy?.designation} has started to freeze.`
                  : `Above the ${formatTemperature(alloy!.liquidusC, unit)} liquidus of ${alloy?.designation}.`
              }
            />
            <ul className="flex flex-col gap-2" aria-label="Against the pouring ranges">
              {ranges.map(([label, range]) => (
                <li key={label} className="text-body text-ink">
                  <span className="font-medium">{label}: </span>
                  {range ? (
                    <>
                      {pourAgainstRange(pourC!, range, unit)} <span className="figures text-ink-muted">({rangeText(range, unit)})</span>
                    </>
                  ) : (
                    <span className="text-ink-muted">no range stored for {alloy?.designation}</span>
                  )}
                </li>
              ))}
            </ul>
          </>
        )
      }
      formula={
        <>
          <Formula>superheat = pour temperature − liquidus</Formula>
          <p>
            A difference of temperatures: 1 °C of superheat is 1.8 °F, with no 32 °F offset. Thin sections need the hot end of a range; every
            degree above it adds hydrogen and oxide.
          </p>
        </>
      }
      sources={sources}
    />
  );
}
