import { DEFAULT_RULES, MELT_VARIABLES, type DefectKindId, type MeltVariable, type Rule } from '#shared/domain/index.ts';

export type CauseGroup = { variable: MeltVariable; rules: Rule[] };

/**
 * The causes the rule set knows for a defect kind, grouped by the melt
 * variable each rule points at. Groups come strongest rule first (the rule
 * weights rank likely causes; they are heuristics, so the guide shows the
 * order, never the number), rules within a group likewise.
 */
export function causesOf(kind: DefectKindId, rules: readonly Rule[] = DEFAULT_RULES): CauseGroup[] {
  const byVariable = new Map<string, Rule[]>();
  for (const rule of rules) {
    if (!rule.defects.includes(kind)) continue;
    byVariable.set(rule.variable, [...(byVariable.get(rule.variable) ?? []), rule]);
  }
  return MELT_VARIABLES.filter((v) => byVariable.has(v.id))
    .map((variable) => ({ variable, rules: [...byVariable.get(variable.id)!].sort((a, b) => b.weight - a.weight) }))
    .sort((a, b) => b.rules[0].weight - a.rules[0].weight);
}
