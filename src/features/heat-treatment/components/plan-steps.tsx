import type { TemperatureUnit } from '#shared/domain/index.ts';
import { stepName } from '#shared/heat-treatment/compare-plan.ts';
import type { StoredHeatTreatmentPlan } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { stepFacts } from '../lib/plan-text.ts';

/** A plan's steps with their temperatures (both units), times and quench, and the sources behind them. */
export function PlanSteps({ plan, unit, showSources = true }: { plan: Pick<StoredHeatTreatmentPlan, 'steps' | 'sources' | 'inheritedFrom'>; unit: TemperatureUnit; showSources?: boolean }) {
  return (
    <div className="flex flex-col gap-3">
      <ol className="flex flex-col gap-2">
        {plan.steps.map((step, i) => (
          <li key={i} className="rounded-md border border-line bg-surface-sunken p-3">
            <p className="font-semibold text-ink">
              {i + 1}. {stepName(step.kind)}
            </p>
            <dl className="mt-1 grid gap-x-4 gap-y-0.5 text-body sm:grid-cols-[auto_1fr]">
              {stepFacts(step, unit).map((f) => (
                <div key={f.label} className="contents">
                  <dt className="text-ink-muted">{f.label}</dt>
                  <dd className="figures text-ink">{f.value}</dd>
                </div>
              ))}
            </dl>
          </li>
        ))}
      </ol>
      {showSources ? (
        <details className="text-caption text-ink-muted">
          <summary className="cursor-pointer font-medium text-ink">Sources</summary>
          <ul className="mt-1 list-disc pl-5">
            {plan.inheritedFrom ? <li>Schedule borrowed from {plan.inheritedFrom}, the library alloy this one is based on.</li> : null}
            {plan.sources.map((s) => (
              <li key={s.citation}>{s.citation}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
