import { useId, useMemo, useState } from 'react';
import type { HeatConditions, TemperatureUnit } from '#shared/domain/index.ts';
import type { DiagnosisInput } from '#shared/reports/diagnosis-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { fromCelsius, toCelsius } from '../lib/condition-inputs.ts';
import { scorePoints, scoreWords, STATUS_WORDS } from '../lib/score-words.ts';
import { whatIf } from '../lib/what-if.ts';

type Draft = { pour: string; mould: string; hold: string; humidity: string; degassed: '' | 'yes' | 'no' };

const num = (s: string): number | undefined => {
  const n = Number(s.trim().replace(',', '.'));
  return s.trim() === '' || !Number.isFinite(n) ? undefined : n;
};

function draftOf(input: DiagnosisInput, unit: TemperatureUnit): Draft {
  const c = input.conditions;
  return {
    pour: c.pourTempC === undefined ? '' : String(fromCelsius(c.pourTempC, unit)),
    mould: c.moldTempC === undefined ? '' : String(fromCelsius(c.moldTempC, unit)),
    hold: c.holdTimeMin === undefined ? '' : String(Math.round(c.holdTimeMin)),
    humidity: c.relativeHumidityPct === undefined ? '' : String(c.relativeHumidityPct),
    degassed: c.degassed === undefined ? '' : c.degassed ? 'yes' : 'no',
  };
}

/**
 * Change a few conditions and watch the ranking move. Runs the trade core's
 * `diagnose` in the browser on the diagnosis's own input; nothing is saved.
 */
export function WhatIfPanel({ input, temperatureUnit }: { input: DiagnosisInput; temperatureUnit: TemperatureUnit }) {
  const headingId = useId();
  const [draft, setDraft] = useState<Draft>(() => draftOf(input, temperatureUnit));
  const set = (key: keyof Draft) => (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [key]: e.target.value }));

  const changes = useMemo(() => {
    const inRange = (n: number | undefined, min: number, max: number) => (n !== undefined && n >= min && n <= max ? n : undefined);
    const pour = num(draft.pour);
    const mould = num(draft.mould);
    const out: Partial<Record<keyof HeatConditions, unknown>> = {
      pourTempC: inRange(pour === undefined ? undefined : toCelsius(pour, temperatureUnit), 0, 1800),
      moldTempC: inRange(mould === undefined ? undefined : toCelsius(mould, temperatureUnit), -40, 1200),
      holdTimeMin: inRange(num(draft.hold), 0, 1440),
      relativeHumidityPct: inRange(num(draft.humidity), 0, 100),
      degassed: draft.degassed === '' ? undefined : draft.degassed === 'yes',
    };
    return out as Partial<HeatConditions>;
  }, [draft, temperatureUnit]);

  const { after } = useMemo(() => whatIf(input, changes), [input, changes]);
  const t = `°${temperatureUnit}`;

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3 rounded-md border-2 border-dashed border-line-strong p-3" data-testid="what-if">
      <div>
        <h3 id={headingId} className="text-body font-semibold text-ink">
          What-if — not saved
        </h3>
        <p className="text-caption text-ink-muted">
          Change a condition to see how the ranking would move. This runs here on the page with the shipped rules; the heat log stays as recorded.
        </p>
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Pour temperature" inputMode="decimal" suffix={t} value={draft.pour} onChange={set('pour')} />
        <TextField label="Mould temperature" inputMode="decimal" suffix={t} value={draft.mould} onChange={set('mould')} />
        <TextField label="Hold time" inputMode="decimal" suffix="min" value={draft.hold} onChange={set('hold')} />
        <TextField label="Relative humidity" inputMode="decimal" suffix="%" value={draft.humidity} onChange={set('humidity')} />
        <SelectField label="Degassed" value={draft.degassed} onChange={set('degassed')}>
          <option value="">not recorded</option>
          <option value="yes">yes</option>
          <option value="no">no</option>
        </SelectField>
      </div>
      <Button size="sm" className="self-start" onClick={() => setDraft(draftOf(input, temperatureUnit))}>
        Back to the recorded values
      </Button>
      <ol aria-label="What-if ranking" className="flex flex-col gap-1" aria-live="polite">
        {after.map((c) => (
          <li key={c.variable} className="flex flex-wrap items-baseline gap-x-2 text-body text-ink" data-testid="what-if-row">
            <span className="font-mono tabular-nums">{c.rank}.</span>
            <span className="font-medium">{c.name}</span>
            <span className="text-caption text-ink-muted">
              {scorePoints(c.score)} of 100 · {scoreWords(c.score)} · {STATUS_WORDS[c.status].word}
            </span>
            <span className="text-caption font-semibold">{moveWords(c.moved)}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}

function moveWords(moved: number | null): string {
  if (moved === null) return 'new';
  if (moved === 0) return 'no change';
  const places = Math.abs(moved) === 1 ? 'place' : 'places';
  return moved > 0 ? `▲ up ${moved} ${places}` : `▼ down ${-moved} ${places}`;
}
