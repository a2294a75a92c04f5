import { CircleCheck, CircleDashed, TriangleAlert } from 'lucide-react';
import { useState } from 'react';
import { formatTemperature, type TemperatureUnit } from '#shared/domain/index.ts';
import { describeDeviation, formatDelay, formatDurationRange, stepName } from '#shared/heat-treatment/compare-plan.ts';
import {
  ACTUAL_QUENCH_MEDIA,
  type ActualQuenchMedium,
  type MissingField,
  type StepComparison,
} from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDateTime } from '#src/lib/format.ts';
import { useRecordSteps } from '../api/use-heat-treatment-record.ts';
import { MEDIUM_WORDS, stepFacts } from '../lib/plan-text.ts';
import { fromLocalInput, parseNumber, temperatureFromText, temperatureText, toLocalInput } from '../lib/record-input.ts';

const MISSING_WORDS: Record<MissingField, string> = {
  times: 'start and end times',
  temperature: 'the temperature reading',
  quench_medium: 'the quench medium',
  quench_delay: 'the delay from oven to tank',
};

function StatusWord({ step }: { step: StepComparison }) {
  if (step.status === 'not_recorded')
    return (
      <span className="inline-flex items-center gap-1.5 text-ink-muted">
        <CircleDashed aria-hidden className="size-4" /> Not recorded
      </span>
    );
  if (step.status === 'deviates')
    return (
      <span className="inline-flex items-center gap-1.5 font-medium text-caution">
        <TriangleAlert aria-hidden className="size-4" /> Off the plan
      </span>
    );
  return (
    <span className="inline-flex items-center gap-1.5 font-medium text-sound">
      <CircleCheck aria-hidden className="size-4" /> As planned{step.missing.length ? ' so far' : ''}
    </span>
  );
}

type Props = { workshopId: string; planId: string; step: StepComparison; unit: TemperatureUnit; mayRecord: boolean };

