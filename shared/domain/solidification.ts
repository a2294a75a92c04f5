import { requirePositive } from './errors.ts';
import { PUBLICATIONS, fromMemory, secondary } from './sources.ts';
import type { SourceNote } from './sources.ts';

// Chvorinov's rule t = B·(V/A)ⁿ. Lengths in cm, so the modulus is in cm and
// the mould constant B in min/cmⁿ. The cooling area A counts only faces that
// lose heat to the mould: a face joined to the casting or a riser does not.

/** Volume and cooling surface of a shape, cm³ and cm². */
export type Shape = { volumeCm3: number; areaCm2: number };

/** Casting modulus M = V/A, cm. */
export function modulusCm(shape: Shape): number {
  return requirePositive('volumeCm3', shape.volumeCm3) / requirePositive('areaCm2', shape.areaCm2);
}

/**
 * Solidification time by Chvorinov's rule, minutes.
 * @param input.moldConstant B in min/cmⁿ, fitted for one metal and mould
 * @param input.n exponent, 2 by default (quoted as 1.5–2)
 */
export function chvorinovTimeMin(input: Shape & { moldConstant: number; n?: number }): number {
  const b = requirePositive('moldConstant', input.moldConstant);
  const n = requirePositive('n', input.n ?? 2);
  return b * modulusCm(input) ** n;
}

/** The mould constant B (min/cmⁿ) that a measured solidification time implies. */
export function moldConstantFrom(input: Shape & { timeMin: number; n?: number }): number {
  const t = requirePositive('timeMin', input.timeMin);
  const n = requirePositive('n', input.n ?? 2);
  return t / modulusCm(input) ** n;
}

/** The modulus (cm) that freezes in `timeMin` with mould constant B. */
export function modulusForTimeCm(input: { timeMin: number; moldConstant: number; n?: number }): number {
  const t = requirePositive('timeMin', input.timeMin);
  const b = requirePositive('moldConstant', input.moldConstant);
  const n = requirePositive('n', input.n ?? 2);
  return (t / b) ** (1 / n);
}

/**
 * Diameter (cm) of a cylindrical riser, H = k·D, with every face cooling,
 * that stays liquid for `timeMin`. Its modulus is M = k·D/(4k + 2), so
 * D = M·(4k + 2)/k; for H = D this is D = 6·M.
 * @param input.heightOverDiameter k, 1 by default
 */
export function cylinderRiserDiameterCm(input: {
  timeMin: number;
  moldConstant: number;
  heightOverDiameter?: number;
  n?: number;
}): number {
  const k = requirePositive('heightOverDiameter', input.heightOverDiameter ?? 1);
  return (modulusForTimeCm(input) * (4 * k + 2)) / k;
}

/** A rectangular plate or block with all six faces cooling. */
export function plateShape(input: { lengthCm: number; widthCm: number; thicknessCm: number }): Shape {
  const l = requirePositive('lengthCm', input.lengthCm);
  const w = requirePositive('widthCm', input.widthCm);
  const t = requirePositive('thicknessCm', input.thicknessCm);
  return { volumeCm3: l * w * t, areaCm2: 2 * (l * w + l * t + w * t) };
}

/**
 * A bar of rectangular section. The ends cool unless `endsCool` is false, as
 * for a long bar or one fed at both ends; with them off a square bar of side a
 * has M = a/4.
 */
export function barShape(input: { lengthCm: number; widthCm: number; heightCm: number; endsCool?: boolean }): Shape {
  const l = requirePositive('lengthCm', input.lengthCm);
  const w = requirePositive('widthCm', input.widthCm);
  const h = requirePositive('heightCm', input.heightCm);
  const ends = input.endsCool === false ? 0 : 2 * w * h;
  return { volumeCm3: l * w * h, areaCm2: 2 * (w + h) * l + ends };
}

/** A cube of side a, all faces cooling: M = a/6. */
export function cubeShape(input: { sideCm: number }): Shape {
  const a = requirePositive('sideCm', input.sideCm);
  return { volumeCm3: a ** 3, areaCm2: 6 * a * a };
}

/**
 * A cylinder. The top and side always cool; the bottom cools unless it sits
 * on the casting (`bottomCools: false`, the usual riser case).
 * H = D all faces: M = D/6; bottom joined: M = D/5; general top and sides: M = D·H/(4H + D).
 */
export function cylinderShape(input: { diameterCm: number; heightCm: number; bottomCools?: boolean }): Shape {
  const d = requirePositive('diameterCm', input.diameterCm);
  const h = requirePositive('heightCm', input.heightCm);
  const end = (Math.PI * d * d) / 4;
  const faces = input.bottomCools === false ? 1 : 2;
  return { volumeCm3: end * h, areaCm2: Math.PI * d * h + faces * end };
}

/** Riser-to-casting modulus factor; the neck sits between the two. */
export const RISER_MODULUS_FACTOR = 1.2;
export const NECK_MODULUS_FACTOR = 1.1;
export const RISER_MODULUS_RULE_SOURCES: SourceNote[] = [
  fromMemory(`${PUBLICATIONS.wlodawer1966}: casting : neck : riser moduli ≈ 1 : 1.1 : 1.2`),
  secondary('foundry training material calling the 1.2 factor the Caine criterion'),
];

/**
 * The modulus rule for feeding: a riser must freeze after the section it
 * feeds, so M_riser ≥ 1.2·M_casting, with the neck at about 1.1·M_casting.
 * Pass `riserModulusCm` to check a riser you already have.
 */
export function riserModulusRule(input: { castingModulusCm: number; riserModulusCm?: number }): {
  minRiserModulusCm: number;
  neckModulusCm: number;
  satisfied?: boolean;
  sources: SourceNote[];
} {
  const mc = requirePositive('castingModulusCm', input.castingModulusCm);
  const minRiserModulusCm = RISER_MODULUS_FACTOR * mc;
  const result = { minRiserModulusCm, neckModulusCm: NECK_MODULUS_FACTOR * mc, sources: RISER_MODULUS_RULE_SOURCES };
  if (input.riserModulusCm === undefined) return result;
  return { ...result, satisfied: requirePositive('riserModulusCm', input.riserModulusCm) >= minRiserModulusCm - 1e-12 };
}
