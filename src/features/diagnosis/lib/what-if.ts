import { DEFAULT_RULES, diagnose, findAlloy, findMeltVariable } from '#shared/domain/index.ts';
import type { Cause, HeatConditions, MeltVariableId, Rule } from '#shared/domain/index.ts';
import type { DiagnosisInput } from '#shared/reports/diagnosis-schemas.ts';

export type RankedMove = {
  variable: MeltVariableId;
  name: string;
  score: number;
  status: Cause['status'];
  rank: number;
  /** Places moved against the recorded ranking: positive is up. Null when it was not ranked before. */
  moved: number | null;
};

/**
 * Re-runs the trade core in the browser on the same input with some
 * conditions changed, and says how each cause moved. Both rankings are
 * computed here with the same rules, so the move is the change's alone
 * (the workshop's history, which only the server knows, is left out of both).
 */
export function whatIf(input: DiagnosisInput, changes: Partial<HeatConditions>, rules: readonly Rule[] = DEFAULT_RULES): { before: RankedMove[]; after: RankedMove[] } {
  const alloy = input.alloy ? findAlloy(input.alloy) : undefined;
  const run = (conditions: Partial<HeatConditions>) =>
    diagnose({ alloy, defects: input.defects, conditions }, { rules }).causes;
  const before = run(input.conditions);
  const merged: Partial<HeatConditions> = { ...input.conditions };
  for (const [key, value] of Object.entries(changes) as [keyof HeatConditions, unknown][]) {
    if (value === undefined) delete merged[key];
    else (merged as Record<string, unknown>)[key] = value;
  }
  const after = run(merged);
  const beforeRank = new Map(before.map((c, i) => [c.variable, i + 1]));
  const toMove = (list: Cause[], compare: Map<MeltVariableId, number> | null): RankedMove[] =>
    list.map((c, i) => ({
      variable: c.variable,
      name: findMeltVariable(c.variable)?.name ?? c.variable,
      score: c.score,
      status: c.status,
      rank: i + 1,
      moved: compare ? (compare.has(c.variable) ? (compare.get(c.variable) ?? 0) - (i + 1) : null) : 0,
    }));
  return { before: toMove(before, null), after: toMove(after, beforeRank) };
}
