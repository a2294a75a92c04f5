import type { Alloy } from './alloys.ts';
import { DomainInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from './errors.ts';
import { ITS90_FREEZING_POINTS_C } from './its90.ts';
import { PUBLICATIONS, fromMemory, primary } from './sources.ts';
import type { SourceNote } from './sources.ts';

/**
 * Superheat: how far the pour is above the liquidus, in °C (negative when the
 * metal is already below it).
 */
export function superheatC(pourTempC: number, alloy: Pick<Alloy, 'liquidusC'>): number {
  return requireFinite('pourTempC', pourTempC) - alloy.liquidusC;
}

export const CASTING_YIELD_SOURCE: SourceNote = primary(`${PUBLICATIONS.giessereiLexikon}, "Output" (Ausbringen)`);

/**
 * Casting yield: mass of castings over the metal poured (castings + gating +
 * risers), as a percentage, and the metal that goes back as returns.
 * Definition per Giesserei-Lexikon, "Output".
 */
export function pourYield(input: { chargeG: number; castingG: number }): { yieldPct: number; remainderG: number } {
  const chargeG = requirePositive('chargeG', input.chargeG);
  const castingG = requireNonNegative('castingG', input.castingG);
  if (castingG > chargeG) {
    throw new DomainInputError('castingG', 'casting-heavier-than-charge', 'the casting cannot weigh more than the metal poured');
  }
  return { yieldPct: (castingG / chargeG) * 100, remainderG: chargeG - castingG };
}

/**
 * Grams of metal to weigh out for a casting, given the yield this pattern
 * usually gives and a safety margin, rounded up to the whole gram.
 * @param input.expectedYieldPct in (0, 100]
 * @param input.marginPct extra metal on top, 0–100 % (default 0)
 */
export function chargeFor(input: { castingG: number; expectedYieldPct: number; marginPct?: number }): number {
  const castingG = requirePositive('castingG', input.castingG);
  const yieldPct = requireInRange('expectedYieldPct', input.expectedYieldPct, { min: 0, max: 100, minExclusive: true });
  const marginPct = requireInRange('marginPct', input.marginPct ?? 0, { min: 0, max: 100 });
  const grams = (castingG * 100 * (1 + marginPct / 100)) / yieldPct;
  // Trim float noise first so 450 g at 75 % is 600 g, not 601 g.
  return Math.ceil(Number(grams.toFixed(6)));
}

/** Median of a non-empty list. */
export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

export type SetpointSuggestion = {
  setpointC: number;
  /** Median of (measured − setpoint) over the history; negative when the metal ends up cooler than set. */
  offsetC: number;
  /** Median absolute deviation of the offsets (unscaled), 0 without history. */
  spreadC: number;
  samples: number;
  basis: 'history' | 'no-history';
};

/**
 * The furnace setpoint that should bring the metal to `targetC`, learnt from
 * earlier heats on the same furnace. Uses the median offset so one heat with a
 * cold thermocouple or a forgotten lid does not drag the answer, and reports
 * the median absolute deviation as the spread. With no history it returns the
 * target itself and says so.
 */
export function suggestSetpoint(input: {
  targetC: number;
  history: readonly { setpointC: number; measuredC: number }[];
}): SetpointSuggestion {
  const targetC = requireFinite('targetC', input.targetC);
  const offsets = input.history.map((heat, i) => {
    requireFinite(`history[${i}].setpointC`, heat.setpointC);
    requireFinite(`history[${i}].measuredC`, heat.measuredC);
    return heat.measuredC - heat.setpointC;
  });
  if (offsets.length === 0) {
    return { setpointC: targetC, offsetC: 0, spreadC: 0, samples: 0, basis: 'no-history' };
  }
  const offsetC = median(offsets);
  const spreadC = median(offsets.map((o) => Math.abs(o - offsetC)));
  return { setpointC: targetC - offsetC, offsetC, spreadC, samples: offsets.length, basis: 'history' };
}

/**
 * Approximate heat properties of aluminium: mean solid specific heat from
 * 20 °C to the melting point, latent heat of fusion, liquid specific heat.
 */
export const ALUMINIUM_HEAT_PROPERTIES = {
  solidSpecificHeatJPerGK: 0.95,
  latentHeatJPerG: 397,
  liquidSpecificHeatJPerGK: 1.18,
  meltingPointC: ITS90_FREEZING_POINTS_C.aluminium,
} as const;
export const ALUMINIUM_HEAT_PROPERTIES_SOURCE: SourceNote = fromMemory(
  'handbook heat data for aluminium: c_s ≈ 0.90–1.05 J/g·K rising with temperature, L ≈ 397 J/g, c_l ≈ 1.18 J/g·K',
);

/**
 * Heat needed to take aluminium from `fromC` to `toC` (sensible heat of the
 * solid, latent heat, then of the liquid), before furnace losses.
 * Q = m·[c_s·(T_m − T_0) + L + c_l·(T_p − T_m)].
 */
export function meltEnergy(input: { massG: number; fromC: number; toC: number }): { energyKj: number; energyKwh: number } {
  const massG = requireNonNegative('massG', input.massG);
  const fromC = requireFinite('fromC', input.fromC);
  const toC = requireFinite('toC', input.toC);
  if (toC < fromC) throw new DomainInputError('toC', 'out-of-range', 'toC must not be below fromC');
  const p = ALUMINIUM_HEAT_PROPERTIES;
  const solidTo = Math.min(toC, p.meltingPointC);
  const solidJ = fromC < p.meltingPointC ? p.solidSpecificHeatJPerGK * (solidTo - fromC) : 0;
  const latentJ = fromC < p.meltingPointC && toC >= p.meltingPointC ? p.latentHeatJPerG : 0;
  const liquidJ = toC > p.meltingPointC ? p.liquidSpecificHeatJPerGK * (toC - Math.max(fromC, p.meltingPointC)) : 0;
  const energyKj = (massG * (solidJ + latentJ + liquidJ)) / 1000;
  return { energyKj, energyKwh: energyKj / 3600 };
}
