import { UNIT_SPACE, cToF, formatNumber, formatTemperature, formatTemperatureDifference } from '../domain/index.ts';
import type { HeatTreatmentStep, SourceNote, TemperatureUnit } from '../domain/index.ts';
import type {
  Deviation,
  MissingField,
  PlanComparison,
  StepActual,
  StepComparison,
} from './heat-treatment-schemas.ts';

/**
 * How far an oven reading may sit from a single published temperature before
 * it counts as off the plan, °C. Solution treatment of aluminium is usually
 * done in furnaces held to about ±6 °C (±10 °F) uniformity (pyrometry class
 * cited by AMS 2771 and ASTM B917 practice); from memory, not re-checked.
 * Published ranges (205–230 °C) are taken as they stand, plus this margin.
 */
export const OVEN_TOLERANCE_C = 6;
export const OVEN_TOLERANCE_SOURCE: SourceNote = {
  citation:
    'furnace temperature uniformity of about ±6 °C (±10 °F) for solution treating and ageing aluminium castings, per the pyrometry class AMS 2771 calls for — from memory, not re-checked',
  grade: 'memory',
};

type CompareOptions = {
  /** The alloy's solidus, °C: a reading at or above it risks incipient melting (A356.0: 555 °C). */
  solidusC?: number;
  toleranceC?: number;
};

const hasValues = (a: StepActual) =>
  a.startedAt !== null ||
  a.endedAt !== null ||
  a.temperatureC !== null ||
  a.quenchMedium !== null ||
  a.quenchDelayS !== null ||
  (a.notes !== null && a.notes !== '');

function minutesBetween(startedAt: string | null, endedAt: string | null): number | null {
  if (!startedAt || !endedAt) return null;
  return (Date.parse(endedAt) - Date.parse(startedAt)) / 60_000;
}

function compareStep(index: number, planned: HeatTreatmentStep, found: StepActual | undefined, o: CompareOptions): StepComparison {
  const actual = found && hasValues(found) ? found : null;
  const durationMin = actual ? minutesBetween(actual.startedAt, actual.endedAt) : null;
  const deviations: Deviation[] = [];
  const missing: MissingField[] = [];
  const tol = o.toleranceC ?? OVEN_TOLERANCE_C;
  const push = (d: Omit<Deviation, 'stepIndex' | 'stepKind'>) => deviations.push({ stepIndex: index, stepKind: planned.kind, ...d });

  const checkDuration = (range: { min: number; max: number }) => {
    if (durationMin === null) {
      missing.push('times');
      return;
    }
    if (durationMin < range.min) push({ code: 'duration_short', level: 'caution', actual: durationMin, expected: range });
    else if (durationMin > range.max) push({ code: 'duration_long', level: 'caution', actual: durationMin, expected: range });
  };

  const checkOven = (range: { min: number; max: number }) => {
    const t = actual?.temperatureC ?? null;
    if (t === null) {
      missing.push('temperature');
      return;
    }
    if (o.solidusC !== undefined && t >= o.solidusC) {
      push({ code: 'at_or_above_solidus', level: 'danger', actual: t, expected: { max: o.solidusC } });
    } else if (t > range.max + tol) {
      push({ code: 'temperature_above_plan', level: 'caution', actual: t, expected: range, toleranceC: tol });
    } else if (t < range.min - tol) {
      push({ code: 'temperature_below_plan', level: 'caution', actual: t, expected: range, toleranceC: tol });
    }
  };

  switch (planned.kind) {
    case 'solution':
    case 'artificial_age':
      checkOven(planned.tempC);
      checkDuration(planned.durationMin);
      break;
    case 'natural_age':
      checkDuration(planned.durationMin);
      break;
    case 'quench': {
      const medium = actual?.quenchMedium ?? null;
      if (medium === null) missing.push('quench_medium');
      else if (medium !== planned.medium) {
        push({ code: 'quench_medium_differs', level: 'caution', actual: medium, expected: { medium: planned.medium } });
      }
      // The bath's own range is published as a range; no oven tolerance on top.
      const bath = actual?.temperatureC ?? null;
      if (bath === null) missing.push('temperature');
      else if (bath < planned.mediumTempC.min) {
        push({ code: 'temperature_below_plan', level: 'caution', actual: bath, expected: planned.mediumTempC });
      } else if (bath > planned.mediumTempC.max) {
        push({ code: 'temperature_above_plan', level: 'caution', actual: bath, expected: planned.mediumTempC });
      }
      const delay = actual?.quenchDelayS ?? null;
      const maxS = planned.maxDelayMin * 60;
      if (delay === null) missing.push('quench_delay');
      else if (delay > maxS) push({ code: 'quench_delay_over_max', level: 'caution', actual: delay, expected: { max: maxS } });
      break;
    }
  }

  return {
    index,
    kind: planned.kind,
    planned,
    actual,
    durationMin,
    status: actual === null ? 'not_recorded' : deviations.length ? 'deviates' : 'as_planned',
    deviations,
    missing,
  };
}

