import { useState } from 'react';
import { HEAT_CONDITION_LABELS, findMeltVariable } from '#shared/domain/index.ts';
import type { HeatConditionField, TemperatureUnit } from '#shared/domain/index.ts';
import type { Diagnosis } from '#shared/reports/diagnosis-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Caution } from '#src/components/ui/caution.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { cn } from '#src/lib/cn.ts';
import { withFahrenheit } from '../lib/condition-inputs.ts';
import { STATUS_WORDS, scorePoints, scoreWords } from '../lib/score-words.ts';
import { RecordConditionField, type RecordProps } from './record-condition-field.tsx';
import { WhatIfPanel } from './what-if-panel.tsx';

type LikelyCausesViewProps = {
  diagnosis: Diagnosis;
  temperatureUnit: TemperatureUnit;
  /** Given when the viewer may record the missing values on this heat. */
  recording?: RecordProps;
  /** Shows the what-if panel under the ranking. */
  withWhatIf?: boolean;
  /** How many causes open with their evidence; the rest fold. */
  openCount?: number;
  heading?: string;
  headingLevel?: 2 | 3;
};

const STATUS_LOOK = {
  confirmed: 'border-danger-line bg-danger',
  suspected: 'border-caution-line bg-caution',
  normal: 'border-line-strong bg-ink-muted',
} as const;

/**
 * The ranked likely causes, evidence first: each variable's own values from
 * this heat, the fix to try, the source, and what was not recorded (with a
 * field to record it). Never a bare score: the bar has its words beside it.
 */
