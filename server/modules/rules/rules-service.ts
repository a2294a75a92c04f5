import { createHash } from 'node:crypto';
import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { DEFAULT_RULES, diagnose, findAlloy, ruleSchema, ruleSetSchema } from '../../../shared/domain/index.ts';
import type { Cause, DefectKindId, MeltVariableId, Rule } from '../../../shared/domain/index.ts';
import type { RuleSetStamp } from '../../../shared/reports/diagnosis-schemas.ts';
import { RULE_PREVIEW_REPORTS, RULE_PREVIEW_TOP, buildRuleSet } from '../../../shared/reports/workshop-rule-schemas.ts';
import type {
  RuleOverrideInput,
  RulePreview,
  RulePreviewItem,
  RulePreviewRequest,
  StoredWorkshopRule,
  WorkshopRule,
  WorkshopRules,
} from '../../../shared/reports/workshop-rule-schemas.ts';
import { AppError, forbidden } from '../../lib/app-error.ts';
import { logger } from '../../lib/logger.ts';
import * as repo from './rules-repository.ts';

// The effective rule set of a workshop is built once and reused while its
// stored overrides stay the same. Reusing the very same frozen array matters:
// the trade core validates and indexes a rule set once per array identity.
// Each read checks the workshop's few stored rows (cheap), so a change made
// through another app server is picked up on the next diagnosis too.

export type EffectiveRuleSet = {
  rules: readonly Rule[];
  listing: readonly WorkshopRule[];
  stamp: RuleSetStamp;
};

const DEFAULT_IDS: ReadonlySet<string> = new Set(DEFAULT_RULES.map((r) => r.id));
const CACHE_LIMIT = 500;
const cache = new Map<string, { key: string; set: EffectiveRuleSet }>();

const hashOf = (rules: readonly Rule[]) => createHash('sha256').update(JSON.stringify(rules)).digest('hex').slice(0, 16);
let defaultSet: EffectiveRuleSet | undefined;

function build(stored: readonly StoredWorkshopRule[]): EffectiveRuleSet {
  // A stored rule that no longer passes the core's schema (the format moved
  // on) is left out rather than breaking every diagnosis of the workshop.
  const usable = stored.filter((s) => {
    if (s.origin !== 'workshop' || !s.rule) return true;
    const ok = ruleSchema.safeParse(s.rule).success;
    if (!ok) logger.warn({ ruleId: s.ruleId }, 'stored workshop rule no longer valid; left out');
    return ok;
  });
  const { rules, listing } = buildRuleSet(DEFAULT_RULES, usable);
  // A stored override that only restates the shipped values changes nothing.
  const custom = listing.some((r) => r.overridden || r.origin === 'workshop');
  return { rules, listing, stamp: { hash: hashOf(rules), custom } };
}

/** The rule set diagnoses in this workshop run with. */
export async function effectiveRuleSet(workshopId: string): Promise<EffectiveRuleSet> {
  const stored = await repo.listStored(workshopId);
  if (stored.length === 0) {
    defaultSet ??= build([]);
    return defaultSet;
  }
  const key = stored.map((s) => `${s.ruleId}@${s.updatedAt}:${s.enabled}:${s.weight}`).join(',');
  const hit = cache.get(workshopId);
  if (hit && hit.key === key) return hit.set;
  const set = build(stored);
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value!);
  cache.set(workshopId, { key, set });
  return set;
}

function invalidate(workshopId: string) {
  cache.delete(workshopId);
}

const ruleNotFound = () => new AppError('rule-not-found', 'No such rule in this workshop', 404);

export async function listRules(actor: Actor, workshopId: string): Promise<WorkshopRules> {
  if (!can(actor, 'read', 'rule')) throw forbidden();
  const set = await effectiveRuleSet(workshopId);
  return { rules: [...set.listing], ruleSet: set.stamp };
}

async function ruleEntry(workshopId: string, ruleId: string): Promise<WorkshopRule> {
  const set = await effectiveRuleSet(workshopId);
  const entry = set.listing.find((r) => r.rule.id === ruleId);
  if (!entry) throw ruleNotFound();
  return entry;
}

/** Switches a rule on or off or changes its weight; a shipped rule keeps its text, only the override is stored. */
export async function updateRule(actor: Actor, workshopId: string, ruleId: string, input: RuleOverrideInput): Promise<WorkshopRule> {
  if (!can(actor, 'update', 'rule')) throw forbidden('Only mentors and admins tune the rules');
  if (DEFAULT_IDS.has(ruleId)) {
    const current = await repo.findStored(workshopId, ruleId);
    await repo.upsertOverride(
      workshopId,
      ruleId,
      {
        enabled: input.enabled ?? current?.enabled ?? null,
        weight: input.weight !== undefined ? input.weight : (current?.weight ?? null),
      },
      actor.id,
    );
  } else {
    if (!(await repo.findStored(workshopId, ruleId))) throw ruleNotFound();
    await repo.updateAdded(workshopId, ruleId, input);
  }
  invalidate(workshopId);
  return ruleEntry(workshopId, ruleId);
}

