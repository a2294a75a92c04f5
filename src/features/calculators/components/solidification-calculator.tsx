import { useState } from 'react';
import {
  NECK_MODULUS_FACTOR,
  RISER_MODULUS_FACTOR,
  RISER_MODULUS_RULE_SOURCES,
  barShape,
  chvorinovTimeMin,
  cylinderRiserDiameterCm,
  cylinderShape,
  formatNumber,
  inToCm,
  modulusCm,
  moldConstantFrom,
  plateShape,
  riserModulusRule,
  type Shape,
} from '#shared/domain/index.ts';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import type { Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { CHVORINOV_SOURCE } from '../lib/calculator-sources.ts';
import {
  defaultLengthUnit,
  formatArea,
  formatLength,
  formatLengthOther,
  formatVolume,
  lengthToCm,
  LENGTH_UNITS,
  type LengthUnit,
} from '../lib/length-units.ts';
import { CalculatorLayout, Formula, InputProblem, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

export const SHAPE_KINDS = ['plate', 'bar', 'cylinder'] as const;
export type ShapeKind = (typeof SHAPE_KINDS)[number];
type ConstantMode = 'entered' | 'fitted';

/** Riser proportions offered: H = k·D. */
export const RISER_PROPORTIONS = [
  { k: 1, label: 'H = D (squat, the usual)' },
  { k: 1.5, label: 'H = 1.5 D' },
  { k: 2, label: 'H = 2 D (tall)' },
] as const;

const formatMinutes = (min: number) => (min < 1 ? `${formatNumber(min * 60, 0)} s` : `${formatNumber(min, 2)} min`);

const LABELS: Record<string, string> = {
  lengthCm: 'The length',
  widthCm: 'The width',
  thicknessCm: 'The thickness',
  heightCm: 'The height',
  diameterCm: 'The diameter',
  moldConstant: 'The mould constant',
  timeMin: 'The measured time',
  n: 'The exponent n',
};

/**
 * Chvorinov's rule for a plate, bar or cylinder casting, and the cylindrical
 * riser that freezes after it by the 1.2× modulus rule. The mould constant
 * is typed in or fitted from a time the caster measured on this casting.
 */
export function SolidificationCalculator({ units }: { units: Units }) {
  const [lengthUnit, setLengthUnit] = useState<LengthUnit>(defaultLengthUnit(units.temperatureUnit));
  const [kind, setKind] = useState<ShapeKind>('plate');
  const [dims, setDims] = useState<Record<string, string>>({});
  const [endsCool, setEndsCool] = useState(true);
  const [bottomCools, setBottomCools] = useState(true);
  const [mode, setMode] = useState<ConstantMode>('entered');
  const [constant, setConstant] = useState('');
  const [measured, setMeasured] = useState('');
  const [exponent, setExponent] = useState('2');
  const [proportion, setProportion] = useState('1');

  const dim = (key: string) => {
    const n = readNumber(dims[key] ?? '');
    return typeof n === 'number' ? lengthToCm(n, lengthUnit) : null;
  };
  const setDim = (key: string) => (text: string) => setDims((d) => ({ ...d, [key]: text }));
  const fields: { key: string; label: string }[] =
    kind === 'plate'
      ? [
          { key: 'length', label: 'Length' },
          { key: 'width', label: 'Width' },
          { key: 'thickness', label: 'Thickness' },
        ]
      : kind === 'bar'
        ? [
            { key: 'length', label: 'Length' },
            { key: 'width', label: 'Width of the section' },
            { key: 'height', label: 'Height of the section' },
          ]
        : [
            { key: 'diameter', label: 'Diameter' },
            { key: 'height', label: 'Height' },
          ];

  const values = fields.map((f) => dim(f.key));
  const nText = readNumber(exponent);
  const n = typeof nText === 'number' ? nText : 2;
  const k = Number(proportion);

  const shape = values.every((v) => v !== null)
    ? attempt((): Shape => {
        if (kind === 'plate') return plateShape({ lengthCm: values[0]!, widthCm: values[1]!, thicknessCm: values[2]! });
        if (kind === 'bar') return barShape({ lengthCm: values[0]!, widthCm: values[1]!, heightCm: values[2]!, endsCool });
        return cylinderShape({ diameterCm: values[0]!, heightCm: values[1]!, bottomCools });
      }, LABELS)
    : null;

  const constantText = readNumber(mode === 'entered' ? constant : measured);
  const figures =
    shape?.ok === true
      ? attempt(() => {
          const castingModulus = modulusCm(shape.value);
          const moldConstant =
            typeof constantText !== 'number'
              ? undefined
              : mode === 'entered'
                ? constantText
                : moldConstantFrom({ ...shape.value, timeMin: constantText, n });
          const castingTime = moldConstant === undefined ? undefined : chvorinovTimeMin({ ...shape.value, moldConstant, n });
          const rule = riserModulusRule({ castingModulusCm: castingModulus });
          // The riser's diameter depends only on the modulus it needs; with no
          // mould constant yet, any constant gives the same size, so B = 1 stands in.
          const b = moldConstant ?? 1;
          const riserTime = b * rule.minRiserModulusCm ** n;
          const riserDiameter = cylinderRiserDiameterCm({ timeMin: riserTime, moldConstant: b, heightOverDiameter: k, n });
          const riser = cylinderShape({ diameterCm: riserDiameter, heightCm: k * riserDiameter });
          const check = riserModulusRule({ castingModulusCm: castingModulus, riserModulusCm: modulusCm(riser) });
          return { castingModulus, moldConstant, castingTime, rule, riserDiameter, riserTime: moldConstant === undefined ? undefined : riserTime, check };
        }, LABELS)
      : null;

  const lu = lengthUnit;
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
          <SegmentedControl<ShapeKind>
            legend="Casting shape"
            value={kind}
            onChange={setKind}
            options={[
              { value: 'plate', label: 'Plate' },
              { value: 'bar', label: 'Bar' },
              { value: 'cylinder', label: 'Cylinder' },
            ]}
          />
          <div className="grid gap-4 sm:grid-cols-2">
            {fields.map((f) => (
              <NumberInput key={`${kind}-${f.key}`} label={f.label} unit={lu} value={dims[f.key] ?? ''} onChange={setDim(f.key)} />
            ))}
          </div>
          {kind === 'bar' ? (
            <label className="flex min-h-12 items-center gap-3 text-body text-ink">
              <input type="checkbox" className="size-5" checked={endsCool} onChange={(e) => setEndsCool(e.target.checked)} />
              Both ends cool into the mould (untick for a long bar, or one fed at both ends)
            </label>
          ) : null}
          {kind === 'cylinder' ? (
            <label className="flex min-h-12 items-center gap-3 text-body text-ink">
              <input type="checkbox" className="size-5" checked={bottomCools} onChange={(e) => setBottomCools(e.target.checked)} />
              The bottom face cools into the mould (untick when it stands on another section)
            </label>
          ) : null}
          <SegmentedControl<ConstantMode>
            legend="Mould constant B"
            value={mode}
            onChange={setMode}
            options={[
              { value: 'entered', label: 'I know B' },
              { value: 'fitted', label: 'Fit from a time' },
            ]}
          />
          {mode === 'entered' ? (
            <NumberInput
              label="Mould constant B"
              unit="min/cm²"
              value={constant}
              onChange={setConstant}
              hint="For this metal, mould material and superheat; fit it once from a casting you timed."
            />
          ) : (
            <NumberInput
              label="Measured freezing time of this casting"
              unit="min"
              value={measured}
              onChange={setMeasured}
              hint="From the pour to the last liquid freezing (a thermocouple in the heaviest part, or the riser's surface skinning over)."
            />
          )}
          <div className="grid gap-4 sm:grid-cols-2">
            <NumberInput label="Exponent n" value={exponent} onChange={setExponent} hint="2 unless you have fitted another (quoted as 1.5–2)." />
            <SelectField label="Riser proportions" value={proportion} onChange={(e) => setProportion(e.target.value)}>
              {RISER_PROPORTIONS.map((p) => (
                <option key={p.k} value={String(p.k)}>
                  {p.label}
                </option>
              ))}
            </SelectField>
          </div>
        </>
      }
      results={
        shape === null ? (
          <WaitingForInput>Enter the casting's dimensions.</WaitingForInput>
        ) : !shape.ok ? (
          <InputProblem>{shape.problem}</InputProblem>
        ) : figures !== null && !figures.ok ? (
          <InputProblem>{figures.problem}</InputProblem>
        ) : figures?.ok ? (
          <>
            <Readout
              label="Casting modulus M = V/A"
              value={formatLength(figures.value.castingModulus, lu)}
              other={formatLengthOther(figures.value.castingModulus, lu)}
              note={`Volume ${formatVolume(shape.value.volumeCm3, lu)}, cooling area ${formatArea(shape.value.areaCm2, lu)}.`}
            />
            {figures.value.castingTime !== undefined ? (
              <Readout
                size="small"
                label="Freezing time of the casting"
                value={formatMinutes(figures.value.castingTime)}
                note={
                  mode === 'fitted'
                    ? `Fitted B = ${formatNumber(figures.value.moldConstant!, 3)} min/cm² (${formatNumber(figures.value.moldConstant! * inToCm(1) ** n, 2)} min/in${n === 2 ? '²' : `^${formatNumber(n, 2)}`}).`
                    : undefined
                }
              />
            ) : (
              <p className="text-body text-ink-muted">Give the mould constant to see freezing times; the riser size needs only the modulus.</p>
            )}
            <div className="flex flex-col gap-2 rounded-md border border-line bg-surface-raised p-3">
              <h3 className="text-body font-semibold text-ink">Cylindrical riser, {RISER_PROPORTIONS.find((p) => p.k === k)?.label}</h3>
              <Readout
                label="Riser diameter"
                value={formatLength(figures.value.riserDiameter, lu)}
                other={formatLengthOther(figures.value.riserDiameter, lu)}
                note={`Height ${formatLength(k * figures.value.riserDiameter, lu)}.`}
              />
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-body">
                <dt className="text-ink-muted">Riser modulus at least</dt>
                <dd className="figures text-ink">
                  {formatLength(figures.value.rule.minRiserModulusCm, lu)} ({RISER_MODULUS_FACTOR} × casting)
                </dd>
                <dt className="text-ink-muted">Neck modulus about</dt>
                <dd className="figures text-ink">
                  {formatLength(figures.value.rule.neckModulusCm, lu)} ({NECK_MODULUS_FACTOR} × casting)
                </dd>
                {figures.value.riserTime !== undefined ? (
                  <>
                    <dt className="text-ink-muted">Riser freezes in</dt>
                    <dd className="figures text-ink">{formatMinutes(figures.value.riserTime)}</dd>
                  </>
                ) : null}
                <dt className="text-ink-muted">1.2× rule</dt>
                <dd className="text-ink">{figures.value.check.satisfied ? 'met: the riser freezes after the casting' : 'not met'}</dd>
              </dl>
              <p className="text-caption text-ink-muted">
                Sized with every riser face cooling. Sitting on the casting its bottom does not cool, so it freezes a little later: a margin on
                the safe side. Check also that it holds enough metal for the shrinkage.
              </p>
            </div>
          </>
        ) : null
      }
      formula={
        <>
          <Formula>t = B · (V ÷ A)ⁿ, M = V ÷ A</Formula>
          <Formula>fitted: B = t_measured ÷ Mⁿ</Formula>
          <Formula>riser: M_riser ≥ 1.2 · M_casting, neck ≈ 1.1 · M_casting</Formula>
          <Formula>cylinder H = k·D, all faces cooling: M = k·D ÷ (4k + 2), so D = M_riser · (4k + 2) ÷ k</Formula>
          <p>
            A is the surface that gives heat to the mould: a face joined to a riser or another section does not count. Lengths are worked in
            centimetres, so B is in min/cm² for n = 2.
          </p>
        </>
      }
      sources={[CHVORINOV_SOURCE, ...RISER_MODULUS_RULE_SOURCES]}
    />
  );
}
