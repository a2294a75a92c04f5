import { z } from 'zod';
import { alloySchema } from '../alloys.ts';
import type { Alloy } from '../alloys.ts';
import { cautionsFor } from '../cautions.ts';
import type { Caution, CautionOptions } from '../cautions.ts';
import { DEFECT_KINDS, defectKindIdSchema } from '../defect-kinds.ts';
import type { DefectKindId } from '../defect-kinds.ts';
import { DomainInputError } from '../errors.ts';
import { HEAT_CONDITION_FIELDS, HEAT_CONDITION_LABELS, heatConditionsInputSchema } from '../heat-conditions.ts';
import type { HeatConditionField, HeatConditions } from '../heat-conditions.ts';
import type { MeltVariableId } from '../melt-variables.ts';
import { DEFAULT_RULES } from './default-rules.ts';
import { buildContext, evaluateCondition } from './evaluate-condition.ts';
import type { EvaluationContext } from './evaluate-condition.ts';
import { compileTemplate, renderTemplate } from './evidence-template.ts';
import type { CompiledTemplate } from './evidence-template.ts';
import { ruleSetSchema } from './rule-schemas.ts';
import type { Rule } from './rule-schemas.ts';

export const SEVERITIES = [1, 2, 3] as const;
export type Severity = (typeof SEVERITIES)[number];

export type DiagnoseInput = {
  alloy?: Alloy;
  defects: { kind: DefectKindId; severity: Severity }[];
  conditions: Partial<HeatConditions>;
};

export const diagnoseInputSchema = z.object({
  alloy: alloySchema.optional(),
  defects: z.array(z.object({ kind: defectKindIdSchema, severity: z.union([z.literal(1), z.literal(2), z.literal(3)]) })),
  conditions: heatConditionsInputSchema,
});

/** A workshop's history for one defect kind and variable: how often reviewers confirmed it. */
export type CausePrior = {
  defectKind: DefectKindId;
  variable: MeltVariableId;
  confirmedCount: number;
  resolvedCount: number;
};

export type DiagnoseOptions = {
  /** A workshop's own rule set; validated once per array (keep it immutable). Defaults to DEFAULT_RULES. */
  rules?: readonly Rule[];
  priors?: readonly CausePrior[];
  /** Most the workshop history can move a score within its tier, 0..0.6 (default 0.3). */
  priorWeight?: number;
  /** Keep variables whose recorded values are normal (at the bottom, with evidence saying so). Default true. */
  includeNormal?: boolean;
  cautions?: CautionOptions;
};

/**
 * - `confirmed`: a recorded value is out of range;
 * - `suspected`: a usual suspect for the defect, but the data to check it is missing;
 * - `normal`: the recorded values are normal, so it is strongly discounted.
 */
export type CauseStatus = 'confirmed' | 'suspected' | 'normal';

export type Finding = {
  ruleId: string;
  defects: DefectKindId[];
  outcome: 'fired' | 'normal' | 'unknown';
  /** Rendered evidence; absent for an undecided rule. */
  text?: string;
};

export type Cause = {
  variable: MeltVariableId;
  score: number;
  status: CauseStatus;
  /** False when the cause rests only on the usual-suspect prior because the data is missing. */
  confirmed: boolean;
  evidence: string[];
  findings: Finding[];
  fixes: string[];
  sources: string[];
  /** Heat fields that would firm it up. */
  missing: HeatConditionField[];
  /** True when choosing the alloy (or giving it the missing data) would firm it up. */
  missingAlloy: boolean;
  prior?: { confirmedCount: number; resolvedCount: number; explanation: string };
};

export type Diagnosis = { causes: Cause[]; cautions: Caution[] };

// Severity scales a rule's weight: a severe defect is stronger evidence.
const SEVERITY_FACTOR: Record<Severity, number> = { 1: 0.6, 2: 0.8, 3: 1 };
// Score bands keep the ordering promise: any out-of-range variable outranks
// every usual suspect, and every suspect outranks a variable recorded normal.
const BANDS: Record<CauseStatus, { base: number; span: number }> = {
  confirmed: { base: 0.5, span: 0.5 },
  suspected: { base: 0.1, span: 0.39 },
  normal: { base: 0, span: 0.09 },
};
// Undecided rules add a little to a confirmed variable, not their full weight.
const UNDECIDED_SHARE_WHEN_CONFIRMED = 0.25;
const DEFAULT_PRIOR_WEIGHT = 0.3;
const MAX_PRIOR_WEIGHT = 0.6;
// History counts in full only once it spans several reports.
const PRIOR_HALF_WEIGHT_REPORTS = 4;

