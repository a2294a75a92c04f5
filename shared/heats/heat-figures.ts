import {
  DomainInputError,
  ITS90_FREEZING_POINTS_C,
  cautionsFor,
  dewPointC,
  findAlloy,
  humidityRisk,
  hydrogenSolubility,
  pourYield,
  superheatC,
} from '../domain/index.ts';
import type { HeatConditions } from '../domain/index.ts';
import type { CrucibleCycleLimits } from './crucible-life.ts';
import type { CrucibleShock } from './equipment-schemas.ts';
import { holdTimeMinOf } from './heat-conditions-of.ts';
import type { HeatConditionsHeat } from './heat-conditions-of.ts';
import { SAFETY_CHECKS, SAFETY_CHECK_LABELS } from './heat-schemas.ts';
import type { HeatCaution, HeatFigures, SafetyCheck } from './heat-schemas.ts';

// The figures shown beside a logged heat. Every number comes from the trade
// core (shared/domain); this file only decides which inputs to hand it and
// turns an impossible input into "unknown" rather than an error.

/** What the figures need: the heat's readings and its charge and castings totals. */
export type HeatFiguresInput = Pick<
  HeatConditionsHeat,
  'meltStartedAt' | 'pouredAt' | 'pourTempC' | 'ambientTempC' | 'relativeHumidityPct' | 'crucibleCycle'
> & {
  alloy: string;
  /** chargeTotalG of the charge lines. */
  chargeG: number;
  /** castingsTotalG of the castings (null while unknown). */
  castingsG: number | null;
};

/** Runs a trade-core call, answering null when it refuses the input. */
function known<T>(compute: () => T): T | null {
  try {
    return compute();
  } catch (error) {
    if (error instanceof DomainInputError) return null;
    throw error;
  }
}

/** Grams charged: the sum of the charge lines. */
export function chargeTotalG(lines: readonly { massG: number }[]): number {
  return lines.reduce((sum, l) => sum + l.massG, 0);
}

/** Grams cast, or null while there is no casting or one is still unweighed (a yield would be wrong). */
export function castingsTotalG(castings: readonly { massG: number | null }[]): number | null {
  if (castings.length === 0 || castings.some((k) => k.massG === null)) return null;
  return castings.reduce((sum, k) => sum + (k.massG ?? 0), 0);
}

/** One casting's share of the heat's charge, %. */
export function castingYieldPct(chargeG: number, castingG: number | null): number | null {
  if (castingG === null) return null;
  return known(() => pourYield({ chargeG, castingG }).yieldPct);
}

/** Yield, superheat, hold time, dew point, hydrogen hint and crucible heat number for one heat. */
export function heatFiguresOf(heat: HeatFiguresInput): HeatFigures {
  const alloy = findAlloy(heat.alloy);
  const { chargeG, castingsG } = heat;
  const yieldResult = castingsG === null ? null : known(() => pourYield({ chargeG, castingG: castingsG }));
  const pour = heat.pourTempC ?? null;
  const dewPoint =
    heat.ambientTempC == null || heat.relativeHumidityPct == null
      ? null
      : known(() => dewPointC({ tempC: heat.ambientTempC!, relativeHumidityPct: heat.relativeHumidityPct! }));

  let hydrogen: HeatFigures['hydrogen'] = null;
  // The solubility equations are for aluminium; for bronze or zinc they would mislead.
  if (alloy?.family === 'aluminium' && pour !== null) {
    const meltingPointC = ITS90_FREEZING_POINTS_C.aluminium;
    const atPour = known(() => hydrogenSolubility({ tempC: pour, phase: 'liquid' }));
    const atMelt = known(() => hydrogenSolubility({ tempC: meltingPointC, phase: 'liquid' }));
    if (atPour !== null && atMelt !== null) {
      hydrogen = { atPourMlPer100g: atPour, atMeltingPointMlPer100g: atMelt, meltingPointC, ratio: atPour / atMelt };
    }
  }

  return {
    chargeG,
    castingsG,
    yieldPct: yieldResult?.yieldPct ?? null,
    remainderG: yieldResult?.remainderG ?? null,
    superheatC: alloy && pour !== null ? known(() => superheatC(pour, alloy)) : null,
    liquidusC: alloy?.liquidusC ?? null,
    holdTimeMin: holdTimeMinOf(heat),
    dewPointC: dewPoint,
    humidityRisk: dewPoint === null ? null : known(() => humidityRisk(dewPoint)),
    hydrogen,
    crucibleCycle: heat.crucibleCycle ?? null,
  };
}

export type HeatCautionsInput = {
  alloy: string;
  safety: Record<SafetyCheck, boolean>;
  crucibleShock: CrucibleShock;
  /** The heat's HeatConditions and each pour's (heatConditionsOf), so pour-specific cautions show too. */
  conditions: readonly Partial<HeatConditions>[];
  /** The crucible's limits in this workshop, when a crucible was used. */
  crucibleLimits?: CrucibleCycleLimits | null;
};

const CRUCIBLE_SHOCK_SOURCE =
  'common practice: clay-graphite and silicon-carbide crucibles crack from thermal shock, so bring them up to heat gradually and never quench them';

/**
 * The cautions a heat raises: a crucible shock and an incomplete checklist
 * (facts only the heat log knows), then the trade core's cautionsFor over
 * the heat and each of its pours, each caution once.
 */
export function heatCautionsOf(heat: HeatCautionsInput): HeatCaution[] {
  const cautions: HeatCaution[] = [];
  if (heat.crucibleShock !== 'none') {
    const quenched = heat.crucibleShock === 'quenched';
    cautions.push({
      id: 'crucible_shock',
      title: quenched ? 'The crucible was quenched' : 'The crucible was heated up fast',
      text: quenched
        ? 'Look the crucible over for cracks and dry it slowly before it is used again.'
        : 'Look the crucible over for cracks before the next melt, and bring it up to heat gradually next time.',
      source: CRUCIBLE_SHOCK_SOURCE,
    });
  }
  const missing = SAFETY_CHECKS.filter((check) => !heat.safety[check]);
  if (missing.length) {
    cautions.push({
      id: 'safety_checklist_incomplete',
      title: 'Pre-pour checklist not complete',
      text: `Not ticked: ${missing.map((m) => SAFETY_CHECK_LABELS[m]).join(', ')}.`,
      source: 'common practice: dry tools, protective equipment and a clear floor before every pour',
    });
  }
  const alloy = findAlloy(heat.alloy);
  const options = heat.crucibleLimits
    ? { crucibleWarnCycles: heat.crucibleLimits.warnAt, crucibleLimitCycles: heat.crucibleLimits.limitAt }
    : {};
  for (const conditions of heat.conditions) {
    for (const caution of cautionsFor({ alloy, conditions }, options)) {
      if (!cautions.some((c) => c.id === caution.id)) cautions.push(caution);
    }
  }
  return cautions;
}

/**
 * What a mould's cavity holds in another alloy: the same volume, so the mass
 * scales with the library densities. Without both densities the stored
 * capacity stands as it is.
 */
export function cavityMassG(mould: { capacityG: number; capacityAlloy: string | null }, alloy: string | null): number {
  const from = mould.capacityAlloy ? findAlloy(mould.capacityAlloy) : undefined;
  const to = alloy ? findAlloy(alloy) : undefined;
  if (!from || !to || from.designation === to.designation) return mould.capacityG;
  return (mould.capacityG * to.densityGcm3) / from.densityGcm3;
}
