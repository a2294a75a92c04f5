import { FIELD_SPECS, HEAT_CONDITION_FIELDS, HEAT_CONDITION_LABELS } from '../domain/index.ts';
import type { Condition, ConditionField, DefectKindId, HeatConditionField, MeltVariableId, Rule } from '../domain/index.ts';
import type { QuickCheckQuestion } from './diagnosis-schemas.ts';

// A quick check asks only what matters most for the defects on the photo.
// "What matters" comes from the rule set itself: every heat field a rule for
// those defects reads (in its test or in its scope), weighted by how strongly
// the rule implicates its variable. A derived value such as the dew point
// becomes one question for the fields it is computed from.

/** How many questions a quick check asks by default. */
export const QUICK_CHECK_QUESTION_COUNT = 5;

function conditionFields(condition: Condition, into: Set<ConditionField>): void {
  if ('all' in condition) condition.all.forEach((c) => conditionFields(c, into));
  else if ('any' in condition) condition.any.forEach((c) => conditionFields(c, into));
  else if ('not' in condition) conditionFields(condition.not, into);
  else into.add(condition.field);
}

const FIELD_ORDER: ReadonlyMap<HeatConditionField, number> = new Map(HEAT_CONDITION_FIELDS.map((f, i) => [f, i]));
const byFormOrder = (a: HeatConditionField, b: HeatConditionField) => (FIELD_ORDER.get(a) ?? 0) - (FIELD_ORDER.get(b) ?? 0);

function listWords(words: string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/**
 * The questions that matter most for `kinds` under `rules`, most telling
 * first (ties in form order). Values needing only the alloy ask nothing here:
 * the quick check picks the alloy itself.
 */
export function quickCheckQuestions(
  kinds: readonly DefectKindId[],
  rules: readonly Rule[],
  limit = QUICK_CHECK_QUESTION_COUNT,
): QuickCheckQuestion[] {
  const questions = new Map<string, { fields: HeatConditionField[]; weight: number; variables: MeltVariableId[] }>();
  for (const rule of rules) {
    if (!rule.defects.some((d) => kinds.includes(d))) continue;
    const read = new Set<ConditionField>();
    conditionFields(rule.when, read);
    if (rule.appliesWhen) conditionFields(rule.appliesWhen, read);
    // A rule counts once per question even if it reads the same fields twice.
    const keys = new Map<string, HeatConditionField[]>();
    for (const field of read) {
      const needs = [...FIELD_SPECS[field].needs].sort(byFormOrder);
      if (needs.length) keys.set(needs.join('+'), needs);
    }
    for (const [key, fields] of keys) {
      const q = questions.get(key) ?? { fields, weight: 0, variables: [] };
      q.weight += rule.weight;
      if (!q.variables.includes(rule.variable)) q.variables.push(rule.variable);
      questions.set(key, q);
    }
  }
  return [...questions.values()]
    .map((q) => ({ ...q, weight: Math.round(q.weight * 1000) / 1000 }))
    .sort((a, b) => b.weight - a.weight || byFormOrder(a.fields[0], b.fields[0]))
    .slice(0, limit)
    .map((q) => ({ ...q, label: listWords(q.fields.map((f) => HEAT_CONDITION_LABELS[f])) }));
}
