import { requireNonNegative, requirePositive } from './errors.ts';
import { PUBLICATIONS, fromMemory } from './sources.ts';
import type { SourceNote } from './sources.ts';
import { STANDARD_GRAVITY } from './units.ts';

/**
 * Ingate velocity above which the oxide skin of liquid aluminium folds into
 * the metal (m/s).
 */
export const CRITICAL_INGATE_VELOCITY_M_S = 0.5;
export const CRITICAL_INGATE_VELOCITY_SOURCE: SourceNote = fromMemory(
  `${PUBLICATIONS.campbell2003}, ch. 2: critical velocity of about 0.5 m/s for liquid aluminium`,
);

/**
 * Speed of a free-falling stream after dropping `heightCm`, v = √(2gh), in
 * metres per second (the one non-centimetre output: velocities are quoted in
 * m/s throughout the gating literature).
 */
export function streamVelocity(heightCm: number): number {
  const h = requireNonNegative('heightCm', heightCm) / 100;
  return Math.sqrt(2 * STANDARD_GRAVITY * h);
}

/** The fall height at which a stream reaches `velocityMs`, h = v²/2g, in cm. */
export function fallHeightForVelocityCm(velocityMs: number): number {
  const v = requireNonNegative('velocityMs', velocityMs);
  return ((v * v) / (2 * STANDARD_GRAVITY)) * 100;
}

/**
 * Upward force of the metal on the cope, F = ρ·g·h·A, and the mass of
 * weights that balances it.
 * @param input.metalDensityGcm3 liquid density (aluminium ≈ 2.37)
 * @param input.headCm height of metal above the cope face (sprue top to parting line)
 * @param input.projectedAreaCm2 casting area projected on the parting plane
 */
export function copeLiftForce(input: {
  metalDensityGcm3: number;
  headCm: number;
  projectedAreaCm2: number;
}): { forceN: number; balancingMassG: number } {
  const rho = requirePositive('metalDensityGcm3', input.metalDensityGcm3) * 1000; // kg/m³
  const h = requireNonNegative('headCm', input.headCm) / 100;
  const area = requireNonNegative('projectedAreaCm2', input.projectedAreaCm2) / 10_000;
  const forceN = rho * STANDARD_GRAVITY * h * area;
  return { forceN, balancingMassG: (forceN / STANDARD_GRAVITY) * 1000 };
}
