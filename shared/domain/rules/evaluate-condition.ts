import { pourRangeFor } from '../alloys.ts';
import type { Alloy, MouldKind } from '../alloys.ts';
import { HEAT_CONDITION_FIELDS, isMetalMold, mouldKindOf } from '../heat-conditions.ts';
import type { HeatConditionField, HeatConditions, MoldMaterial } from '../heat-conditions.ts';
import { dewPointC } from '../humidity.ts';
import { streamVelocity } from '../gating.ts';
import type { Range } from '../range.ts';
import { FIELD_SPECS } from './condition-fields.ts';
import type { ConditionField } from './condition-fields.ts';
import type { AlloyThreshold, Comparison, Condition } from './rule-schemas.ts';

// Three-valued evaluation: a condition is true, false, or undecided (a value
// is missing). Missing data never counts as normal: it makes the rule a
// "usual suspect" and the outcome lists what to record.

export type FieldValue = number | boolean | string | readonly string[];

/** Everything one diagnosis evaluates against, computed once per call. */
export type EvaluationContext = {
  values: Partial<Record<ConditionField, FieldValue>>;
  alloy?: Alloy;
  pour?: { range: Range; mouldKind: MouldKind | 'any' };
};

/** The numeric comparison that decided an outcome, for {threshold} and {excess}. */
export type DecidingComparison = { field: ConditionField; value: number; threshold: number };

export type Evaluation = {
  /** undefined: not decidable with the data given. */
  outcome: boolean | undefined;
  missing: readonly HeatConditionField[];
  missingAlloy: boolean;
  deciding?: DecidingComparison;
};

const ENUM_OPTIONS: Partial<Record<HeatConditionField, readonly string[]>> = {};
for (const field of HEAT_CONDITION_FIELDS) {
  const spec = FIELD_SPECS[field];
  if (spec.kind === 'enum') ENUM_OPTIONS[field] = spec.options;
}

// Keeps only well-formed recorded values: a NaN, a wrong type or an unknown
// option counts as not recorded rather than poisoning the ranking.
function cleanConditions(conditions: Partial<HeatConditions>): Partial<Record<HeatConditionField, FieldValue>> {
  const clean: Partial<Record<HeatConditionField, FieldValue>> = {};
  for (const field of HEAT_CONDITION_FIELDS) {
    const value: unknown = conditions[field];
    if (value === undefined || value === null) continue;
    const spec = FIELD_SPECS[field];
    if (spec.kind === 'number' && typeof value === 'number' && Number.isFinite(value)) clean[field] = value;
    else if (spec.kind === 'boolean' && typeof value === 'boolean') clean[field] = value;
    else if (spec.kind === 'enum' && typeof value === 'string' && ENUM_OPTIONS[field]?.includes(value)) clean[field] = value;
  }
  return clean;
}

/** Builds the context once: cleaned conditions plus derived values. */
export function buildContext(conditions: Partial<HeatConditions>, alloy?: Alloy): EvaluationContext {
  const values: Partial<Record<ConditionField, FieldValue>> = cleanConditions(conditions);
  const num = (field: HeatConditionField) => (typeof values[field] === 'number' ? (values[field] as number) : undefined);
  const pourTempC = num('pourTempC');
  const peakTempC = num('peakTempC');
  const ambientTempC = num('ambientTempC');
  const rh = num('relativeHumidityPct');
  const pourHeightCm = num('pourHeightCm');
  const material = values.moldMaterial as MoldMaterial | undefined;

  if (material) values.moldIsMetal = isMetalMold(material);
  if (ambientTempC !== undefined && rh !== undefined && rh > 0 && rh <= 100 && ambientTempC > -100) {
    const td = dewPointC({ tempC: ambientTempC, relativeHumidityPct: rh });
    if (Number.isFinite(td)) values.dewPointC = td;
  }
  if (pourHeightCm !== undefined && pourHeightCm >= 0) values.streamVelocityMs = streamVelocity(pourHeightCm);
  if (alloy) {
    values.alloyFamily = alloy.family;
    values.alloyTraits = alloy.traits;
    values.freezingRangeC = alloy.liquidusC - alloy.solidusC;
    if (pourTempC !== undefined) values.superheatC = pourTempC - alloy.liquidusC;
    if (peakTempC !== undefined) values.peakSuperheatC = peakTempC - alloy.liquidusC;
  }
  const pour = alloy ? pourRangeFor(alloy, material ? mouldKindOf(material) : undefined) : undefined;
  return { values, alloy, pour };
}

