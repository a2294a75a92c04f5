import { accessFor, can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { findAlloy, heatTreatmentPlan, tempersFor } from '../../../shared/domain/index.ts';
import { compareToPlan } from '../../../shared/heat-treatment/compare-plan.ts';
import { heatTreatmentPlanSchema } from '../../../shared/heat-treatment/heat-treatment-schemas.ts';
import type {
  CandidateCasting,
  HardnessCreateInput,
  HeatTreatmentCreateInput,
  HeatTreatmentDetail,
  HeatTreatmentListQuery,
  HeatTreatmentSummary,
  HeatTreatmentUpdateInput,
  StepActual,
  StepsActualUpdateInput,
} from '../../../shared/heat-treatment/heat-treatment-schemas.ts';
import { withTransaction } from '../../db/sequelize.ts';
import { forbidden, notFound } from '../../lib/app-error.ts';
import { invalid, type Issue } from '../heats/heats-service.ts';
import * as workshopsService from '../workshops/workshops-service.ts';
import * as repo from './heat-treatment-repository.ts';
import type { HeatTreatmentRow } from './heat-treatment-repository.ts';

// A heat-treatment plan is part of its castings' story, so it follows their
// heats' permissions: the caster (and admins) plan and record, mentors read
// their mentees' plans, and a plan the actor may not read answers like a
// missing one. One plan holds one caster's castings, so "whose plan" always
// has one answer.

const planNotFound = () => notFound('Heat-treatment plan', 'heat-treatment-not-found');
const CANDIDATE_LIMIT = 200;

async function ownerOf(workshopId: string, casterId: string) {
  return { ownerId: casterId, ownerMentorIds: await workshopsService.mentorIdsOf(workshopId, casterId) };
}

async function readable(actor: Actor, workshopId: string, id: string): Promise<HeatTreatmentRow> {
  const row = await repo.findTreatment(workshopId, id);
  if (!row || !can(actor, 'read', 'heat', await ownerOf(workshopId, row.casterId))) throw planNotFound();
  return row;
}

async function changeable(actor: Actor, workshopId: string, id: string): Promise<HeatTreatmentRow> {
  const row = await readable(actor, workshopId, id);
  if (!can(actor, 'update', 'heat', { ownerId: row.casterId })) {
    throw forbidden('You can read this heat-treatment plan; its caster or an admin records it');
  }
  return row;
}

function photoUrl(workshopId: string, photoId: string) {
  return `/api/workshops/${workshopId}/photos/${photoId}/image/thumb`;
}

async function detailOf(row: HeatTreatmentRow): Promise<HeatTreatmentDetail> {
  const [castings, actuals, hardness, photos] = await Promise.all([
    repo.treatedCastings(row.id),
    repo.stepActuals(row.id),
    repo.hardnessReadings(row.id),
    repo.treatmentPhotos(row.id),
  ]);
  // The stored snapshot is parsed, so a plan written by an older schedule shape fails here, loudly.
  const plan = heatTreatmentPlanSchema.parse(row.plan);
  // Incipient melting is judged against the library alloy's solidus (A356.0: 555 °C).
  const solidusC = findAlloy(plan.designation)?.solidusC;
  return {
    ...row,
    plan,
    castingCount: castings.length,
    castings,
    comparison: compareToPlan(plan, actuals, { solidusC }),
    hardness,
    photos: photos.map((p) => ({ ...p, thumbUrl: photoUrl(row.workshopId, p.id) })),
  };
}

// ── reading ─────────────────────────────────────────────────────────────────

export async function listPlans(actor: Actor, workshopId: string, query: HeatTreatmentListQuery): Promise<HeatTreatmentSummary[]> {
  return repo.listTreatments(workshopId, { access: accessFor(actor, 'read', 'heat'), actorId: actor.id }, query.state);
}

export async function getPlan(actor: Actor, workshopId: string, id: string): Promise<HeatTreatmentDetail> {
  return detailOf(await readable(actor, workshopId, id));
}

/** Castings the actor may put into a plan: those of heats they may change (their own; an admin's, anyone's). */
export async function candidates(actor: Actor, workshopId: string, alloy: string | undefined): Promise<CandidateCasting[]> {
  const reach = { access: accessFor(actor, 'update', 'heat'), actorId: actor.id };
  return repo.candidateCastings(workshopId, reach, alloy, CANDIDATE_LIMIT);
}

// ── planning ────────────────────────────────────────────────────────────────

/**
 * Plans a treatment from the trade core's schedule for the alloy and temper.
 * Every casting must be one the actor may change, from a heat of the same
 * alloy, and all of one caster.
 */
export async function createPlan(actor: Actor, workshopId: string, input: HeatTreatmentCreateInput): Promise<HeatTreatmentDetail> {
  if (!can(actor, 'create', 'heat')) throw forbidden();
  // The schema already turned the designation into the library's spelling.
  const alloy = findAlloy(input.alloy);
  if (!alloy) return invalid([{ path: ['alloy'], message: `"${input.alloy}" is not an alloy in the library` }]);
  const plan = heatTreatmentPlan(alloy, input.temper);
  if (!plan) {
    const accepted = tempersFor(alloy);
    return invalid([
      {
        path: ['temper'],
        message: accepted.length
          ? `${alloy.designation} has no ${input.temper} schedule; it takes ${accepted.join(', ')}`
          : `${alloy.designation} has no heat-treatment schedules in the library`,
      },
    ]);
  }

  const found = new Map((await repo.castingsForPlan(workshopId, input.castingIds)).map((c) => [c.castingId, c]));
  const issues: Issue[] = [];
  const casters = new Set<string>();
  let readOnly = false;
  for (const [i, id] of input.castingIds.entries()) {
    const casting = found.get(id);
    const owner = casting && (await ownerOf(workshopId, casting.casterId));
    // A casting of a heat the actor may not read is reported like a missing one.
    if (!casting || !owner || !can(actor, 'read', 'heat', owner)) {
      issues.push({ path: ['castingIds', i], message: 'No such casting in this workshop' });
      continue;
    }
    if (!can(actor, 'update', 'heat', owner)) {
      readOnly = true;
      continue;
    }
    if (findAlloy(casting.heatAlloy)?.designation !== alloy.designation) {
      issues.push({ path: ['castingIds', i], message: `This casting is from a ${casting.heatAlloy} heat, not ${alloy.designation}` });
    }
    casters.add(casting.casterId);
  }
  if (readOnly) throw forbidden('Plan heat treatment only for your own castings; an admin can plan for anyone’s');
  if (casters.size > 1) issues.push({ path: ['castingIds'], message: 'One plan holds one caster’s castings; make a plan for each caster' });
  if (issues.length) invalid(issues);

  const [casterId] = [...casters];
  const id = await withTransaction((tx) =>
    repo.insertTreatment(
      {
        workshopId,
        casterId,
        createdBy: actor.id,
        alloy: alloy.designation,
        temper: input.temper,
        plan,
        oven: input.oven,
        notes: input.notes,
        castingIds: input.castingIds,
      },
      tx,
    ),
  );
  return getPlan(actor, workshopId, id);
}

export async function updatePlan(actor: Actor, workshopId: string, id: string, input: HeatTreatmentUpdateInput): Promise<HeatTreatmentDetail> {
  await changeable(actor, workshopId, id);
  await repo.updateTreatment(workshopId, id, input);
  return getPlan(actor, workshopId, id);
}

export async function deletePlan(actor: Actor, workshopId: string, id: string): Promise<void> {
  await changeable(actor, workshopId, id);
  await repo.deleteTreatment(workshopId, id);
}

// ── the record ──────────────────────────────────────────────────────────────

const EMPTY_STEP = { startedAt: null, endedAt: null, temperatureC: null, quenchMedium: null, quenchDelayS: null, notes: null } as const;

/**
 * Records what happened in some steps. A field left out keeps what was
 * stored, null clears it. The first record moves a planned treatment to in
 * progress.
 */
export async function recordSteps(actor: Actor, workshopId: string, id: string, input: StepsActualUpdateInput): Promise<HeatTreatmentDetail> {
  const row = await changeable(actor, workshopId, id);
  const plan = heatTreatmentPlanSchema.parse(row.plan);
  const issues: Issue[] = [];
  input.steps.forEach((s, i) => {
    const step = plan.steps[s.stepIndex];
    if (!step) {
      issues.push({ path: ['steps', i, 'stepIndex'], message: `The plan has ${plan.steps.length} steps` });
      return;
    }
    if (step.kind !== 'quench' && (s.quenchDelayS != null || s.quenchMedium != null)) {
      issues.push({ path: ['steps', i, 'quenchDelayS'], message: 'Only the quench step has a medium and a delay' });
    }
    if (step.kind === 'natural_age' && s.temperatureC != null) {
      issues.push({ path: ['steps', i, 'temperatureC'], message: 'Natural ageing happens at room temperature; note the room in the notes' });
    }
  });
  if (issues.length) invalid(issues);

  await withTransaction(async (tx) => {
    if (!(await repo.lockTreatment(workshopId, id, tx))) throw planNotFound();
    const stored = new Map((await repo.stepActuals(id, tx)).map((s) => [s.stepIndex, s]));
    const merged: StepActual[] = input.steps.map(({ stepIndex, ...changes }) => {
      const current = stored.get(stepIndex) ?? { stepIndex, ...EMPTY_STEP };
      const given = Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined));
      return { ...current, ...given, stepIndex };
    });
    const badTimes = merged.findIndex((s) => s.startedAt && s.endedAt && s.endedAt < s.startedAt);
    if (badTimes >= 0) invalid([{ path: ['steps', badTimes, 'endedAt'], message: 'The step ends before it starts' }]);
    await repo.saveStepActuals(id, merged, tx);
    if (row.state === 'planned') await repo.updateTreatment(workshopId, id, { state: 'in_progress' }, tx);
  });
  return getPlan(actor, workshopId, id);
}