export function LikelyCausesView({
  diagnosis,
  temperatureUnit,
  recording,
  withWhatIf = false,
  openCount = 3,
  heading = 'Likely causes',
  headingLevel = 2,
}: LikelyCausesViewProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  const Sub = headingLevel === 2 ? 'h3' : 'h4';
  const { causes, cautions } = diagnosis;
  return (
    <section aria-label={heading} className="flex flex-col gap-4" data-testid="likely-causes">
      <Heading className="text-title font-semibold text-ink">{heading}</Heading>
      {cautions.map((c) => (
        <Caution key={c.id} heading={c.title}>
          <p>{withFahrenheit(c.text, temperatureUnit)}</p>
          <p className="text-caption text-ink-muted">Source: {c.source}</p>
        </Caution>
      ))}
      {causes.length === 0 ? (
        <Notice tone="info" title="No causes to rank yet">
          <p>Mark a defect on one of the casting's photos: the ranking reads the marked kinds and this heat's log.</p>
        </Notice>
      ) : (
        <ol className="flex flex-col gap-3">
          {causes.map((cause, i) => (
            <CauseItem key={cause.variable} cause={cause} rank={i + 1} open={i < openCount} temperatureUnit={temperatureUnit} recording={recording} Sub={Sub} />
          ))}
        </ol>
      )}
      {diagnosis.priorsNote ? (
        <Notice tone="info" title="What this workshop's reviews add">
          <p>{diagnosis.priorsNote}</p>
        </Notice>
      ) : null}
      {diagnosis.missing.length > 0 ? (
        <div className="rounded-md border border-line bg-surface-sunken p-3">
          <Sub className="font-semibold text-ink">Not recorded</Sub>
          <p className="text-caption text-ink-muted">Each of these would confirm or rule out a cause above.</p>
          <ul className="mt-2 flex flex-col gap-1">
            {diagnosis.missing.map((m) => (
              <li key={m.field} className="text-body text-ink">
                <span className="font-medium">{m.label}</span>: waits for{' '}
                {m.variables.map((v) => findMeltVariable(v)?.name.toLowerCase() ?? v).join(', ')}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {diagnosis.ruleSet.custom ? <p className="text-caption text-ink-muted">Ranked with this workshop's own rule changes.</p> : null}
      {withWhatIf && causes.length > 0 ? <WhatIfPanel input={diagnosis.input} temperatureUnit={temperatureUnit} /> : null}
    </section>
  );
}

function CauseItem({
  cause,
  rank,
  open,
  temperatureUnit,
  recording,
  Sub,
}: {
  cause: Diagnosis['causes'][number];
  rank: number;
  open: boolean;
  temperatureUnit: TemperatureUnit;
  recording?: RecordProps;
  Sub: 'h3' | 'h4';
}) {
  const [expanded, setExpanded] = useState(open);
  const [recordingField, setRecordingField] = useState<HeatConditionField | null>(null);
  const name = findMeltVariable(cause.variable)?.name ?? cause.variable;
  const points = scorePoints(cause.score);
  const status = STATUS_WORDS[cause.status];
  const detailsId = `cause-${cause.variable}-details`;
  return (
    <li className="rounded-md border border-line bg-surface-raised p-3" data-testid={`cause-${cause.variable}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <Sub className="text-body font-semibold text-ink">
          <span className="mr-1 font-mono tabular-nums">{rank}.</span> {name}
        </Sub>
        <span className="text-caption text-ink">
          <span className="font-semibold">{status.word}</span>: {status.meaning}
        </span>
      </div>
      <div className="mt-2 flex items-center gap-3">
        <div
          role="meter"
          aria-label={`${name} score`}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={points}
          aria-valuetext={`${points} of 100, ${scoreWords(cause.score)}`}
          className="h-3 flex-1 overflow-hidden rounded-full border border-line-strong bg-surface-sunken"
        >
          <div className={cn('h-full border-r', STATUS_LOOK[cause.status])} style={{ width: `${Math.max(2, points)}%` }} />
        </div>
        <span className="shrink-0 font-mono text-caption tabular-nums text-ink">
          {points} of 100 · {scoreWords(cause.score)}
        </span>
      </div>
      <Button size="sm" variant="quiet" className="mt-1" aria-expanded={expanded} aria-controls={detailsId} onClick={() => setExpanded((x) => !x)}>
        {expanded ? 'Hide the evidence' : 'Show the evidence'}
      </Button>
      <div id={detailsId} hidden={!expanded} className="mt-1 flex flex-col gap-2">
        <div>
          <p className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Evidence</p>
          <ul className="list-disc pl-5 text-body text-ink">
            {cause.evidence.map((e, i) => (
              <li key={i}>{withFahrenheit(e, temperatureUnit)}</li>
            ))}
          </ul>
        </div>
        {cause.missing.length > 0 ? (
          <div>
            <p className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Not recorded</p>
            <ul className="flex flex-col gap-2">
              {cause.missing.map((field) => (
                <li key={field} className="flex flex-col gap-1">
                  <div className="flex flex-wrap items-center gap-2">
                    <span className="text-body text-ink">
                      {HEAT_CONDITION_LABELS[field]}: <span className="italic">not recorded</span>
                    </span>
                    {recording && recordingField !== field ? (
                      <Button size="sm" onClick={() => setRecordingField(field)}>
                        Record the {HEAT_CONDITION_LABELS[field]}
                      </Button>
                    ) : null}
                  </div>
                  {recording && recordingField === field ? (
                    <RecordConditionField
                      {...recording}
                      field={field}
                      autoFocus
                      onRecord={async (p) => {
                        await recording.onRecord(p);
                        setRecordingField(null);
                      }}
                    />
                  ) : null}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {cause.missingAlloy ? <p className="text-body text-ink">The alloy is not chosen: choosing it on the heat would firm this up.</p> : null}
        {cause.prior ? <p className="text-body text-ink">{cause.prior.explanation}</p> : null}
        {cause.fixes.length > 0 ? (
          <div>
            <p className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Fix to try</p>
            <ul className="list-disc pl-5 text-body text-ink">
              {cause.fixes.map((f, i) => (
                <li key={i}>{f}</li>
              ))}
            </ul>
          </div>
        ) : null}
        {cause.sources.length > 0 ? (
          <div>
            <p className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Sources</p>
            <ul className="list-disc pl-5 text-caption text-ink-muted">
              {cause.sources.map((s, i) => (
                <li key={i}>{s}</li>
              ))}
            </ul>
          </div>
        ) : null}
      </div>
    </li>
  );
}
