import { formatNumber, formatTemperature, formatTemperatureDifference } from '../units.ts';
import { FIELD_SPECS } from './condition-fields.ts';
import type { ConditionField, NumberUnit } from './condition-fields.ts';
import type { DecidingComparison, EvaluationContext, FieldValue } from './evaluate-condition.ts';

// Evidence is written in °C: the client converts for display. Templates are
// split into parts once, when a rule set is compiled, not on every call.

export type CompiledTemplate = readonly (string | { name: string })[];

const PLACEHOLDER = /\{([A-Za-z]+)\}/g;

/** Splits a template into literal text and placeholder names. */
export function compileTemplate(text: string): CompiledTemplate {
  const parts: (string | { name: string })[] = [];
  let last = 0;
  for (const match of text.matchAll(PLACEHOLDER)) {
    const at = match.index ?? 0;
    if (at > last) parts.push(text.slice(last, at));
    parts.push({ name: match[1] });
    last = at + match[0].length;
  }
  if (last < text.length) parts.push(text.slice(last));
  return parts;
}

const compact = (value: number) => formatNumber(value, Number.isInteger(Number(value.toFixed(1))) ? 0 : 1);

function formatNumberWithUnit(value: number, unit: NumberUnit): string {
  switch (unit) {
    case 'C':
      return formatTemperature(value, 'C');
    case 'deltaC':
      return formatTemperatureDifference(value, 'C');
    case 'min':
      return `${compact(value)} min`;
    case 'pct':
      return `${formatNumber(value, 0)} %`;
    case 'cm':
      return `${compact(value)} cm`;
    case 'mm':
      return `${compact(value)} mm`;
    case 'count':
      return formatNumber(value, 0);
    case 'mPerS':
      return `${formatNumber(value, 2)} m/s`;
  }
}

/** A field's value as evidence text, with its unit or option label. */
export function formatFieldValue(field: ConditionField, value: FieldValue): string {
  const spec = FIELD_SPECS[field];
  if (spec.kind === 'number' && typeof value === 'number') return formatNumberWithUnit(value, spec.unit);
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (Array.isArray(value)) return value.length ? value.join(', ').replaceAll('_', ' ') : 'none';
  if (spec.kind === 'enum') return spec.optionLabels?.[value as string] ?? String(value).replaceAll('_', ' ');
  return String(value);
}

const MOULD_KIND_WORDS = { sand: 'sand moulds', permanentMould: 'permanent moulds', any: 'any mould' } as const;

function placeholderText(
  name: string,
  ctx: EvaluationContext,
  deciding: DecidingComparison | undefined,
): string {
  switch (name) {
    case 'alloy':
      return ctx.alloy?.designation ?? 'the alloy';
    case 'mouldKind':
      return ctx.pour ? MOULD_KIND_WORDS[ctx.pour.mouldKind] : 'this mould';
    case 'range': {
      if (!ctx.pour) return 'its pouring range';
      return `${formatNumber(ctx.pour.range.min)}–${formatTemperature(ctx.pour.range.max, 'C')}`;
    }
    case 'threshold':
    case 'excess': {
      if (!deciding) return 'the limit';
      const spec = FIELD_SPECS[deciding.field];
      const unit = spec.kind === 'number' ? spec.unit : 'count';
      if (name === 'threshold') return formatNumberWithUnit(deciding.threshold, unit);
      const excess = Math.abs(deciding.value - deciding.threshold);
      return formatNumberWithUnit(excess, unit === 'C' ? 'deltaC' : unit);
    }
    default: {
      const field = name as ConditionField;
      const value = ctx.values[field];
      return value === undefined ? 'not recorded' : formatFieldValue(field, value);
    }
  }
}

/** Fills a compiled template with the values of this diagnosis. */
export function renderTemplate(
  template: CompiledTemplate,
  ctx: EvaluationContext,
  deciding?: DecidingComparison,
): string {
  let text = '';
  for (const part of template) text += typeof part === 'string' ? part : placeholderText(part.name, ctx, deciding);
  return text;
}
