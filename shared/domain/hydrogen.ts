import { requireFinite, requireNonNegative, DomainInputError } from './errors.ts';
import { PUBLICATIONS, fromMemory, primary } from './sources.ts';
import type { SourceNote } from './sources.ts';
import { cToK } from './units.ts';

// Hydrogen solubility in aluminium, cm³ of H₂ at STP (273.15 K, 101.325 kPa)
// per 100 g of metal, i.e. mL/100 g. Van 't Hoff form log₁₀S = −A/T + B at
// 1 atm of hydrogen, with Sieverts' law S ∝ √p for other pressures.

export const HYDROGEN_PHASES = ['liquid', 'solid'] as const;
export type HydrogenPhase = (typeof HYDROGEN_PHASES)[number];

export const HYDROGEN_SOLUBILITY_MODELS = ['ransley-neufeld-1948', 'talbot-anyalebechi-1988'] as const;
export type HydrogenSolubilityModel = (typeof HYDROGEN_SOLUBILITY_MODELS)[number];

type VantHoff = { a: number; b: number; source: SourceNote };

/** Coefficients per model and phase; Talbot & Anyalebechi cover the liquid only. */
export const HYDROGEN_SOLUBILITY_COEFFICIENTS: Record<HydrogenSolubilityModel, Partial<Record<HydrogenPhase, VantHoff>>> = {
  'ransley-neufeld-1948': {
    liquid: { a: 2760, b: 2.796, source: fromMemory(`constants of ${PUBLICATIONS.ransleyNeufeld1948}, liquid aluminium`) },
    solid: { a: 2080, b: 0.788, source: fromMemory(`constants of ${PUBLICATIONS.ransleyNeufeld1948}, solid aluminium`) },
  },
  'talbot-anyalebechi-1988': {
    liquid: { a: 2700, b: 2.72, source: primary(`${PUBLICATIONS.talbotAnyalebechi1988}, liquid pure Al, 943–1123 K`) },
  },
};

/**
 * Equilibrium hydrogen solubility in pure aluminium, mL H₂ (STP) per 100 g.
 * @param input.pressureAtm hydrogen partial pressure, atm (default 1); Sieverts' square-root law
 * @param input.model Ransley & Neufeld by default; Talbot & Anyalebechi 1988 for the liquid as a cross-check
 */
export function hydrogenSolubility(input: {
  tempC: number;
  phase: HydrogenPhase;
  pressureAtm?: number;
  model?: HydrogenSolubilityModel;
}): number {
  const tempK = cToK(requireFinite('tempC', input.tempC));
  if (tempK <= 0) throw new DomainInputError('tempC', 'out-of-range', 'tempC must be above absolute zero');
  const pressureAtm = requireNonNegative('pressureAtm', input.pressureAtm ?? 1);
  const model = input.model ?? 'ransley-neufeld-1948';
  const coefficients = HYDROGEN_SOLUBILITY_COEFFICIENTS[model][input.phase];
  if (!coefficients) {
    throw new DomainInputError('phase', 'out-of-range', `${model} gives no equation for the ${input.phase} phase`);
  }
  const atOneAtm = 10 ** (-coefficients.a / tempK + coefficients.b);
  return atOneAtm * Math.sqrt(pressureAtm);
}
