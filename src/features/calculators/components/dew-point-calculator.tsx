import { CircleCheck, TriangleAlert, OctagonAlert } from 'lucide-react';
import { useState } from 'react';
import {
  DEFAULT_HUMIDITY_BANDS,
  HUMIDITY_BANDS_SOURCE,
  MAGNUS,
  MAGNUS_SOURCE,
  dewPointC,
  formatNumber,
  formatTemperature,
  humidityRisk,
  vapourPressureHpa,
  type HumidityRisk,
  type TemperatureUnit,
} from '#shared/domain/index.ts';
import { cn } from '#src/lib/cn.ts';
import { temperatureFromInput, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { CalculatorLayout, Formula, InputProblem, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

const other = (unit: TemperatureUnit): TemperatureUnit => (unit === 'C' ? 'F' : 'C');

const RISK_LOOK: Record<HumidityRisk, { word: string; icon: typeof CircleCheck; classes: string; advice: string }> = {
  low: {
    word: 'Low',
    icon: CircleCheck,
    classes: 'border-sound-line bg-sound-bg text-sound',
    advice: 'Dry air: the melt takes up little hydrogen from it.',
  },
  moderate: {
    word: 'Moderate',
    icon: TriangleAlert,
    classes: 'border-caution-line bg-caution-bg text-caution',
    advice: 'Enough water in the air to add hydrogen over a long hold: keep the hold short and the melt covered.',
  },
  high: {
    word: 'High',
    icon: OctagonAlert,
    classes: 'border-danger-line bg-danger-bg text-danger',
    advice: 'Humid air feeds hydrogen into the melt: cover it, hold it briefly and degas just before the pour.',
  },
};

/** Dew point of the shop air by the Magnus form, with this app's hydrogen pick-up band beside it, labelled as such. */
export function DewPointCalculator({ units }: { units: Units }) {
  const unit = units.temperatureUnit;
  const [air, setAir] = useState('');
  const [rh, setRh] = useState('');
  const a = readNumber(air);
  const h = readNumber(rh);
  const ready = typeof a === 'number' && typeof h === 'number';
  const tempC = typeof a === 'number' ? temperatureFromInput(a, unit) : 0;
  const result = ready
    ? attempt(
        () => {
          const dewPoint = dewPointC({ tempC, relativeHumidityPct: h });
          return { dewPoint, risk: humidityRisk(dewPoint), vapourHpa: vapourPressureHpa({ tempC, relativeHumidityPct: h }) };
        },
        { tempC: 'The air temperature', relativeHumidityPct: 'The relative humidity (above 0, at most 100 %)' },
      )
    : null;
  const bands = DEFAULT_HUMIDITY_BANDS;

  return (
    <CalculatorLayout
      inputs={
        <>
          <NumberInput label="Air temperature" unit={temperatureSymbol(unit)} value={air} onChange={setAir} hint="In the shop, near the furnace but not in its heat." />
          <NumberInput label="Relative humidity" unit="%" value={rh} onChange={setRh} hint="From a hygrometer or today's weather report." />
        </>
      }
      results={
        result === null ? (
          <WaitingForInput>Enter the air temperature and relative humidity.</WaitingForInput>
        ) : !result.ok ? (
          <InputProblem>{result.problem}</InputProblem>
        ) : (
          <>
            <Readout
              label="Dew point"
              value={formatTemperature(result.value.dewPoint, unit, 1)}
              other={formatTemperature(result.value.dewPoint, other(unit), 1)}
              note={`Water-vapour pressure ${formatNumber(result.value.vapourHpa, 1)} hPa.`}
            />
            <RiskBand risk={result.value.risk} />
          </>
        )
      }
      formula={
        <>
          <Formula>γ = ln(RH ÷ 100) + a·T ÷ (b + T)</Formula>
          <Formula>
            dew point = b·γ ÷ (a − γ), a = {MAGNUS.a}, b = {MAGNUS.b} °C
          </Formula>
          <p>
            T in °C. The dew point measures how much water the air holds, whatever its temperature, which is what an aluminium melt takes
            hydrogen from (water meeting aluminium gives oxide and hydrogen).
          </p>
          <p>
            The risk bands are this app's heuristic, not a published threshold: low below {formatTemperature(bands.moderateFromC, unit)}, moderate
            from {formatTemperature(bands.moderateFromC, unit)} to {formatTemperature(bands.highAboveC, unit)}, high above{' '}
            {formatTemperature(bands.highAboveC, unit)} of dew point.
          </p>
        </>
      }
      sources={[MAGNUS_SOURCE, HUMIDITY_BANDS_SOURCE]}
    />
  );
}

function RiskBand({ risk }: { risk: HumidityRisk }) {
  const look = RISK_LOOK[risk];
  const Icon = look.icon;
  return (
    <div className={cn('flex gap-3 rounded-md border p-3', look.classes)}>
      <Icon aria-hidden className="mt-0.5 size-5 shrink-0" />
      <div className="flex flex-col gap-1">
        <p className="text-caption font-semibold tracking-wide uppercase">App heuristic, not a published threshold</p>
        <p className="text-body font-semibold text-ink">Hydrogen pick-up risk: {look.word.toLowerCase()}</p>
        <p className="text-body text-ink">{look.advice}</p>
      </div>
    </div>
  );
}
