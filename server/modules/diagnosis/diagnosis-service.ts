import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { diagnose, findAlloy, findDefectKind } from '../../../shared/domain/index.ts';
import type { CausePrior, DefectKindId } from '../../../shared/domain/index.ts';
import { heatConditionsOf } from '../../../shared/heats/heat-conditions-of.ts';
import type { HeatCreateInput } from '../../../shared/heats/heat-schemas.ts';
import { missingFieldsOf } from '../../../shared/reports/diagnosis-schemas.ts';
import type {
  Diagnosis,
  DiagnosisInput,
  DiagnosisRequest,
  QuickCheck,
  QuickCheckCreateInput,
  QuickCheckQuestions,
} from '../../../shared/reports/diagnosis-schemas.ts';
import { quickCheckQuestions } from '../../../shared/reports/quick-check-questions.ts';
import { forbidden, notFound } from '../../lib/app-error.ts';
import * as heatsService from '../heats/heats-service.ts';
import * as rulesService from '../rules/rules-service.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as repo from './diagnosis-repository.ts';

// Every diagnosis in a workshop runs the trade core with the workshop's own
// rule set and its reviewers' confirmed causes as priors; this module only
// gathers the input and words the result.

const castingNotFound = () => notFound('Casting', 'casting-not-found');

// "Gas porosity (hydrogen)" reads as "gas porosity" inside a sentence, as in the core's explanations.
const defectName = (kind: DefectKindId) => (findDefectKind(kind)?.name ?? kind).replace(/\s*\(.*\)$/, '').toLowerCase();

function listWords(words: string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/** One sentence on what the workshop's history brought to this ranking, or null when it had none for these defects. */
function priorsNoteFor(defects: readonly { kind: DefectKindId }[], priors: readonly CausePrior[]): string | null {
  const parts: string[] = [];
  for (const { kind } of defects) {
    const resolved = priors.find((p) => p.defectKind === kind)?.resolvedCount ?? 0;
    if (resolved > 0) {
      parts.push(`${resolved}${parts.length === 0 ? ` resolved report${resolved === 1 ? '' : 's'}` : ''} with ${defectName(kind)}`);
    }
  }
  if (!parts.length) return null;
  return `The ranking also weighs what reviewers confirmed in ${listWords(parts)} in this workshop.`;
}

/** Runs the trade core on `input` with the workshop's rules and priors. */
export async function diagnoseInput(workshopId: string, input: DiagnosisInput): Promise<Diagnosis> {
  const [ruleSet, priors] = await Promise.all([rulesService.effectiveRuleSet(workshopId), repo.workshopPriors(workshopId)]);
  const alloy = input.alloy ? findAlloy(input.alloy) : undefined;
  const result = diagnose({ alloy, defects: input.defects, conditions: input.conditions }, { rules: ruleSet.rules, priors });
  return {
    input: { alloy: alloy?.designation ?? null, defects: input.defects, conditions: input.conditions },
    causes: result.causes,
    cautions: result.cautions,
    priorsNote: priorsNoteFor(input.defects, priors),
    missing: missingFieldsOf(result.causes),
    ruleSet: ruleSet.stamp,
  };
}

/** POST /diagnosis: a what-if any member may ask, about no stored casting. */
export async function whatIf(_actor: Actor, workshopId: string, request: DiagnosisRequest): Promise<Diagnosis> {
  // One entry per kind at its worst severity, as the casting diagnosis does.
  const worst = new Map<DefectKindId, 1 | 2 | 3>();
  for (const d of request.defects) worst.set(d.kind, Math.max(worst.get(d.kind) ?? 1, d.severity) as 1 | 2 | 3);
  return diagnoseInput(workshopId, {
    alloy: request.alloy ?? null,
    defects: [...worst].map(([kind, severity]) => ({ kind, severity })),
    conditions: request.conditions,
  });
}

/** The diagnosis input of a stored casting: its marks and its heat's conditions; null when it is not in the workshop. */
export async function castingInput(workshopId: string, castingId: string): Promise<(DiagnosisInput & { casterId: string; heatId: string }) | null> {
  const [source, defects] = await Promise.all([repo.castingSource(workshopId, castingId), repo.castingDefects(workshopId, castingId)]);
  if (!source) return null;
  return {
    casterId: source.casterId,
    heatId: source.heatId,
    alloy: findAlloy(source.alloy)?.designation ?? null,
    defects,
    conditions: heatConditionsOf(source.heat, source.casting),
  };
}

/** A stored casting's diagnosis, for callers that have already checked who may see it (a report's readers). */
export async function diagnoseCasting(workshopId: string, castingId: string): Promise<Diagnosis> {
  const input = await castingInput(workshopId, castingId);
  if (!input) throw castingNotFound();
  return diagnoseInput(workshopId, { alloy: input.alloy, defects: input.defects, conditions: input.conditions });
}

/** GET /castings/:castingId/diagnosis: for whoever may read the casting's heat; others get the same 404 as a missing casting. */
export async function castingDiagnosis(actor: Actor, workshopId: string, castingId: string): Promise<Diagnosis> {
  const input = await castingInput(workshopId, castingId);
  if (!input) throw castingNotFound();
  const owner = { ownerId: input.casterId, ownerMentorIds: await workshopsService.mentorIdsOf(workshopId, input.casterId) };
  if (!can(actor, 'read', 'heat', owner)) throw castingNotFound();
  return diagnoseInput(workshopId, { alloy: input.alloy, defects: input.defects, conditions: input.conditions });
}

/**
 * A heat stub with one casting, so photos can be taken and marked before the
 * heat is logged in full. It is a normal heat of the actor's, poured now,
 * with no charge lines (the charge stays "not recorded" rather than invented)
 * and the heat log's defaults elsewhere; the caster fills it in later.
 */
export async function createQuickCheck(actor: Actor, workshopId: string, input: QuickCheckCreateInput): Promise<QuickCheck> {
  if (!can(actor, 'create', 'heat')) throw forbidden();
  const alloy = input.alloy ?? (await heatsService.lastDefaults(actor, workshopId)).alloy;
  if (!alloy) heatsService.invalid([{ path: ['alloy'], message: 'Pick an alloy: there is no earlier heat to take it from' }]);
  const heat: HeatCreateInput = {
    pouredAt: new Date().toISOString(),
    alloy,
    chargeLines: [],
    fluxKind: 'none',
    degassing: 'none',
    crucibleShock: 'none',
    safety: { dryTools: false, ppe: false, clearFloor: false },
    notes: input.title ? `Quick check: ${input.title}` : 'Quick check',
    castings: [{ quenchMedium: 'none', notes: null }],
  };
  const created = await heatsService.createHeat(actor, workshopId, heat);
  return { heatId: created.id, castingId: created.castings[0].id };
}

/** The few HeatConditions fields worth asking first for these defects, from the workshop's own rules. */
export async function questionsFor(_actor: Actor, workshopId: string, kinds: DefectKindId[]): Promise<QuickCheckQuestions> {
  const { rules } = await rulesService.effectiveRuleSet(workshopId);
  const questions = quickCheckQuestions(kinds, rules);
  return { kinds, questions, fields: questions.flatMap((q) => q.fields) };
}