type CompiledRule = {
  rule: Rule;
  order: number;
  evidence: CompiledTemplate;
  normalEvidence?: CompiledTemplate;
};
type CompiledRuleSet = ReadonlyMap<DefectKindId, readonly CompiledRule[]>;

const compiledSets = new WeakMap<readonly Rule[], CompiledRuleSet>();

// Validates and indexes a rule set the first time it is seen; later calls with
// the same array reuse it, so ~250 rules cost nothing per diagnosis.
function compileRules(rules: readonly Rule[]): CompiledRuleSet {
  const cached = compiledSets.get(rules);
  if (cached) return cached;
  const parsed = ruleSetSchema.safeParse(rules);
  if (!parsed.success) {
    throw new DomainInputError('rules', 'invalid-rule-set', `rule set is invalid: ${parsed.error.message}`, {
      cause: parsed.error,
    });
  }
  const byDefect = new Map<DefectKindId, CompiledRule[]>();
  parsed.data.forEach((rule, order) => {
    const compiled: CompiledRule = {
      rule,
      order,
      evidence: compileTemplate(rule.evidence),
      normalEvidence: rule.normalEvidence ? compileTemplate(rule.normalEvidence) : undefined,
    };
    for (const defect of new Set(rule.defects)) {
      const list = byDefect.get(defect) ?? [];
      list.push(compiled);
      byDefect.set(defect, list);
    }
  });
  compiledSets.set(rules, byDefect);
  return byDefect;
}

// "Gas porosity (hydrogen)" reads as "gas porosity" inside a sentence.
const DEFECT_NAMES: ReadonlyMap<string, string> = new Map(
  DEFECT_KINDS.map((k) => [k.id, k.name.replace(/\s*\(.*\)$/, '').toLowerCase()]),
);
const FIELD_ORDER: ReadonlyMap<string, number> = new Map(HEAT_CONDITION_FIELDS.map((f, i) => [f, i]));

type RuleOutcome = {
  compiled: CompiledRule;
  defects: DefectKindId[];
  contribution: number;
  outcome: 'fired' | 'normal' | 'unknown';
  text: string | undefined;
  missing: readonly HeatConditionField[];
  missingAlloy: boolean;
};

const NO_FIELDS: readonly HeatConditionField[] = Object.freeze([]);

function evaluateRule(compiled: CompiledRule, defects: DefectKindId[], severity: Severity, ctx: EvaluationContext): RuleOutcome | undefined {
  const { rule } = compiled;
  const scope = rule.appliesWhen ? evaluateCondition(rule.appliesWhen, ctx) : undefined;
  if (scope?.outcome === false) return undefined;
  // A scope undecided only for want of the alloy (an aluminium-only rule, no
  // alloy chosen) still applies: most heats are aluminium. A scope undecided
  // for want of a recorded field (is the mould metal?) leaves a suspect.
  const scopeOpen = scope !== undefined && scope.outcome === undefined && scope.missing.length > 0;
  const result = evaluateCondition(rule.when, ctx);
  const contribution = rule.weight * SEVERITY_FACTOR[severity];
  // One object shape for every outcome keeps property access monomorphic.
  if (result.outcome === undefined || scopeOpen) {
    const missing = scopeOpen ? scope.missing.concat(result.outcome === undefined ? result.missing : NO_FIELDS) : result.missing;
    const missingAlloy = result.outcome === undefined && result.missingAlloy;
    return { compiled, defects, contribution, outcome: 'unknown', text: undefined, missing, missingAlloy };
  }
  const template = result.outcome ? compiled.evidence : compiled.normalEvidence;
  const text = template ? renderTemplate(template, ctx, result.deciding) : undefined;
  return { compiled, defects, contribution, outcome: result.outcome ? 'fired' : 'normal', text, missing: NO_FIELDS, missingAlloy: false };
}

function validatePriors(priors: readonly CausePrior[]): void {
  priors.forEach((p, i) => {
    const ok =
      Number.isInteger(p.confirmedCount) &&
      Number.isInteger(p.resolvedCount) &&
      p.confirmedCount >= 0 &&
      p.confirmedCount <= p.resolvedCount;
    if (!ok) {
      throw new DomainInputError(
        `priors[${i}]`,
        'invalid-prior',
        'confirmedCount and resolvedCount must be whole numbers with 0 ≤ confirmed ≤ resolved',
      );
    }
  });
}

