import { useState } from 'react';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import {
  ALLOYS,
  SHOP_TEXT_ALLOWANCES,
  SHRINK_RULES,
  formatNumber,
  patternDimension,
  shrinkPctFromInchesPerFoot,
  type SourceNote,
} from '#shared/domain/index.ts';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import type { Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { PATTERN_ALLOWANCE_SOURCE } from '../lib/calculator-sources.ts';
import { defaultLengthUnit, formatLength, formatLengthOther, lengthToMm, LENGTH_UNITS, type LengthUnit } from '../lib/length-units.ts';
import { CalculatorLayout, Formula, InputProblem, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

type AllowanceMode = 'rule' | 'alloy' | 'percent';

const DEFAULT_RULE = '5/32 in/ft';

/** "5/32 in/ft" as a percentage, two places. */
const pctText = (pct: number) => `${formatNumber(pct, 2)} %`;

/**
 * Pattern size for a wanted casting size (the trade core's patternDimension),
 * with the allowance from a shrink rule, the alloy's stored allowance or a
 * percentage typed in.
 */
export function PatternShrinkCalculator({ units, alloys }: { units: Units; alloys?: readonly AlloyEntry[] }) {
  const [lengthUnit, setLengthUnit] = useState<LengthUnit>(defaultLengthUnit(units.temperatureUnit));
  const [casting, setCasting] = useState('');
  const [mode, setMode] = useState<AllowanceMode>('rule');
  const [rule, setRule] = useState(DEFAULT_RULE);
  const [percent, setPercent] = useState('');
  const withAllowance = (alloys?.map((e) => e.alloy) ?? ALLOYS).filter((a) => a.patternShrinkPct !== undefined);
  const [alloyName, setAlloyName] = useState('A356.0');

  const alloy = withAllowance.find((a) => a.designation === alloyName) ?? withAllowance[0];
  const chosenRule = SHRINK_RULES.find((r) => r.label === rule) ?? SHRINK_RULES[2];
  const typedPct = readNumber(percent);
  const shrinkPct =
    mode === 'rule'
      ? shrinkPctFromInchesPerFoot(chosenRule.inchesPerFoot)
      : mode === 'alloy'
        ? alloy?.patternShrinkPct
        : typeof typedPct === 'number'
          ? typedPct
          : undefined;
  const typedCasting = readNumber(casting);
  const castingMm = typeof typedCasting === 'number' ? lengthToMm(typedCasting, lengthUnit) : null;
  const result =
    castingMm !== null && shrinkPct !== undefined
      ? attempt(() => patternDimension({ castingMm, shrinkPct }), { castingMm: 'The casting dimension', shrinkPct: 'The allowance (0 to 10 %)' })
      : null;

  const sources: SourceNote[] = [PATTERN_ALLOWANCE_SOURCE];
  if (mode === 'alloy' && alloy?.sources.patternShrink) sources.push(alloy.sources.patternShrink);
  for (const a of SHOP_TEXT_ALLOWANCES) if (!sources.some((s) => s.citation === a.source.citation)) sources.push(a.source);

  return (
    <CalculatorLayout
      inputs={
        <>
          <SegmentedControl<LengthUnit>
            legend="Lengths in"
            mono
            value={lengthUnit}
            onChange={setLengthUnit}
            options={LENGTH_UNITS.map((u) => ({ value: u, label: u, description: u === 'mm' ? 'millimetres' : 'inches' }))}
          />
          <NumberInput label="Casting dimension" unit={lengthUnit} value={casting} onChange={setCasting} hint="The finished size you want, before machining allowance." />
          <SegmentedControl<AllowanceMode>
            legend="Shrink allowance from"
            value={mode}
            onChange={setMode}
            options={[
              { value: 'rule', label: 'Shrink rule' },
              { value: 'alloy', label: 'Alloy' },
              { value: 'percent', label: 'Percentage' },
            ]}
          />
          {mode === 'rule' ? (
            <SelectField label="Shrink rule" hint="A patternmaker's rule, sold by how much it gains per foot." value={rule} onChange={(e) => setRule(e.target.value)}>
              {SHRINK_RULES.map((r) => (
                <option key={r.label} value={r.label}>
                  {r.label} ({pctText(shrinkPctFromInchesPerFoot(r.inchesPerFoot))})
                </option>
              ))}
            </SelectField>
          ) : mode === 'alloy' ? (
            <SelectField label="Alloy" value={alloy?.designation ?? ''} onChange={(e) => setAlloyName(e.target.value)}>
              {withAllowance.map((a) => (
                <option key={a.designation} value={a.designation}>
                  {a.designation}: {pctText(a.patternShrinkPct!)}
                </option>
              ))}
            </SelectField>
          ) : (
            <NumberInput label="Allowance" unit="%" value={percent} onChange={setPercent} hint="Linear: 1.3 % for most aluminium." />
          )}
        </>
      }
      results={
        result === null ? (
          <WaitingForInput>Enter the casting dimension{mode === 'percent' ? ' and the allowance' : ''}.</WaitingForInput>
        ) : !result.ok ? (
          <InputProblem>{result.problem}</InputProblem>
        ) : (
          <>
            <Readout
              label="Make the pattern"
              value={formatLength(result.value / 10, lengthUnit)}
              other={formatLengthOther(result.value / 10, lengthUnit)}
              note={`${formatLength((result.value - castingMm!) / 10, lengthUnit)} larger than the casting.`}
            />
            <p className="text-body text-ink">
              Allowance <span className="figures">{pctText(shrinkPct!)}</span>, or{' '}
              <span className="figures">{formatNumber((shrinkPct! / 100) * 12, 3)} in/ft</span>.
            </p>
          </>
        )
      }
      formula={
        <>
          <Formula>pattern = casting × (1 + allowance ÷ 100)</Formula>
          <Formula>allowance % = inches per foot ÷ 12 × 100</Formula>
          <p>
            Published allowances disagree, so treat them as a start: measure a casting against its
            pattern and keep that figure for the alloy and mould.
          </p>
        </>
      }
      sources={sources}
    >
      <section aria-labelledby="shop-allowances" className="flex flex-col gap-2">
        <h2 id="shop-allowances" className="text-title font-semibold text-ink">
          What the old shop texts say
        </h2>
        <div className="relative overflow-x-auto">
          <table className="min-w-[28rem] border-collapse text-left text-body">
            <thead>
              <tr className="border-b border-line-strong">
                <th scope="col" className="py-2 pr-6 font-semibold">
                  Metal
                </th>
                <th scope="col" className="py-2 pr-6 text-right font-semibold">
                  in/ft
                </th>
                <th scope="col" className="py-2 pr-6 text-right font-semibold">
                  %
                </th>
                <th scope="col" className="py-2 font-semibold">
                  Text
                </th>
              </tr>
            </thead>
            <tbody>
              {SHOP_TEXT_ALLOWANCES.map((a) => (
                <tr key={`${a.metal}-${a.source.citation}`} className="border-b border-line">
                  <th scope="row" className="py-2 pr-6 font-medium">
                    {a.metal}
                  </th>
                  <td className="figures py-2 pr-6 text-right">{formatNumber(a.inchesPerFoot, 3)}</td>
                  <td className="figures py-2 pr-6 text-right">{formatNumber(shrinkPctFromInchesPerFoot(a.inchesPerFoot), 2)}</td>
                  <td className="py-2 text-caption text-ink-muted">{a.source.citation}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </CalculatorLayout>
  );
}
