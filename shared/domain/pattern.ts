import { requireFinite, requireInRange, requirePositive } from './errors.ts';
import { PUBLICATIONS, primary } from './sources.ts';
import type { SourceNote } from './sources.ts';

/**
 * Pattern size for a wanted casting size: the pattern is made larger by the
 * linear shrink allowance, pattern = casting × (1 + shrink/100).
 * @param input.castingMm finished casting dimension, mm
 * @param input.shrinkPct patternmaker's linear allowance, %
 */
export function patternDimension(input: { castingMm: number; shrinkPct: number }): number {
  const castingMm = requirePositive('castingMm', input.castingMm);
  const shrinkPct = requireInRange('shrinkPct', input.shrinkPct, { min: 0, max: 10 });
  return castingMm * (1 + shrinkPct / 100);
}

/** A shrink rule in inches per foot (how patternmakers' rules are sold) as a percentage. */
export function shrinkPctFromInchesPerFoot(inchesPerFoot: number): number {
  return (requireFinite('inchesPerFoot', inchesPerFoot) / 12) * 100;
}

/** The shrink rules patternmakers buy, in inches per foot. */
export const SHRINK_RULES = [
  { label: '3/32 in/ft', inchesPerFoot: 3 / 32 },
  { label: '1/8 in/ft', inchesPerFoot: 1 / 8 },
  { label: '5/32 in/ft', inchesPerFoot: 5 / 32 },
  { label: '3/16 in/ft', inchesPerFoot: 3 / 16 },
  { label: '7/32 in/ft', inchesPerFoot: 7 / 32 },
  { label: '1/4 in/ft', inchesPerFoot: 1 / 4 },
] as const;

export type ShopTextAllowance = { metal: string; inchesPerFoot: number; source: SourceNote };

/**
 * Allowances printed in two early shop texts. They disagree (cast iron 3/32
 * against 1/8 in/ft), which is why the app stores an allowance per user and
 * alloy and flags these as defaults only.
 */
export const SHOP_TEXT_ALLOWANCES: readonly ShopTextAllowance[] = [
  { metal: 'aluminium', inchesPerFoot: 7 / 32, source: primary(PUBLICATIONS.dooley) },
  { metal: 'cast iron', inchesPerFoot: 3 / 32, source: primary(PUBLICATIONS.dooley) },
  { metal: 'brass', inchesPerFoot: 3 / 16, source: primary(PUBLICATIONS.dooley) },
  { metal: 'bronze', inchesPerFoot: 5 / 32, source: primary(PUBLICATIONS.dooley) },
  { metal: 'zinc', inchesPerFoot: 7 / 32, source: primary(PUBLICATIONS.dooley) },
  { metal: 'cast iron', inchesPerFoot: 1 / 8, source: primary(PUBLICATIONS.shopPractice2) },
  { metal: 'brass', inchesPerFoot: 3 / 16, source: primary(PUBLICATIONS.shopPractice2) },
];
