import { Plus, X } from 'lucide-react';
import { useState } from 'react';
import { CASTING_YIELD_SOURCE, formatMass, formatNumber, pourYield, type MassUnit } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { massFromInput, massSymbol, type Units } from '#src/lib/unit-input.ts';
import { attempt } from '../lib/attempt.ts';
import { CalculatorLayout, Formula, InputProblem, NumberInput, Readout, readNumber, WaitingForInput } from './calculator-parts.tsx';

const other = (unit: MassUnit): MassUnit => (unit === 'g' ? 'oz' : 'g');
let nextRow = 1;

/** Casting yield of one pour: the trade core's pourYield over the castings' total. */
export function YieldCalculator({ units }: { units: Units }) {
  const unit = units.massUnit;
  const symbol = massSymbol(unit);
  const [poured, setPoured] = useState('');
  const [castings, setCastings] = useState([{ key: 0, text: '' }]);

  const pouredN = readNumber(poured);
  const castingNs = castings.map((c) => readNumber(c.text));
  const filled = castingNs.filter((n): n is number => typeof n === 'number');
  const ready = typeof pouredN === 'number' && filled.length > 0 && !castingNs.includes('invalid');
  const castingG = filled.reduce((sum, n) => sum + massFromInput(n, unit), 0);
  const result = ready
    ? attempt(() => pourYield({ chargeG: massFromInput(pouredN, unit), castingG }), {
        chargeG: 'The metal poured',
        castingG: 'The castings',
      })
    : null;

  return (
    <CalculatorLayout
      inputs={
        <>
          <NumberInput
            label="Metal poured"
            unit={symbol}
            value={poured}
            onChange={setPoured}
            hint="Everything that left the crucible: castings, gates, runners and risers."
          />
          <fieldset className="flex flex-col gap-3">
            <legend className="mb-1 text-body font-medium text-ink">Castings, each trimmed of gates and risers</legend>
            {castings.map((row, i) => (
              <div key={row.key} className="flex items-end gap-2">
                <NumberInput
                  className="flex-1"
                  label={`Casting ${i + 1}`}
                  unit={symbol}
                  value={row.text}
                  onChange={(text) => setCastings((rows) => rows.map((r) => (r.key === row.key ? { ...r, text } : r)))}
                />
                {castings.length > 1 ? (
                  <Button
                    variant="quiet"
                    aria-label={`Remove casting ${i + 1}`}
                    icon={<X aria-hidden className="size-4" />}
                    onClick={() => setCastings((rows) => rows.filter((r) => r.key !== row.key))}
                  />
                ) : null}
              </div>
            ))}
            <Button
              className="self-start"
              size="sm"
              icon={<Plus aria-hidden className="size-4" />}
              onClick={() => setCastings((rows) => [...rows, { key: nextRow++, text: '' }])}
            >
              Add a casting
            </Button>
          </fieldset>
        </>
      }
      results={
        result === null ? (
          <WaitingForInput>Enter the metal poured and at least one casting.</WaitingForInput>
        ) : !result.ok ? (
          <InputProblem>{result.problem}</InputProblem>
        ) : (
          <>
            <Readout label="Casting yield" value={`${formatNumber(result.value.yieldPct, 1)} %`} note={`${formatMass(castingG, unit)} of castings in all.`} />
            <Readout
              size="small"
              label="Returns (gates, risers, spill)"
              value={formatMass(result.value.remainderG, unit)}
              other={formatMass(result.value.remainderG, other(unit))}
            />
          </>
        )
      }
      formula={
        <>
          <Formula>yield = castings ÷ metal poured × 100 %</Formula>
          <Formula>returns = metal poured − castings</Formula>
          <p>Put your yield into the charge calculator for the next pour of the same pattern.</p>
        </>
      }
      sources={[CASTING_YIELD_SOURCE]}
    />
  );
}