export async function createRule(actor: Actor, workshopId: string, rule: Rule): Promise<WorkshopRule> {
  if (!can(actor, 'create', 'rule')) throw forbidden('Only mentors and admins add rules');
  const set = await effectiveRuleSet(workshopId);
  const taken = () => new AppError('rule-id-taken', `A rule with the id ${rule.id} already exists; pick another id`, 409);
  if (set.listing.some((r) => r.rule.id === rule.id) || DEFAULT_IDS.has(rule.id)) throw taken();
  // The whole set must still be valid with the new rule in it.
  const check = ruleSetSchema.safeParse([...set.rules, rule]);
  if (!check.success) throw new AppError('rule-set-invalid', check.error.issues[0]?.message ?? 'The rule set would be invalid', 400);
  if (!(await repo.insertRule(workshopId, rule, actor.id))) throw taken();
  invalidate(workshopId);
  return ruleEntry(workshopId, rule.id);
}

export async function deleteRule(actor: Actor, workshopId: string, ruleId: string): Promise<void> {
  if (!can(actor, 'delete', 'rule')) throw forbidden('Only mentors and admins remove rules');
  if (DEFAULT_IDS.has(ruleId)) {
    throw new AppError('default-rule', 'Shipped rules cannot be deleted; switch it off instead', 409);
  }
  if (!(await repo.findStored(workshopId, ruleId))) throw ruleNotFound();
  await repo.deleteAdded(workshopId, ruleId);
  invalidate(workshopId);
}

// ── preview ─────────────────────────────────────────────────────────────────

function candidateRules(current: EffectiveRuleSet, request: RulePreviewRequest): Rule[] {
  if ('rule' in request) {
    const replaced = current.rules.some((r) => r.id === request.rule.id);
    return replaced ? current.rules.map((r) => (r.id === request.rule.id ? request.rule : r)) : [...current.rules, request.rule];
  }
  const { ruleId, enabled, weight } = request.override;
  const entry = current.listing.find((r) => r.rule.id === ruleId);
  if (!entry) throw ruleNotFound();
  const base = DEFAULT_RULES.find((r) => r.id === ruleId);
  const newWeight = weight === null ? (base?.weight ?? entry.rule.weight) : (weight ?? entry.rule.weight);
  const changed: Rule = { ...entry.rule, weight: newWeight };
  const on = enabled ?? entry.enabled;
  // Rebuild in listing order so a rule switched back on sits where it always does.
  return current.listing.flatMap((r) => (r.rule.id === ruleId ? (on ? [changed] : []) : r.enabled ? [r.rule] : []));
}

const top = (causes: Cause[]) => causes.slice(0, RULE_PREVIEW_TOP).map((c) => ({ variable: c.variable, score: c.score, status: c.status }));

function bestRank(causes: Cause[], confirmed: readonly string[]): number | null {
  const index = causes.findIndex((c) => confirmed.includes(c.variable));
  return index === -1 ? null : index + 1;
}

/**
 * How the workshop's last resolved reports would rank with a candidate rule
 * or override, beside how they rank now. Both rankings use the rules alone,
 * without the workshop's history, so the difference is the rule's doing.
 */
export async function previewRule(actor: Actor, workshopId: string, request: RulePreviewRequest): Promise<RulePreview> {
  if (!can(actor, 'update', 'rule')) throw forbidden('Only mentors and admins tune the rules');
  const current = await effectiveRuleSet(workshopId);
  const after = Object.freeze(candidateRules(current, request));
  const check = ruleSetSchema.safeParse(after);
  if (!check.success) throw new AppError('rule-set-invalid', check.error.issues[0]?.message ?? 'The rule set would be invalid', 400);
  const cases = await repo.recentResolved(workshopId, RULE_PREVIEW_REPORTS);
  const reports: RulePreviewItem[] = cases.map((c) => {
    const input = {
      alloy: c.input.alloy ? findAlloy(c.input.alloy) : undefined,
      defects: c.input.defects as { kind: DefectKindId; severity: 1 | 2 | 3 }[],
      conditions: c.input.conditions,
    };
    const before = diagnose(input, { rules: current.rules }).causes;
    const next = diagnose(input, { rules: after }).causes;
    return {
      reportId: c.reportId,
      title: c.title,
      resolvedAt: c.resolvedAt,
      confirmedCauses: c.confirmed as MeltVariableId[],
      before: top(before),
      after: top(next),
      bestConfirmedRankBefore: bestRank(before, c.confirmed),
      bestConfirmedRankAfter: bestRank(next, c.confirmed),
    };
  });
  const rankOf = (n: number | null) => n ?? Number.POSITIVE_INFINITY;
  const summary = { improved: 0, worsened: 0, unchanged: 0 };
  for (const r of reports) {
    const b = rankOf(r.bestConfirmedRankBefore);
    const a = rankOf(r.bestConfirmedRankAfter);
    if (a < b) summary.improved += 1;
    else if (a > b) summary.worsened += 1;
    else summary.unchanged += 1;
  }
  return { reports, summary };
}
