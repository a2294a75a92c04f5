import { useId, useMemo, useState } from 'react';
import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import {
  HYDROGEN_SOLUBILITY_COEFFICIENTS,
  ITS90_FREEZING_POINTS_C,
  formatNumber,
  formatTemperature,
  hydrogenSolubility,
  type TemperatureUnit,
} from '#shared/domain/index.ts';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { temperatureFromInput, temperatureInUnit, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { CalculatorLayout, Formula, InputProblem, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

/** The chart's span, °C, as the brief for the page asks: the range an aluminium melt lives in. */
export const HYDROGEN_CHART_FROM_C = 600;
export const HYDROGEN_CHART_TO_C = 850;
const STEP_C = 5;
const TABLE_STEP_C = 25;
const MELTING_C = ITS90_FREEZING_POINTS_C.aluminium;

const RN = HYDROGEN_SOLUBILITY_COEFFICIENTS['ransley-neufeld-1948'];
const TA = HYDROGEN_SOLUBILITY_COEFFICIENTS['talbot-anyalebechi-1988'];

/** mL H₂ (STP) per 100 g, to three significant figures. */
export const formatSolubility = (value: number) => `${value >= 0.1 ? formatNumber(value, value >= 1 ? 2 : 3) : formatNumber(value, 4)} mL/100 g`;

type ChartPoint = { x: number; liquid?: number; liquidExtrapolated?: number; solid?: number; solidExtrapolated?: number };

/**
 * Liquid and solid curves at 1 atm of hydrogen (Ransley & Neufeld), each
 * split at the melting point of pure aluminium: the part where that phase
 * does not exist in equilibrium is drawn dashed.
 */
export function hydrogenChartData(unit: TemperatureUnit): ChartPoint[] {
  const temps: number[] = [];
  for (let c = HYDROGEN_CHART_FROM_C; c <= HYDROGEN_CHART_TO_C; c += STEP_C) temps.push(c);
  temps.push(MELTING_C);
  temps.sort((a, b) => a - b);
  return temps.map((c) => {
    const liquid = hydrogenSolubility({ tempC: c, phase: 'liquid' });
    const solid = hydrogenSolubility({ tempC: c, phase: 'solid' });
    return {
      x: Number(temperatureInUnit(c, unit).toFixed(2)),
      ...(c >= MELTING_C ? { liquid, solidExtrapolated: solid } : {}),
      ...(c <= MELTING_C ? { solid, liquidExtrapolated: liquid } : {}),
    };
  });
}

/** The table alternative to the chart: every 25 °C (or the same points in °F). */
export function hydrogenTableRows() {
  const rows: { tempC: number; liquid: number; liquidTA: number; solid: number }[] = [];
  for (let c = HYDROGEN_CHART_FROM_C; c <= HYDROGEN_CHART_TO_C; c += TABLE_STEP_C) {
    rows.push({
      tempC: c,
      liquid: hydrogenSolubility({ tempC: c, phase: 'liquid' }),
      liquidTA: hydrogenSolubility({ tempC: c, phase: 'liquid', model: 'talbot-anyalebechi-1988' }),
      solid: hydrogenSolubility({ tempC: c, phase: 'solid' }),
    });
  }
  return rows;
}

type View = 'chart' | 'table';

/**
 * Hydrogen solubility in pure aluminium against temperature (the trade
 * core's hydrogenSolubility), as a chart or a table, and the value at a
 * temperature and hydrogen pressure the caster enters.
 */
export function HydrogenCalculator({ units }: { units: Units }) {
  const unit = units.temperatureUnit;
  const t = temperatureSymbol(unit);
  const [temp, setTemp] = useState('');
  const [pressure, setPressure] = useState('1');
  const [view, setView] = useState<View>('chart');
  const data = useMemo(() => hydrogenChartData(unit), [unit]);
  const rows = useMemo(() => hydrogenTableRows(), []);
  const chartTitleId = useId();

  const typedT = readNumber(temp);
  const typedP = readNumber(pressure);
  const tempC = typeof typedT === 'number' ? temperatureFromInput(typedT, unit) : null;
  const pressureAtm = typedP === null ? 1 : typedP;
  const result =
    tempC !== null && typeof pressureAtm === 'number'
      ? attempt(
          () => ({
            liquid: hydrogenSolubility({ tempC, phase: 'liquid', pressureAtm }),
            liquidTA: hydrogenSolubility({ tempC, phase: 'liquid', pressureAtm, model: 'talbot-anyalebechi-1988' }),
            solid: hydrogenSolubility({ tempC, phase: 'solid', pressureAtm }),
          }),
          { tempC: 'The temperature', pressureAtm: 'The hydrogen pressure' },
        )
      : null;

  const ticks = [0.02, 0.05, 0.1, 0.2, 0.5, 1, 2];
  const fromX = Math.floor(temperatureInUnit(HYDROGEN_CHART_FROM_C, unit));
  const toX = Math.ceil(temperatureInUnit(HYDROGEN_CHART_TO_C, unit));

  return (
    <CalculatorLayout
      inputs={
        <>
          <NumberInput label="Temperature" unit={t} value={temp} onChange={setTemp} />
          <NumberInput
            label="Hydrogen pressure"
            unit="atm"
            value={pressure}
            onChange={setPressure}
            hint="Hydrogen's own partial pressure over the metal; 1 atm is the handbook figure, a shop's air is far lower."
          />
        </>
      }
      results={
        result === null ? (
          <WaitingForInput>Enter a temperature to read the solubility there.</WaitingForInput>
        ) : !result.ok ? (
          <InputProblem>{result.problem}</InputProblem>
        ) : (
          <>
            <Readout label="Liquid aluminium can hold" value={formatSolubility(result.value.liquid)} note="Ransley & Neufeld (1948)." />
            <Readout size="small" label="Solid aluminium can hold" value={formatSolubility(result.value.solid)} note="Ransley & Neufeld (1948)." />
            <Readout size="small" label="Liquid, cross-check" value={formatSolubility(result.value.liquidTA)} note="Talbot & Anyalebechi (1988)." />
            <p className="text-body text-ink">
              The liquid holds {formatNumber(result.value.liquid / result.value.solid, 0)} times what the solid can: the rest comes out as
              porosity while the metal freezes. At {formatTemperature(tempC!, unit)} pure aluminium is{' '}
              {tempC! >= MELTING_C ? 'liquid' : 'solid'} (it melts at {formatTemperature(MELTING_C, unit, 1)}).
            </p>
          </>
        )
      }
      formula={
        <>
          <Formula>log₁₀ S = −A ÷ T + B, T in kelvin, S at 1 atm of hydrogen</Formula>
          <Formula>S(p) = S(1 atm) × √p (Sieverts' law)</Formula>
          <p>
            S in mL of hydrogen (at 0 °C and 1 atm) per 100 g of metal. Ransley & Neufeld: liquid A = {RN.liquid?.a}, B = {RN.liquid?.b}; solid A ={' '}
            {RN.solid?.a}, B = {RN.solid?.b}. Talbot & Anyalebechi, liquid: A = {TA.liquid?.a}, B = {TA.liquid?.b}. Pure aluminium: alloying
            moves these (magnesium raises them, silicon and copper lower them).
          </p>
        </>
      }
      sources={[RN.liquid?.source, RN.solid?.source, TA.liquid?.source]}
    >
      <section aria-labelledby={chartTitleId} className="flex flex-col gap-3">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id={chartTitleId} className="text-title font-semibold text-ink">
            Solubility from {formatTemperature(HYDROGEN_CHART_FROM_C, unit)} to {formatTemperature(HYDROGEN_CHART_TO_C, unit)}, at 1 atm
          </h2>
          <SegmentedControl<View>
            className="w-56"
            legend="Show as"
            hideLegend
            value={view}
            onChange={setView}
            options={[
              { value: 'chart', label: 'Chart' },
              { value: 'table', label: 'Table' },
            ]}
          />
        </div>
        {view === 'chart' ? (
          <figure className="flex flex-col gap-2">
            <div
              role="img"
              aria-label={`Line chart: liquid aluminium holds about ${formatNumber(rows[0].liquid, 2)} mL/100 g at ${formatTemperature(HYDROGEN_CHART_FROM_C, unit)} rising to ${formatNumber(rows.at(-1)!.liquid, 2)} at ${formatTemperature(HYDROGEN_CHART_TO_C, unit)}; solid aluminium about a twentieth of that. The table view lists the values.`}
              className="h-80 w-full rounded-lg border border-line bg-surface-raised p-2"
            >
              <ResponsiveContainer width="100%" height="100%" minWidth={200} minHeight={280} initialDimension={{ width: 640, height: 300 }}>
                <LineChart data={data} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
                  <CartesianGrid stroke="var(--ps-line)" strokeDasharray="2 4" />
                  <XAxis
                    dataKey="x"
                    type="number"
                    domain={[fromX, toX]}
                    tickCount={6}
                    stroke="var(--ps-ink-muted)"
                    label={{ value: `Temperature (${t})`, position: 'insideBottom', offset: -14, fill: 'var(--ps-ink)' }}
                  />
                  <YAxis
                    scale="log"
                    type="number"
                    domain={[0.02, 3]}
                    ticks={ticks}
                    allowDataOverflow
                    stroke="var(--ps-ink-muted)"
                    label={{ value: 'mL H₂ per 100 g', angle: -90, position: 'insideLeft', fill: 'var(--ps-ink)' }}
                  />
                  <Tooltip
                    formatter={(value) => (typeof value === 'number' ? formatSolubility(value) : String(value))}
                    labelFormatter={(x) => `${formatNumber(Number(x))} ${t}`}
                  />
                  <Legend verticalAlign="top" />
                  <ReferenceLine
                    x={Number(temperatureInUnit(MELTING_C, unit).toFixed(2))}
                    stroke="var(--ps-ink-muted)"
                    strokeDasharray="4 4"
                    label={{ value: `Al melts ${formatTemperature(MELTING_C, unit)}`, position: 'top', fill: 'var(--ps-ink)' }}
                  />
                  <Line name="Liquid" dataKey="liquid" stroke="var(--ps-heat)" strokeWidth={3} dot={false} isAnimationActive={false} />
                  <Line
                    name="Liquid (below melting, extrapolated)"
                    legendType="none"
                    dataKey="liquidExtrapolated"
                    stroke="var(--ps-heat)"
                    strokeWidth={2}
                    strokeDasharray="6 4"
                    dot={false}
                    isAnimationActive={false}
                  />
                  <Line name="Solid" dataKey="solid" stroke="var(--ps-link)" strokeWidth={3} dot={false} isAnimationActive={false} />
                  <Line
                    name="Solid (above melting, extrapolated)"
                    legendType="none"
                    dataKey="solidExtrapolated"
                    stroke="var(--ps-link)"
                    strokeWidth={2}
                    strokeDasharray="6 4"
                    dot={false}
                    isAnimationActive={false}
                  />
                </LineChart>
              </ResponsiveContainer>
            </div>
            <figcaption className="text-caption text-ink-muted">
              Log scale. Solid lines: each phase where it exists for pure aluminium; dashed: the same equation carried past the melting point.
              The table view lists the values.
            </figcaption>
          </figure>
        ) : (
          <div className="relative overflow-x-auto">
            <table className="min-w-[32rem] border-collapse text-left text-body">
              <caption className="sr-only">Hydrogen solubility in pure aluminium at 1 atm, mL per 100 g</caption>
              <thead>
                <tr className="border-b border-line-strong">
                  <th scope="col" className="py-2 pr-6 font-semibold">
                    Temperature
                  </th>
                  <th scope="col" className="py-2 pr-6 text-right font-semibold">
                    Liquid (R&amp;N)
                  </th>
                  <th scope="col" className="py-2 pr-6 text-right font-semibold">
                    Liquid (T&amp;A)
                  </th>
                  <th scope="col" className="py-2 pr-6 text-right font-semibold">
                    Solid (R&amp;N)
                  </th>
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={r.tempC} className="border-b border-line">
                    <th scope="row" className="figures py-2 pr-6 font-medium">
                      {formatTemperature(r.tempC, unit)}
                    </th>
                    <td className="figures py-2 pr-6 text-right">{formatSolubility(r.liquid)}</td>
                    <td className="figures py-2 pr-6 text-right">{formatSolubility(r.liquidTA)}</td>
                    <td className="figures py-2 pr-6 text-right">{formatSolubility(r.solid)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </CalculatorLayout>
  );
}
