import { alloySchema, findAlloy } from '../domain/index.ts';
import type { Alloy, AlloySources } from '../domain/index.ts';
import type { WorkshopAlloyCreateInput, WorkshopAlloyUpdateInput } from './alloy-schemas.ts';

type Changes = Omit<WorkshopAlloyUpdateInput, 'designation' | 'source'>;

/**
 * Which citation of `Alloy.sources` vouches for each value. When a workshop
 * overrides a value copied from a library alloy, that citation no longer
 * applies and is dropped: the workshop's own note speaks for it instead.
 */
const SOURCE_OF = {
  solidusC: 'solidusLiquidus',
  liquidusC: 'solidusLiquidus',
  pourRangeC: 'pourRange',
  densityGcm3: 'density',
  volumetricShrinkagePct: 'volumetricShrinkage',
  patternShrinkPct: 'patternShrink',
  traits: 'traits',
} as const satisfies Partial<Record<keyof Changes, keyof AlloySources>>;

function applyChanges(start: Record<string, unknown>, changes: Changes): Record<string, unknown> {
  const next: Record<string, unknown> = { ...start };
  const sources: AlloySources = { ...((start.sources as AlloySources | undefined) ?? {}) };
  for (const [key, value] of Object.entries(changes) as [keyof Changes, unknown][]) {
    if (value === undefined) continue;
    if (key === 'pourRangeC') {
      const merged: Record<string, unknown> = { ...((start.pourRangeC as object | undefined) ?? {}) };
      for (const [mould, range] of Object.entries(value as Record<string, unknown>)) {
        if (range === undefined) continue;
        if (range === null) delete merged[mould];
        else merged[mould] = range;
      }
      next.pourRangeC = merged;
    } else if (value === null) {
      delete next[key];
    } else {
      next[key] = value;
    }
    const sourceKey = (SOURCE_OF as Partial<Record<keyof Changes, keyof AlloySources>>)[key];
    if (sourceKey) delete sources[sourceKey];
  }
  next.sources = sources;
  return next;
}

/**
 * A new workshop alloy from its form: the base library alloy's values and
 * citations (when `basedOn` names one), then the workshop's own values on
 * top. Throws a ZodError naming the fields when the result is not a sound
 * alloy (solidus above liquidus, a pouring range below the liquidus...).
 */
export function composeWorkshopAlloy(input: WorkshopAlloyCreateInput): Alloy {
  const { designation, basedOn, source, commonName, ...changes } = input;
  const base = basedOn ? findAlloy(basedOn) : undefined;
  const start: Record<string, unknown> = base
    ? { ...base, aliases: [], basedOn: base.designation, commonName: `${designation} (assumed ${base.designation})` }
    : { commonName: designation };
  return alloySchema.parse({
    ...applyChanges(start, changes),
    designation,
    ...(commonName ? { commonName } : {}),
    source,
  });
}

/**
 * A stored workshop alloy after an edit. Values left out stay; `null` clears
 * an optional one. Throws a ZodError naming the fields when the result is
 * not a sound alloy.
 */
export function updateWorkshopAlloy(current: Alloy, input: WorkshopAlloyUpdateInput): Alloy {
  const { designation, source, ...changes } = input;
  return alloySchema.parse({
    ...applyChanges(current as unknown as Record<string, unknown>, changes),
    ...(designation ? { designation } : {}),
    ...(source ? { source } : {}),
  });
}
