import { useState } from 'react';
import { ITS90_FREEZING_POINTS_C, ITS90_SOURCE, cToF, cToK, fToC, formatNumber, formatTemperature } from '#shared/domain/index.ts';
import { numberToInput, type Units } from '#src/lib/unit-input.ts';
import { TEMPERATURE_SCALE_SOURCE } from '../lib/calculator-sources.ts';
import { CalculatorLayout, Formula, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

const METAL_NAMES: Record<keyof typeof ITS90_FREEZING_POINTS_C, string> = {
  tin: 'Tin',
  zinc: 'Zinc',
  aluminium: 'Aluminium',
  silver: 'Silver',
  gold: 'Gold',
  copper: 'Copper',
};

/**
 * °C ⇄ °F: type in either field and the other follows. The user's own unit
 * comes first. Below, the ITS-90 freezing points of pure metals, the
 * figures a thermocouple is checked against.
 */
export function TemperatureConverter({ units }: { units: Units }) {
  const [text, setText] = useState<{ C: string; F: string; typedIn: 'C' | 'F' }>({ C: '', F: '', typedIn: units.temperatureUnit });
  const order = units.temperatureUnit === 'C' ? (['C', 'F'] as const) : (['F', 'C'] as const);

  const onChange = (unit: 'C' | 'F', value: string) => {
    const n = readNumber(value);
    if (typeof n !== 'number') {
      setText(unit === 'C' ? { C: value, F: n === null ? '' : text.F, typedIn: 'C' } : { F: value, C: n === null ? '' : text.C, typedIn: 'F' });
      return;
    }
    setText(unit === 'C' ? { C: value, F: numberToInput(cToF(n), 2), typedIn: 'C' } : { F: value, C: numberToInput(fToC(n), 2), typedIn: 'F' });
  };

  // From the field that was typed in, not from the other field's rounded text.
  const typed = readNumber(text[text.typedIn]);
  const c = typeof typed === 'number' ? (text.typedIn === 'C' ? typed : fToC(typed)) : typed;
  const kelvin = typeof c === 'number' ? cToK(c) : null;

  return (
    <CalculatorLayout
      inputs={
        <>
          {order.map((u) => (
            <NumberInput
              key={u}
              label={u === 'C' ? 'Degrees Celsius' : 'Degrees Fahrenheit'}
              unit={`°${u}`}
              value={text[u]}
              onChange={(v) => onChange(u, v)}
            />
          ))}
        </>
      }
      results={
        typeof c !== 'number' ? (
          <WaitingForInput>Type a temperature in either field.</WaitingForInput>
        ) : (
          <>
            <Readout
              label={units.temperatureUnit === 'C' ? 'In °F' : 'In °C'}
              tone="heat"
              value={formatTemperature(c, units.temperatureUnit === 'C' ? 'F' : 'C', 1)}
              other={formatTemperature(c, units.temperatureUnit, 1)}
            />
            <Readout size="small" label="In kelvin" value={`${formatNumber(kelvin!, 2)} K`} />
          </>
        )
      }
      formula={
        <>
          <Formula>°F = °C × 9/5 + 32</Formula>
          <Formula>°C = (°F − 32) × 5/9</Formula>
          <Formula>K = °C + 273.15</Formula>
          <p>A temperature difference (a superheat, an offset) converts by 9/5 alone: 100 °C of superheat is 180 °F.</p>
        </>
      }
      sources={[TEMPERATURE_SCALE_SOURCE, ITS90_SOURCE]}
    >
      <section aria-labelledby="fixed-points" className="flex flex-col gap-2">
        <h2 id="fixed-points" className="text-title font-semibold text-ink">
          Freezing points of pure metals
        </h2>
        <p className="max-w-prose text-body text-ink-muted">
          The fixed points of the 1990 temperature scale. A thermocouple held in freezing pure metal should read these.
        </p>
        <div className="relative overflow-x-auto">
          <table className="min-w-[24rem] border-collapse text-left text-body">
            <thead>
              <tr className="border-b border-line-strong">
                <th scope="col" className="py-2 pr-6 font-semibold">
                  Metal
                </th>
                {order.map((u) => (
                  <th key={u} scope="col" className="py-2 pr-6 text-right font-semibold">
                    °{u}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {(Object.entries(ITS90_FREEZING_POINTS_C) as [keyof typeof ITS90_FREEZING_POINTS_C, number][]).map(([metal, pointC]) => (
                <tr key={metal} className="border-b border-line">
                  <th scope="row" className="py-2 pr-6 font-medium">
                    {METAL_NAMES[metal]}
                  </th>
                  {order.map((u) => (
                    <td key={u} className="figures py-2 pr-6 text-right">
                      {formatTemperature(pointC, u, 2)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </CalculatorLayout>
  );
}