async function castingInPlan(id: string, castingId: string) {
  return (await repo.treatedCastings(id)).some((c) => c.id === castingId);
}

export async function addHardness(actor: Actor, workshopId: string, id: string, input: HardnessCreateInput): Promise<HeatTreatmentDetail> {
  await changeable(actor, workshopId, id);
  if (input.castingId && !(await castingInPlan(id, input.castingId))) {
    invalid([{ path: ['castingId'], message: 'That casting is not in this plan' }]);
  }
  await repo.insertHardness({
    heatTreatmentId: id,
    castingId: input.castingId ?? null,
    scale: input.scale,
    value: input.value,
    locationNote: input.locationNote,
    measuredAt: input.measuredAt ?? new Date().toISOString(),
    createdBy: actor.id,
  });
  return getPlan(actor, workshopId, id);
}

export async function removeHardness(actor: Actor, workshopId: string, id: string, readingId: string): Promise<void> {
  await changeable(actor, workshopId, id);
  if (!(await repo.deleteHardness(id, readingId))) throw notFound('Hardness reading', 'hardness-reading-not-found');
}

/** Links a photo of one of the plan's castings to its outcome. */
export async function addPhoto(actor: Actor, workshopId: string, id: string, photoId: string): Promise<HeatTreatmentDetail> {
  await changeable(actor, workshopId, id);
  const photo = await repo.photoCasting(workshopId, photoId);
  if (!photo) invalid([{ path: ['photoId'], message: 'No such photo in this workshop' }]);
  if (!(await castingInPlan(id, photo.castingId))) {
    invalid([{ path: ['photoId'], message: 'That photo is not of a casting in this plan' }]);
  }
  await repo.addPhoto(id, photoId);
  return getPlan(actor, workshopId, id);
}

export async function removePhoto(actor: Actor, workshopId: string, id: string, photoId: string): Promise<void> {
  await changeable(actor, workshopId, id);
  if (!(await repo.removePhoto(id, photoId))) throw notFound('Photo on this plan', 'heat-treatment-photo-not-found');
}