/** One step: what the plan says, what was recorded, how they differ, and (for its caster) the form to record it. */
export function StepRecord({ workshopId, planId, step, unit, mayRecord }: Props) {
  const a = step.actual;
  const recorded: { label: string; value: string }[] = [];
  if (a?.startedAt) recorded.push({ label: 'Started', value: formatDateTime(a.startedAt) });
  if (a?.endedAt) recorded.push({ label: 'Ended', value: formatDateTime(a.endedAt) });
  if (step.durationMin !== null) recorded.push({ label: 'Time', value: formatDurationRange({ min: Math.round(step.durationMin), max: Math.round(step.durationMin) }) });
  if (a?.temperatureC != null) recorded.push({ label: step.kind === 'quench' ? 'Bath' : 'Oven reading', value: formatTemperature(a.temperatureC, unit) });
  if (a?.quenchMedium) recorded.push({ label: 'Medium', value: MEDIUM_WORDS[a.quenchMedium] });
  if (a?.quenchDelayS != null) recorded.push({ label: 'Oven to tank', value: formatDelay(a.quenchDelayS) });

  return (
    <li className="flex flex-col gap-3 rounded-lg border border-line bg-surface-raised p-4" aria-labelledby={`step-${step.index}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`step-${step.index}`} className="text-title font-semibold text-ink">
          Step {step.index + 1}: {stepName(step.kind)}
        </h3>
        <StatusWord step={step} />
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <div>
          <h4 className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Plan</h4>
          <dl className="flex flex-col gap-1 text-body">
            {stepFacts(step.planned, unit).map((f) => (
              <div key={f.label}>
                <dt className="text-caption text-ink-muted">{f.label}</dt>
                <dd className="figures">{f.value}</dd>
              </div>
            ))}
          </dl>
        </div>
        <div>
          <h4 className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Record</h4>
          {recorded.length ? (
            <dl className="flex flex-col gap-1 text-body">
              {recorded.map((f) => (
                <div key={f.label}>
                  <dt className="text-caption text-ink-muted">{f.label}</dt>
                  <dd className="figures">{f.value}</dd>
                </div>
              ))}
            </dl>
          ) : (
            <p className="text-body text-ink-muted">Nothing recorded yet.</p>
          )}
          {a?.notes ? <p className="mt-1 text-body">{a.notes}</p> : null}
        </div>
      </div>
      {step.deviations.map((d) => (
        <Notice key={d.code} tone={d.level === 'danger' ? 'danger' : 'caution'} title={d.level === 'danger' ? 'Check the casting' : 'Off the plan'}>
          <p>{describeDeviation(d, unit)}</p>
        </Notice>
      ))}
      {a && step.missing.length ? (
        <p className="text-caption text-ink-muted">Still to record: {step.missing.map((m) => MISSING_WORDS[m]).join(', ')}.</p>
      ) : null}
      {mayRecord ? <StepForm workshopId={workshopId} planId={planId} step={step} unit={unit} /> : null}
    </li>
  );
}

function StepForm({ workshopId, planId, step, unit }: Omit<Props, 'mayRecord'>) {
  const record = useRecordSteps(workshopId, planId);
  const a = step.actual;
  const [startedAt, setStartedAt] = useState(toLocalInput(a?.startedAt ?? null));
  const [endedAt, setEndedAt] = useState(toLocalInput(a?.endedAt ?? null));
  const [temperature, setTemperature] = useState(temperatureText(a?.temperatureC ?? null, unit));
  const [medium, setMedium] = useState<ActualQuenchMedium | ''>(a?.quenchMedium ?? '');
  const [delay, setDelay] = useState(a?.quenchDelayS != null ? String(a.quenchDelayS) : '');
  const [notes, setNotes] = useState(a?.notes ?? '');
  const [problem, setProblem] = useState<string | null>(null);
  const timed = step.kind !== 'quench';
  const hasTemperature = step.kind !== 'natural_age';

  const save = () => {
    setProblem(null);
    const t = parseNumber(temperature);
    const d = parseNumber(delay);
    if (t === 'invalid' || d === 'invalid') {
      setProblem('Type the temperature and the delay as plain numbers.');
      return;
    }
    record.mutate(
      {
        steps: [
          {
            stepIndex: step.index,
            ...(timed ? { startedAt: fromLocalInput(startedAt), endedAt: fromLocalInput(endedAt) } : {}),
            ...(hasTemperature ? { temperatureC: t === null ? null : temperatureFromText(t, unit) } : {}),
            ...(step.kind === 'quench' ? { quenchMedium: medium || null, quenchDelayS: d } : {}),
            notes: notes.trim() || null,
          },
        ],
      },
      {
        onError: (error) =>
          setProblem(isApiError(error) && error.issues.length ? error.issues.map((i) => i.message).join(' ') : errorMessage(error)),
      },
    );
  };

  return (
    <details className="rounded-md bg-surface-sunken p-3" open={!a}>
      <summary className="cursor-pointer font-medium text-ink">{a ? 'Change the record' : 'Record this step'}</summary>
      <div className="mt-3 grid gap-3 sm:grid-cols-2">
        {timed ? (
          <>
            <TextField label="Started" type="datetime-local" value={startedAt} onChange={(e) => setStartedAt(e.target.value)} />
            <TextField label="Ended" type="datetime-local" value={endedAt} onChange={(e) => setEndedAt(e.target.value)} />
          </>
        ) : null}
        {step.kind === 'quench' ? (
          <>
            <SelectField label="Quenched in" value={medium} onChange={(e) => setMedium(e.target.value as ActualQuenchMedium | '')}>
              <option value="">Not recorded</option>
              {ACTUAL_QUENCH_MEDIA.map((m) => (
                <option key={m} value={m}>
                  {MEDIUM_WORDS[m]}
                </option>
              ))}
            </SelectField>
            <TextField label="Oven to tank" inputMode="decimal" suffix="s" value={delay} onChange={(e) => setDelay(e.target.value)} />
          </>
        ) : null}
        {hasTemperature ? (
          <TextField
            label={step.kind === 'quench' ? 'Bath temperature' : 'Oven reading'}
            hint={step.kind === 'quench' ? undefined : 'From a thermocouple beside the load, not only the oven’s own display.'}
            inputMode="decimal"
            suffix={`°${unit}`}
            value={temperature}
            onChange={(e) => setTemperature(e.target.value)}
          />
        ) : null}
        <TextField label="Notes" value={notes} onChange={(e) => setNotes(e.target.value)} className="sm:col-span-2" />
      </div>
      {problem ? (
        <Notice tone="danger" role="alert" title="Not saved" className="mt-3">
          {problem}
        </Notice>
      ) : null}
      <Button className="mt-3" variant="secondary" onClick={save} pending={record.isPending} pendingLabel="Saving…">
        Save step {step.index + 1}
      </Button>
    </details>
  );
}
