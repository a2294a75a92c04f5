import { useState } from 'react';
import {
  ALLOYS,
  CASTING_YIELD_SOURCE,
  chargeFor,
  findAlloy,
  formatMass,
  formatNumber,
  type MassUnit,
} from '#shared/domain/index.ts';
import type { Mould } from '#shared/heats/equipment-schemas.ts';
import { cavityMassG } from '#shared/heats/heat-figures.ts';
import { DEFAULT_CHARGE_MARGIN_PCT, DEFAULT_EXPECTED_YIELD_PCT } from '#shared/heats/heat-schemas.ts';
import { Notice } from '#src/components/ui/notice.tsx';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { massFromInput, massSymbol, type Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { CHARGE_MARGIN_SOURCE, DEFAULT_YIELD_SOURCE } from '../lib/calculator-sources.ts';
import { CalculatorLayout, Formula, InputProblem, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

const other = (unit: MassUnit): MassUnit => (unit === 'g' ? 'oz' : 'g');

type ChargeCalculatorProps = {
  units: Units;
  /** The workshop's moulds; undefined while they load. */
  moulds?: readonly Mould[];
  mouldsFailed?: boolean;
  /** Where moulds are added, for the empty state. */
  equipmentHref: string;
};

type Source = 'mould' | 'mass';

/**
 * Grams to weigh out: the cavity's metal (from a mould's recorded capacity,
 * rescaled by density for another alloy, or typed in), divided by the yield
 * this pattern usually gives, plus a margin. The trade core's chargeFor.
 */
export function ChargeCalculator({ units, moulds, mouldsFailed, equipmentHref }: ChargeCalculatorProps) {
  const unit = units.massUnit;
  const withCapacity = (moulds ?? []).filter((m) => m.capacityG !== null);
  const [source, setSource] = useState<Source>('mould');
  const [mouldId, setMouldId] = useState('');
  const [alloyName, setAlloyName] = useState('');
  const [mass, setMass] = useState('');
  const [yieldPct, setYieldPct] = useState(String(DEFAULT_EXPECTED_YIELD_PCT));
  const [marginPct, setMarginPct] = useState(String(DEFAULT_CHARGE_MARGIN_PCT));

  const fromMould = source === 'mould' && withCapacity.length > 0;
  const mould = fromMould ? (withCapacity.find((m) => m.id === mouldId) ?? withCapacity[0]) : undefined;
  const pourAlloy = alloyName || mould?.capacityAlloy || '';

  let castingG: number | null = null;
  if (mould) {
    castingG = cavityMassG({ capacityG: mould.capacityG!, capacityAlloy: mould.capacityAlloy }, pourAlloy || null);
  } else {
    const typed = readNumber(mass);
    castingG = typeof typed === 'number' ? massFromInput(typed, unit) : null;
  }
  const y = readNumber(yieldPct);
  const m = readNumber(marginPct);
  const ready = castingG !== null && typeof y === 'number' && (typeof m === 'number' || m === null);
  const result = ready
    ? attempt(() => chargeFor({ castingG: castingG!, expectedYieldPct: y as number, marginPct: (m as number | null) ?? 0 }), {
        castingG: 'The cavity mass',
        expectedYieldPct: 'The expected yield',
        marginPct: 'The margin',
      })
    : null;

  const rescaled = mould && pourAlloy && mould.capacityAlloy && pourAlloy !== mould.capacityAlloy;

  return (
    <CalculatorLayout
      inputs={
        <>
          <SegmentedControl<Source>
            legend="The cavity's metal"
            value={source}
            onChange={setSource}
            options={[
              { value: 'mould', label: 'From a mould' },
              { value: 'mass', label: 'Type it in' },
            ]}
          />
          {source === 'mould' ? (
            moulds === undefined && !mouldsFailed ? (
              <p className="text-body text-ink-muted" role="status">
                Loading the workshop's moulds…
              </p>
            ) : withCapacity.length === 0 ? (
              <Notice tone="info" title={mouldsFailed ? 'The moulds did not load' : 'No mould with a recorded capacity yet'}>
                <p>
                  Record what each mould's cavity holds on the <TextLink to={equipmentHref}>Equipment</TextLink> page (weigh one casting without its
                  gates and riser), and pick it here next time. For now, type the mass in.
                </p>
              </Notice>
            ) : (
              <>
                <SelectField label="Mould" value={mould?.id ?? ''} onChange={(e) => setMouldId(e.target.value)}>
                  {withCapacity.map((mo) => (
                    <option key={mo.id} value={mo.id}>
                      {mo.name}: {formatMass(mo.capacityG!, unit)}
                      {mo.capacityAlloy ? ` of ${mo.capacityAlloy}` : ''}
                    </option>
                  ))}
                </SelectField>
                <SelectField
                  label="Alloy to pour"
                  hint="A heavier alloy fills the same cavity with more grams."
                  value={pourAlloy}
                  onChange={(e) => setAlloyName(e.target.value)}
                >
                  {mould?.capacityAlloy ? null : <option value="">As measured</option>}
                  {ALLOYS.map((a) => (
                    <option key={a.designation} value={a.designation}>
                      {a.designation}: {a.commonName}
                    </option>
                  ))}
                </SelectField>
              </>
            )
          ) : null}
          {!fromMould ? (
            <NumberInput
              label="Casting mass"
              unit={massSymbol(unit)}
              value={mass}
              onChange={setMass}
              hint="The casting alone, without gates and risers."
            />
          ) : null}
          <NumberInput
            label="Expected yield"
            unit="%"
            value={yieldPct}
            onChange={setYieldPct}
            hint="Castings over metal poured for this pattern; the yield calculator works yours out."
          />
          <NumberInput label="Margin" unit="%" value={marginPct} onChange={setMarginPct} hint="Extra metal so a short pour never leaves a misrun." />
        </>
      }
      results={
        result === null ? (
          <WaitingForInput>Pick a mould or type the casting mass, and the yield you expect.</WaitingForInput>
        ) : !result.ok ? (
          <InputProblem>{result.problem}</InputProblem>
        ) : (
          <>
            <Readout label="Weigh out" value={formatMass(result.value, unit)} other={formatMass(result.value, other(unit))} />
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-body">
              <dt className="text-ink-muted">Casting</dt>
              <dd className="figures text-ink">
                {formatMass(castingG!, unit)}
                {rescaled ? ` of ${pourAlloy}` : ''}
              </dd>
              {rescaled ? (
                <>
                  <dt className="text-ink-muted">Rescaled</dt>
                  <dd className="text-ink">
                    from {formatMass(mould!.capacityG!, unit)} of {mould!.capacityAlloy}, by density{' '}
                    <span className="figures">
                      {formatNumber(findAlloy(pourAlloy)!.densityGcm3, 2)} / {formatNumber(findAlloy(mould!.capacityAlloy!)!.densityGcm3, 2)} g/cm³
                    </span>
                  </dd>
                </>
              ) : null}
              <dt className="text-ink-muted">Gates, risers and margin</dt>
              <dd className="figures text-ink">{formatMass(result.value - castingG!, unit)}</dd>
            </dl>
          </>
        )
      }
      formula={
        <>
          <Formula>charge = casting × (1 + margin ÷ 100) ÷ (yield ÷ 100)</Formula>
          <p>Rounded up to the whole gram. A mould's cavity is recorded in grams of one alloy; another alloy scales by the ratio of densities.</p>
        </>
      }
      sources={[CASTING_YIELD_SOURCE, DEFAULT_YIELD_SOURCE, CHARGE_MARGIN_SOURCE]}
    />
  );
}