const UNDECIDED_NO_DATA: Evaluation = Object.freeze({ outcome: undefined, missing: Object.freeze([]), missingAlloy: true });

function resolveThreshold(value: AlloyThreshold, ctx: EvaluationContext): number | undefined {
  const { alloy, pour } = ctx;
  if (!alloy) return undefined;
  const base =
    value.alloy === 'liquidus'
      ? alloy.liquidusC
      : value.alloy === 'solidus'
        ? alloy.solidusC
        : value.alloy === 'pourMin'
          ? pour?.range.min
          : pour?.range.max;
  return base === undefined ? undefined : base + (value.offset ?? 0);
}

function compareNumbers(op: Comparison['op'], a: number, b: number): boolean {
  switch (op) {
    case 'gt':
      return a > b;
    case 'gte':
      return a >= b;
    case 'lt':
      return a < b;
    case 'lte':
      return a <= b;
    case 'eq':
      return a === b;
    default:
      return a !== b;
  }
}

function evaluateComparison(c: Comparison, ctx: EvaluationContext): Evaluation {
  const spec = FIELD_SPECS[c.field];
  const actual = ctx.values[c.field];
  if (actual === undefined) {
    return { outcome: undefined, missing: [...spec.needs], missingAlloy: spec.needsAlloy && !ctx.alloy };
  }
  const expected = c.value;
  if (typeof actual === 'number') {
    const threshold = typeof expected === 'number' ? expected : resolveThreshold(expected as AlloyThreshold, ctx);
    if (threshold === undefined) return UNDECIDED_NO_DATA;
    return {
      outcome: compareNumbers(c.op, actual, threshold),
      missing: [],
      missingAlloy: false,
      deciding: { field: c.field, value: actual, threshold },
    };
  }
  let outcome: boolean;
  if (Array.isArray(actual)) {
    const wanted = Array.isArray(expected) ? expected : [expected];
    outcome = wanted.some((w) => actual.includes(w as string));
  } else if (c.op === 'in' || c.op === 'notIn') {
    const listed = (expected as string[]).includes(actual as string);
    outcome = c.op === 'in' ? listed : !listed;
  } else {
    outcome = c.op === 'eq' ? actual === expected : actual !== expected;
  }
  return { outcome, missing: [], missingAlloy: false };
}

function combine(children: Condition[], ctx: EvaluationContext, mode: 'all' | 'any'): Evaluation {
  // For `all`, a false child decides; for `any`, a true one does.
  const decisive = mode === 'any';
  const missing: HeatConditionField[] = [];
  let missingAlloy = false;
  let undecided = false;
  let firstDeciding: DecidingComparison | undefined;
  for (const child of children) {
    const result = evaluateCondition(child, ctx);
    if (result.outcome === decisive) return { outcome: decisive, missing: [], missingAlloy: false, deciding: result.deciding };
    if (result.outcome === undefined) {
      undecided = true;
      missingAlloy ||= result.missingAlloy;
      for (const f of result.missing) if (!missing.includes(f)) missing.push(f);
    } else {
      firstDeciding ??= result.deciding;
    }
  }
  if (undecided) return { outcome: undefined, missing, missingAlloy };
  return { outcome: !decisive, missing: [], missingAlloy: false, deciding: firstDeciding };
}

/** Evaluates a condition to true, false or undecided, with what decided it or what is missing. */
export function evaluateCondition(condition: Condition, ctx: EvaluationContext): Evaluation {
  if ('all' in condition) return combine(condition.all, ctx, 'all');
  if ('any' in condition) return combine(condition.any, ctx, 'any');
  if ('not' in condition) {
    const inner = evaluateCondition(condition.not, ctx);
    return inner.outcome === undefined ? inner : { ...inner, outcome: !inner.outcome };
  }
  return evaluateComparison(condition, ctx);
}
