import { findAlloy, mouldKindOf, pourRangeFor } from '#shared/domain/index.ts';
import type { Alloy, MouldKind, Range } from '#shared/domain/index.ts';
import type { Crucible, Mould } from '#shared/heats/equipment-schemas.ts';
import { heatConditionsOf, holdTimeMinOf } from '#shared/heats/heat-conditions-of.ts';
import type { HeatConditionsHeat } from '#shared/heats/heat-conditions-of.ts';
import { castingsTotalG, chargeTotalG, heatCautionsOf, heatFiguresOf } from '#shared/heats/heat-figures.ts';
import type { HeatCaution, HeatFigures } from '#shared/heats/heat-schemas.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { toHeatDraft, type HeatFormValues } from './heat-form-values.ts';

// The figures beside the inputs while the caster types. They come from the
// same shared functions the server uses for a stored heat (heat-figures.ts,
// heat-conditions-of.ts), so the form and the heat page never disagree.

export type LiveFigures = {
  figures: HeatFigures;
  /** Minutes since the melt started: to the pour when it is stamped, else to now (the running clock). */
  holdMin: number | null;
  /** True while the melt has started and the pour is not stamped yet. */
  clockRunning: boolean;
  alloy: Alloy | undefined;
  /** The alloy's pouring range for the first casting's mould kind (any mould when unknown). */
  pourRange: { range: Range; mouldKind: MouldKind | 'any' } | undefined;
  /** Cautions the heat would carry as entered, each once. */
  cautions: HeatCaution[];
  crucible: Crucible | undefined;
};

export function liveFiguresOf(
  values: HeatFormValues,
  units: Units,
  equipment: { crucibles: readonly Crucible[]; moulds: readonly Mould[] },
  nowMs: number,
  /** The crucible heat number of a stored heat, when editing with its crucible unchanged. */
  storedCrucibleCycle?: { crucibleId: string; cycle: number | null },
): LiveFigures {
  const draft = toHeatDraft(values, units);
  const lines = draft.chargeLines.flatMap((l) => (typeof l.massG === 'number' && l.massG > 0 ? [{ kind: l.kind, massG: l.massG }] : []));
  const castings = (draft.castings ?? []).map((k) => {
    const mould = equipment.moulds.find((m) => m.id === k.mouldId);
    return { ...k, massG: k.massG ?? null, mould: mould ? { material: mould.material, hasRiser: mould.hasRiser } : null };
  });
  const crucible = equipment.crucibles.find((c) => c.id === draft.crucibleId);
  // This heat counts as one more cycle of its crucible, as the server counts it.
  const crucibleCycle = !crucible
    ? null
    : storedCrucibleCycle?.crucibleId === crucible.id
      ? storedCrucibleCycle.cycle
      : crucible.cycleCount + 1;

  const heat: HeatConditionsHeat = {
    meltStartedAt: draft.meltStartedAt ?? null,
    pouredAt: draft.pouredAt || null,
    pourTempC: draft.pourTempC ?? null,
    peakTempC: draft.peakTempC ?? null,
    chargeLines: lines,
    degassing: draft.degassing,
    fluxKind: draft.fluxKind,
    skimmed: draft.skimmed ?? null,
    toolsPreheated: draft.toolsPreheated ?? null,
    ambientTempC: draft.ambientTempC ?? null,
    relativeHumidityPct: draft.relativeHumidityPct ?? null,
    crucibleCycle,
  };
  const figures = heatFiguresOf({ ...heat, alloy: draft.alloy, chargeG: chargeTotalG(lines), castingsG: castingsTotalG(castings) });

  const clockRunning = Boolean(heat.meltStartedAt) && !heat.pouredAt;
  const holdMin = clockRunning ? holdTimeMinOf({ meltStartedAt: heat.meltStartedAt, pouredAt: new Date(nowMs).toISOString() }) : figures.holdTimeMin;

  const alloy = findAlloy(draft.alloy);
  const firstMould = castings.find((k) => k.mould)?.mould;
  const pourRange = alloy ? pourRangeFor(alloy, firstMould ? mouldKindOf(firstMould.material) : undefined) : undefined;

  const cautions = heatCautionsOf({
    alloy: draft.alloy,
    safety: values.safety,
    crucibleShock: values.crucibleShock,
    conditions: [heatConditionsOf(heat), ...castings.map((k) => heatConditionsOf(heat, k))],
    crucibleLimits: crucible ? { warnAt: crucible.warnAt, limitAt: crucible.limitAt } : null,
  });

  return { figures, holdMin, clockRunning, alloy, pourRange, cautions, crucible };
}
