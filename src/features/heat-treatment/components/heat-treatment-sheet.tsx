import { Printer } from 'lucide-react';
import { findAlloy, type HeatTreatmentStep, type TemperatureUnit } from '#shared/domain/index.ts';
import { stepName } from '#shared/heat-treatment/compare-plan.ts';
import type { HeatTreatmentDetail } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { formatDate, formatDateTime } from '#src/lib/format.ts';
import { stepFacts } from '../lib/plan-text.ts';
import { HeatTreatmentCautions } from './heat-treatment-cautions.tsx';
import './heat-treatment-sheet.css';

type Props = { plan: HeatTreatmentDetail; unit: TemperatureUnit };

function Blank({ label }: { label: string }) {
  return (
    <span className="inline-flex items-end gap-2">
      <span>{label}</span>
      <span className="ht-blank" aria-label={`${label}: blank to write in`} />
    </span>
  );
}

/** The blanks the person at the oven fills in for one step. */
function StepBlanks({ step }: { step: HeatTreatmentStep }) {
  const unitBlank = 'reading (°C or °F)';
  switch (step.kind) {
    case 'solution':
    case 'artificial_age':
      return (
        <div className="flex flex-wrap gap-x-8 gap-y-3">
          <Blank label="Oven set to" />
          <Blank label="Load in at" />
          <Blank label="At temperature at" />
          <Blank label="Out at" />
          <Blank label={`Thermocouple ${unitBlank}`} />
        </div>
      );
    case 'natural_age':
      return (
        <div className="flex flex-wrap gap-x-8 gap-y-3">
          <Blank label="Started" />
          <Blank label="Ended" />
        </div>
      );
    case 'quench':
      return (
        <div className="flex flex-wrap gap-x-8 gap-y-3">
          <Blank label={`Bath ${unitBlank}`} />
          <Blank label="Oven door open at" />
          <Blank label="In the water at" />
          <Blank label="Delay (s)" />
        </div>
      );
  }
}

/**
 * The sheet that goes to the oven: the plan's steps with every temperature
 * in the reader's unit and the other one, the times, the quench medium and
 * its longest delay, blanks for what actually happened, and the cautions.
 * On screen it is a preview with a print button; on paper only the sheet.
 */
export function HeatTreatmentSheet({ plan, unit }: Props) {
  const alloy = findAlloy(plan.plan.designation);
  const steps = plan.plan.steps;
  return (
    <article className="ht-sheet flex max-w-4xl flex-col gap-6 text-lead" aria-labelledby="ht-sheet-title">
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div className="flex flex-col gap-1">
          <h1 id="ht-sheet-title" className="text-display font-semibold text-ink">
            Heat-treatment sheet: {plan.alloy} {plan.temper}
          </h1>
          <p className="text-ink-muted">{plan.plan.description}</p>
        </div>
        <Button className="ht-no-print" variant="primary" icon={<Printer aria-hidden className="size-5" />} onClick={() => window.print()}>
          Print the sheet
        </Button>
      </header>

      <dl className="grid gap-x-8 gap-y-2 sm:grid-cols-[auto_1fr]">
        <dt className="font-semibold">Oven</dt>
        <dd>{plan.oven}</dd>
        <dt className="font-semibold">Caster</dt>
        <dd>{plan.casterName}</dd>
        <dt className="font-semibold">Castings</dt>
        <dd>
          {plan.castings.map((c) => `No. ${c.number} from the heat of ${formatDate(c.heatPouredAt)}${c.mouldName ? ` (${c.mouldName})` : ''}`).join('; ')}
        </dd>
        <dt className="font-semibold">Planned</dt>
        <dd>{formatDateTime(plan.createdAt)}</dd>
      </dl>

      <ol className="flex flex-col gap-4">
        {steps.map((step, i) => (
          <li key={i} className="ht-step flex flex-col gap-3 rounded-lg border-2 border-line-strong p-4">
            <h2 className="text-heading font-semibold">
              Step {i + 1}: {stepName(step.kind)}
            </h2>
            <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
              {stepFacts(step, unit).map((f) => (
                <div key={f.label} className="contents">
                  <dt className="font-semibold">{f.label}</dt>
                  <dd className="figures">{f.value}</dd>
                </div>
              ))}
            </dl>
            {step.note ? <p className="text-body">{step.note}</p> : null}
            <StepBlanks step={step} />
          </li>
        ))}
      </ol>

      <section aria-labelledby="ht-sheet-cautions" className="flex flex-col gap-3">
        <h2 id="ht-sheet-cautions" className="text-heading font-semibold">
          Cautions
        </h2>
        <HeatTreatmentCautions
          unit={unit}
          solidusC={alloy?.solidusC}
          designation={plan.alloy}
          hasQuench={steps.some((s) => s.kind === 'quench')}
        />
      </section>

      <section aria-labelledby="ht-sheet-sources" className="text-body">
        <h2 id="ht-sheet-sources" className="mb-1 text-title font-semibold">
          Sources
        </h2>
        <ul className="list-disc pl-6">
          {plan.plan.sources.map((s) => (
            <li key={s.citation}>{s.citation}</li>
          ))}
        </ul>
      </section>
    </article>
  );
}
