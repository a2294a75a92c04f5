import type { SourceNote } from '../domain/index.ts';

export const CRUCIBLE_MATERIALS = ['clay_graphite', 'silicon_carbide', 'steel', 'ceramic', 'other'] as const;
export type CrucibleMaterial = (typeof CRUCIBLE_MATERIALS)[number];
export const CRUCIBLE_MATERIAL_LABELS: Record<CrucibleMaterial, string> = {
  clay_graphite: 'clay-graphite',
  silicon_carbide: 'silicon carbide',
  steel: 'steel',
  ceramic: 'ceramic',
  other: 'other',
};

export const CRUCIBLE_STATUSES = ['ok', 'near-limit', 'past-limit', 'retired'] as const;
export type CrucibleStatus = (typeof CRUCIBLE_STATUSES)[number];

export type CrucibleCycleLimits = { warnAt: number; limitAt: number };

/**
 * A clay-graphite crucible heated and cooled quickly, heat after heat, can be
 * badly degraded after about 20 cycles, so we warn at 15 and call 20 the
 * limit. The same figures stand for every material until a workshop sets its
 * own: warning too early is the safe mistake with a pot of molten metal.
 */
export const DEFAULT_CRUCIBLE_CYCLE_LIMITS: CrucibleCycleLimits = { warnAt: 15, limitAt: 20 };
export const DEFAULT_CRUCIBLE_CYCLE_LIMITS_SOURCE: SourceNote = {
  citation: 'common practice: a clay-graphite crucible heated and cooled quickly can be badly degraded after about 20 cycles',
  grade: 'practice',
};

/** The workshop's limits for a material, or the defaults when it set none. */
export function cycleLimitsFor(
  material: CrucibleMaterial,
  workshopLimits: readonly ({ material: CrucibleMaterial } & CrucibleCycleLimits)[],
): CrucibleCycleLimits & { isDefault: boolean } {
  const own = workshopLimits.find((l) => l.material === material);
  return own
    ? { warnAt: own.warnAt, limitAt: own.limitAt, isDefault: false }
    : { ...DEFAULT_CRUCIBLE_CYCLE_LIMITS, isDefault: true };
}

/**
 * Where a crucible stands: retired wins; reaching the limit counts as past it
 * (the next heat would be beyond it), reaching the warning as near it.
 */
export function crucibleStatusOf(
  crucible: { cycleCount: number; retired: boolean },
  limits: CrucibleCycleLimits,
): CrucibleStatus {
  if (crucible.retired) return 'retired';
  if (crucible.cycleCount >= limits.limitAt) return 'past-limit';
  if (crucible.cycleCount >= limits.warnAt) return 'near-limit';
  return 'ok';
}