function listNames(names: string[]): string {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

function priorFor(
  variable: MeltVariableId,
  defects: ReadonlyMap<DefectKindId, Severity>,
  priors: readonly CausePrior[],
): Cause['prior'] {
  const matching = priors.filter((p) => p.variable === variable && defects.has(p.defectKind) && p.resolvedCount > 0);
  if (matching.length === 0) return undefined;
  const confirmedCount = matching.reduce((s, p) => s + p.confirmedCount, 0);
  const resolvedCount = matching.reduce((s, p) => s + p.resolvedCount, 0);
  const parts = matching.map(
    (p, i) => `${p.confirmedCount} of ${p.resolvedCount}${i === 0 ? ' resolved reports' : ''} with ${DEFECT_NAMES.get(p.defectKind)}`,
  );
  return { confirmedCount, resolvedCount, explanation: `confirmed in ${listNames(parts)} in this workshop` };
}

// Adds each item once, keeping first-seen order.
function addUnique<T>(into: T[], items: Iterable<T>): void {
  for (const item of items) if (!into.includes(item)) into.push(item);
}

// Which outcomes a cause shows, by status: the firing rules when confirmed,
// the normal readings when discounted, the undecided rules when suspected.
const SHOWN_OUTCOME: Record<CauseStatus, RuleOutcome['outcome']> = { confirmed: 'fired', normal: 'normal', suspected: 'unknown' };

function buildCause(
  variable: MeltVariableId,
  outcomes: RuleOutcome[],
  prior: Cause['prior'],
  priorWeight: number,
): Cause {
  let firedOdds = 1;
  let unknownOdds = 1;
  let normalOdds = 1;
  let anyFired = false;
  let anyNormal = false;
  for (const o of outcomes) {
    if (o.outcome === 'fired') {
      anyFired = true;
      firedOdds *= 1 - o.contribution;
    } else if (o.outcome === 'normal') {
      anyNormal = true;
      normalOdds *= 1 - o.contribution;
    } else {
      unknownOdds *= 1 - o.contribution;
      firedOdds *= 1 - o.contribution * UNDECIDED_SHARE_WHEN_CONFIRMED;
    }
  }
  const status: CauseStatus = anyFired ? 'confirmed' : anyNormal ? 'normal' : 'suspected';
  // Noisy-OR: each rule is an independent chance that the variable is to blame.
  const inner = status === 'confirmed' ? 1 - firedOdds : status === 'suspected' ? 1 - unknownOdds : 1 - normalOdds * unknownOdds;

  let blended = inner;
  if (prior) {
    // Laplace-smoothed share of resolved reports that confirmed this cause,
    // weighted by how much history there is.
    const share = (prior.confirmedCount + 1) / (prior.resolvedCount + 2);
    const alpha = (priorWeight * prior.resolvedCount) / (prior.resolvedCount + PRIOR_HALF_WEIGHT_REPORTS);
    blended = (1 - alpha) * inner + alpha * share;
  }
  const band = BANDS[status];
  const score = Math.round((band.base + band.span * Math.min(1, Math.max(0, blended))) * 1e6) / 1e6;

  outcomes.sort((a, b) => a.compiled.order - b.compiled.order);
  const wanted = SHOWN_OUTCOME[status];
  const shown = outcomes
    .filter((o) => o.outcome === wanted)
    .sort((a, b) => b.contribution - a.contribution || a.compiled.order - b.compiled.order);

  const missing: HeatConditionField[] = [];
  let missingAlloy = false;
  const findings: Finding[] = [];
  for (const o of outcomes) {
    const finding: Finding = { ruleId: o.compiled.rule.id, defects: o.defects, outcome: o.outcome };
    if (o.text !== undefined) finding.text = o.text;
    findings.push(finding);
    if (o.outcome === 'unknown') {
      addUnique(missing, o.missing);
      missingAlloy ||= o.missingAlloy;
    }
  }
  missing.sort((a, b) => (FIELD_ORDER.get(a) ?? 0) - (FIELD_ORDER.get(b) ?? 0));

  const evidence: string[] = [];
  const fixes: string[] = [];
  const sources: string[] = [];
  for (const o of shown) {
    if (o.text !== undefined) addUnique(evidence, [o.text]);
    if (status !== 'normal') addUnique(fixes, o.compiled.rule.fixes);
    addUnique(sources, [o.compiled.rule.source]);
  }
  // A variable known only from the workshop's history has no rule sentence; its prior explains it.
  if (status === 'suspected' && shown.length > 0) {
    const defectIds: DefectKindId[] = [];
    for (const o of shown) addUnique(defectIds, o.defects);
    const steps: string[] = [];
    if (missing.length) steps.push(`record ${listNames(missing.map((f) => HEAT_CONDITION_LABELS[f]))}`);
    if (missingAlloy) steps.push('choose the alloy');
    const todo = steps.length ? `${steps.join(' and ')} to confirm or rule it out` : 'the recorded data does not bear on it';
    evidence.push(`Usual suspect for ${listNames(defectIds.map((d) => DEFECT_NAMES.get(d) ?? d))}, not checked: ${todo}.`);
  } else if (status === 'normal' && evidence.length === 0) {
    evidence.push('The recorded values for this are within normal limits.');
  }
  if (prior) evidence.push(`${prior.explanation[0].toUpperCase()}${prior.explanation.slice(1)}.`);

  const cause: Cause = {
    variable,
    score,
    status,
    confirmed: status === 'confirmed',
    evidence,
    findings,
    fixes,
    sources,
    missing,
    missingAlloy,
  };
  if (prior) cause.prior = prior;
  return cause;
}

/**
 * Ranks the melt and mould variables that most likely caused the tagged
 * defects, using the recorded values against the alloy's data, and lists the
 * cautions for the heat. Causes are sorted by score (desc), ties by variable id.
 */
export function diagnose(input: DiagnoseInput, options: DiagnoseOptions = {}): Diagnosis {
  const ruleSet = compileRules(options.rules ?? DEFAULT_RULES);
  const priors = options.priors ?? [];
  validatePriors(priors);
  const priorWeightInput = options.priorWeight ?? DEFAULT_PRIOR_WEIGHT;
  if (!Number.isFinite(priorWeightInput)) {
    throw new DomainInputError('priorWeight', 'not-a-number', 'priorWeight must be a finite number');
  }
  const priorWeight = Math.min(MAX_PRIOR_WEIGHT, Math.max(0, priorWeightInput));
  const conditions = input.conditions ?? {};
  const cautions = cautionsFor({ alloy: input.alloy, conditions }, options.cautions);

  // One severity per defect kind: the worst tagged.
  const defects = new Map<DefectKindId, Severity>();
  for (const d of input.defects) {
    if (!ruleSet.has(d.kind) && !priors.some((p) => p.defectKind === d.kind)) continue;
    const severity = SEVERITY_FACTOR[d.severity] ? d.severity : 1;
    defects.set(d.kind, Math.max(defects.get(d.kind) ?? 1, severity) as Severity);
  }
  if (defects.size === 0) return { causes: [], cautions };

  // A rule tagged for several of the defects is evaluated once, at the worst severity.
  const candidates = new Map<CompiledRule, { defects: DefectKindId[]; severity: Severity }>();
  for (const [kind, severity] of defects) {
    for (const compiled of ruleSet.get(kind) ?? []) {
      const entry = candidates.get(compiled);
      if (entry) {
        entry.defects.push(kind);
        entry.severity = Math.max(entry.severity, severity) as Severity;
      } else {
        candidates.set(compiled, { defects: [kind], severity });
      }
    }
  }

  const ctx = buildContext(conditions, input.alloy);
  const byVariable = new Map<MeltVariableId, RuleOutcome[]>();
  for (const [compiled, { defects: matched, severity }] of candidates) {
    const outcome = evaluateRule(compiled, matched, severity, ctx);
    if (!outcome) continue;
    const list = byVariable.get(compiled.rule.variable) ?? [];
    list.push(outcome);
    byVariable.set(compiled.rule.variable, list);
  }
  // A workshop's confirmed causes count even where no rule links them.
  for (const p of priors) {
    if (defects.has(p.defectKind) && p.resolvedCount > 0 && !byVariable.has(p.variable)) byVariable.set(p.variable, []);
  }

  const causes: Cause[] = [];
  for (const [variable, outcomes] of byVariable) {
    const cause = buildCause(variable, outcomes, priorFor(variable, defects, priors), priorWeight);
    if (cause.status === 'normal' && options.includeNormal === false) continue;
    causes.push(cause);
  }
  causes.sort((a, b) => b.score - a.score || (a.variable < b.variable ? -1 : a.variable > b.variable ? 1 : 0));
  return { causes, cautions };
}