/**
 * Sets what was recorded against the plan, step by step. Oven readings are
 * checked against the step's range widened by the oven tolerance, and against
 * the alloy's solidus (at or above it the casting can melt at its grain
 * boundaries: a danger, not a caution); durations against the published
 * range; the quench against its medium, bath range and longest delay. Values
 * not recorded yet are listed as missing, never counted as deviations.
 */
export function compareToPlan(
  plan: { steps: readonly HeatTreatmentStep[] },
  actuals: readonly StepActual[],
  options: CompareOptions = {},
): PlanComparison {
  const steps = plan.steps.map((step, i) => compareStep(i, step, actuals.find((a) => a.stepIndex === i), options));
  const deviations = steps.flatMap((s) => s.deviations);
  const worst = deviations.some((d) => d.level === 'danger') ? 'danger' : deviations.length ? 'caution' : null;
  return { steps, deviations, worst };
}

const STEP_NAMES: Record<HeatTreatmentStep['kind'], string> = {
  solution: 'Solution treatment',
  quench: 'Quench',
  artificial_age: 'Artificial ageing',
  natural_age: 'Natural ageing',
};

/** The step's name as the sheet and the record print it. */
export function stepName(kind: HeatTreatmentStep['kind']): string {
  return STEP_NAMES[kind];
}

/** "6–12 h", "3 h", "45 min": durations as a heat-treatment sheet writes them. */
export function formatDurationRange(range: { min: number; max: number }): string {
  const inHours = range.min >= 60 && range.min % 30 === 0 && range.max % 30 === 0;
  const fmt = (m: number) => (inHours ? formatNumber(m / 60, m % 60 === 0 ? 0 : 1) : formatNumber(m, 0));
  const unit = inHours ? 'h' : 'min';
  return range.min === range.max ? `${fmt(range.min)}${UNIT_SPACE}${unit}` : `${fmt(range.min)}–${fmt(range.max)}${UNIT_SPACE}${unit}`;
}

/** A temperature range in one unit: "540 °C", "65–100 °C". */
export function formatTemperatureRange(range: { min: number; max: number }, unit: TemperatureUnit): string {
  if (range.min === range.max) return formatTemperature(range.min, unit);
  const lo = formatNumber(unit === 'C' ? range.min : cToF(range.min));
  return `${lo}–${formatTemperature(range.max, unit)}`;
}

/** The delay limit in seconds, as shops time it: "15 s". */
export function formatDelay(seconds: number): string {
  return `${formatNumber(seconds, seconds % 1 === 0 ? 0 : 1)}${UNIT_SPACE}s`;
}

/**
 * One deviation as a sentence, temperatures in the reader's unit:
 * "Read 552 °C, at or above the solidus (555 °C)…".
 */
export function describeDeviation(d: Deviation, unit: TemperatureUnit): string {
  const temp = (c: number) => formatTemperature(c, unit);
  const range = (r: { min?: number; max?: number }) => formatTemperatureRange({ min: r.min ?? 0, max: r.max ?? r.min ?? 0 }, unit);
  const minutes = (m: number) => formatDurationRange({ min: Math.round(m), max: Math.round(m) });
  const name = stepName(d.stepKind);
  const tolerance =
    d.toleranceC !== undefined ? ` (±${formatTemperatureDifference(d.toleranceC, unit)} allowed)` : '';
  switch (d.code) {
    case 'at_or_above_solidus':
      return `${name}: read ${temp(Number(d.actual))}, at or above the alloy’s solidus (${temp(d.expected.max ?? 0)}). The casting may have begun to melt at its grain boundaries (incipient melting); check it for blisters and distortion before use.`;
    case 'temperature_above_plan':
      return `${name}: read ${temp(Number(d.actual))}, above the plan’s ${range(d.expected)}${tolerance}.`;
    case 'temperature_below_plan':
      return `${name}: read ${temp(Number(d.actual))}, below the plan’s ${range(d.expected)}${tolerance}.`;
    case 'duration_short':
      return `${name}: ${minutes(Number(d.actual))}, shorter than the plan’s ${formatDurationRange({ min: d.expected.min ?? 0, max: d.expected.max ?? 0 })}.`;
    case 'duration_long':
      return `${name}: ${minutes(Number(d.actual))}, longer than the plan’s ${formatDurationRange({ min: d.expected.min ?? 0, max: d.expected.max ?? 0 })}.`;
    case 'quench_delay_over_max':
      return `${name}: ${formatDelay(Number(d.actual))} from oven to tank, over the plan’s ${formatDelay(d.expected.max ?? 0)} at most.`;
    case 'quench_medium_differs':
      return `${name}: quenched in ${String(d.actual)}, the plan says ${d.expected.medium}.`;
  }
}
