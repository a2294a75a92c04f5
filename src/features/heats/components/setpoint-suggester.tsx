import { useId, useState } from 'react';
import { TextField } from '#src/components/ui/text-field.tsx';
import { parseDecimal, temperatureFromInput, temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { SetpointHint } from './setpoint-hint.tsx';

/** "What should I set to pour at …?" for one furnace, from its offset over past heats. */
export function SetpointSuggester({ workshopId, furnace, units }: { workshopId: string; furnace: { id: string; name: string }; units: Units }) {
  const id = useId();
  const [target, setTarget] = useState('');
  const parsed = parseDecimal(target);
  const targetC = typeof parsed === 'number' ? temperatureFromInput(parsed, units.temperatureUnit) : null;
  return (
    <div className="bench flex max-w-md flex-col gap-3">
      <TextField
        id={id}
        label="Pour temperature you aim for"
        inputMode="decimal"
        autoComplete="off"
        suffix={temperatureSymbol(units.temperatureUnit)}
        value={target}
        error={parsed === 'invalid' ? 'Enter a number, like 720' : undefined}
        onChange={(e) => setTarget(e.target.value)}
      />
      <SetpointHint workshopId={workshopId} furnace={furnace} targetC={targetC} units={units} />
    </div>
  );
}
