import { heatConditionsSchema } from '../domain/index.ts';
import type { ChargeKind, HeatConditionField, HeatConditions, MoldMaterial } from '../domain/index.ts';
import type { DegassingMethod, HeatFluxKind, QuenchMedium } from './heat-schemas.ts';

// The one mapping from a logged heat (and one of its pours) to the trade
// core's HeatConditions. The heat form's live hints, the heat read and the
// diagnosis all call it, so a field is never read two ways.

/** What the mapping reads from a heat; a form draft with gaps is fine. */
export type HeatConditionsHeat = {
  meltStartedAt?: string | null;
  pouredAt?: string | null;
  pourTempC?: number | null;
  peakTempC?: number | null;
  chargeLines?: readonly { kind: ChargeKind }[];
  degassing?: DegassingMethod | null;
  fluxKind?: HeatFluxKind | null;
  skimmed?: boolean | null;
  toolsPreheated?: boolean | null;
  ambientTempC?: number | null;
  relativeHumidityPct?: number | null;
  /** The crucible's heat number at this heat, this one included. */
  crucibleCycle?: number | null;
};

/** What the mapping reads from one casting and its mould. */
export type HeatConditionsCasting = {
  mould?: { material: MoldMaterial; hasRiser: boolean } | null;
  mouldPreheatC?: number | null;
  coated?: boolean | null;
  vented?: boolean | null;
  pourHeightCm?: number | null;
  sectionThicknessMm?: number | null;
  airCoolMin?: number | null;
  quenchMedium?: QuenchMedium | null;
};

// Dirtier charge brings more moisture, oil and oxide; a little of it taints
// the whole melt, so the worst kind present describes the heat.
const CHARGE_RANK: Record<ChargeKind, number> = { ingot: 0, clean_scrap: 1, dirty_scrap: 2 };

/** Minutes from melt start to pour; null unless both times are known and in order. */
export function holdTimeMinOf(heat: Pick<HeatConditionsHeat, 'meltStartedAt' | 'pouredAt'>): number | null {
  if (!heat.meltStartedAt || !heat.pouredAt) return null;
  const minutes = (Date.parse(heat.pouredAt) - Date.parse(heat.meltStartedAt)) / 60_000;
  return Number.isFinite(minutes) && minutes >= 0 ? minutes : null;
}

/**
 * A heat, and optionally one of its castings, as the trade core's
 * HeatConditions. Fields that are unknown, or outside the ranges the trade
 * core accepts, are left out rather than guessed.
 */
export function heatConditionsOf(heat: HeatConditionsHeat, casting?: HeatConditionsCasting): Partial<HeatConditions> {
  const out: Partial<Record<HeatConditionField, unknown>> = {};
  const put = (field: HeatConditionField, value: unknown) => {
    if (value === null || value === undefined) return;
    if (heatConditionsSchema.shape[field].safeParse(value).success) out[field] = value;
  };

  put('pourTempC', heat.pourTempC);
  put('peakTempC', heat.peakTempC);
  put('holdTimeMin', holdTimeMinOf(heat));
  if (heat.chargeLines?.length) {
    put('chargeKind', heat.chargeLines.reduce<ChargeKind>((worst, l) => (CHARGE_RANK[l.kind] > CHARGE_RANK[worst] ? l.kind : worst), 'ingot'));
  }
  if (heat.degassing) put('degassed', heat.degassing !== 'none');
  if (heat.fluxKind) {
    put('fluxed', heat.fluxKind !== 'none');
    if (heat.fluxKind !== 'none') put('fluxKind', heat.fluxKind);
  }
  put('skimmed', heat.skimmed);
  put('toolsPreheated', heat.toolsPreheated);
  put('ambientTempC', heat.ambientTempC);
  put('relativeHumidityPct', heat.relativeHumidityPct);
  put('crucibleCycles', heat.crucibleCycle);

  if (casting) {
    put('moldMaterial', casting.mould?.material);
    put('riser', casting.mould?.hasRiser);
    put('moldTempC', casting.mouldPreheatC);
    put('moldCoated', casting.coated);
    put('moldVented', casting.vented);
    put('pourHeightCm', casting.pourHeightCm);
    put('sectionThicknessMm', casting.sectionThicknessMm);
    // The trade core's quench delay means "time before going into water";
    // a casting left to cool in air has none.
    if (casting.quenchMedium === 'water') put('quenchDelayMin', casting.airCoolMin);
  }
  return out as Partial<HeatConditions>;
}
