import {
  FIELD_SPECS,
  formatNumber,
  formatTemperature,
  formatTemperatureDifference,
  type AlloyThreshold,
  type Comparison,
  type Condition,
  type NumberUnit,
  type TemperatureUnit,
} from '#shared/domain/index.ts';

// A rule's condition in plain words, for the defect guide: "pour temperature
// above the alloy's upper pouring limit", "degassing: no". Figures in
// the caster's temperature unit.

const THRESHOLD_WORDS: Record<AlloyThreshold['alloy'], string> = {
  liquidus: 'the alloy’s liquidus',
  solidus: 'the alloy’s solidus',
  pourMin: 'the alloy’s lower pouring limit',
  pourMax: 'the alloy’s upper pouring limit',
};

const OP_WORDS: Record<'gt' | 'gte' | 'lt' | 'lte' | 'eq' | 'neq', string> = {
  gt: 'above',
  gte: 'at or above',
  lt: 'below',
  lte: 'at or below',
  eq: 'equal to',
  neq: 'not equal to',
};

function numberWithUnit(value: number, unit: NumberUnit, pref: TemperatureUnit): string {
  switch (unit) {
    case 'C':
      return formatTemperature(value, pref);
    case 'deltaC':
      return formatTemperatureDifference(value, pref);
    case 'min':
      return `${formatNumber(value)} min`;
    case 'pct':
      return `${formatNumber(value)} %`;
    case 'cm':
      return `${formatNumber(value)} cm`;
    case 'mm':
      return `${formatNumber(value)} mm`;
    case 'count':
      return `${formatNumber(value)} heats`;
    case 'mPerS':
      return `${formatNumber(value, 1)} m/s`;
  }
}

function words(values: readonly string[], optionLabels?: Readonly<Record<string, string>>, joiner = 'or'): string {
  const labelled = values.map((v) => optionLabels?.[v] ?? v.replaceAll('_', ' '));
  if (labelled.length <= 1) return labelled.join('');
  return `${labelled.slice(0, -1).join(', ')} ${joiner} ${labelled.at(-1)}`;
}

function describeComparison(c: Comparison, pref: TemperatureUnit): string {
  const spec = FIELD_SPECS[c.field];
  const label = spec.label;
  switch (spec.kind) {
    case 'number': {
      const op = OP_WORDS[c.op as keyof typeof OP_WORDS] ?? c.op;
      if (typeof c.value === 'object' && !Array.isArray(c.value)) {
        const t = c.value as AlloyThreshold;
        const offset = t.offset ? ` ${t.offset > 0 ? '+' : '−'} ${formatTemperatureDifference(Math.abs(t.offset), pref)}` : '';
        return `${label} ${op} ${THRESHOLD_WORDS[t.alloy]}${offset}`;
      }
      return `${label} ${op} ${numberWithUnit(c.value as number, spec.unit, pref)}`;
    }
    case 'boolean': {
      const yes = (c.op === 'eq') === c.value;
      return `${label}: ${yes ? 'yes' : 'no'}`;
    }
    case 'enum': {
      const values = Array.isArray(c.value) ? c.value : [String(c.value)];
      const negated = c.op === 'neq' || c.op === 'notIn';
      return `${label}: ${negated ? 'not ' : ''}${words(values, spec.optionLabels)}`;
    }
    case 'set': {
      const values = Array.isArray(c.value) ? c.value : [String(c.value)];
      return `${label} include ${words(values)}`;
    }
  }
}

/** A condition in plain words; `all` reads "… and …", `any` "… or …". */
export function describeCondition(condition: Condition, pref: TemperatureUnit): string {
  if ('all' in condition) return condition.all.map((c) => describeNested(c, pref)).join(' and ');
  if ('any' in condition) return condition.any.map((c) => describeNested(c, pref)).join(' or ');
  if ('not' in condition) return `not (${describeCondition(condition.not, pref)})`;
  return describeComparison(condition, pref);
}

function describeNested(condition: Condition, pref: TemperatureUnit): string {
  const text = describeCondition(condition, pref);
  return 'all' in condition || 'any' in condition ? `(${text})` : text;
}
