import Fuse from 'fuse.js';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import { designationKey, type Alloy } from '#shared/domain/index.ts';

// The alloy library's table logic, free of React so it is tested alone:
// which value each column sorts by, and the fuzzy search over the rows.

export const ALLOY_SORT_KEYS = [
  'designation',
  'family',
  'solidus',
  'liquidus',
  'pourSand',
  'pourPermanentMould',
  'density',
  'shrinkage',
  'pattern',
] as const;
export type AlloySortKey = (typeof ALLOY_SORT_KEYS)[number];
export type SortDirection = 'ascending' | 'descending';
export type AlloySort = { key: AlloySortKey; direction: SortDirection };

/** The value a column sorts by: °C, g/cm³ and % (the unit shown does not change the order). */
export function sortValueOf(alloy: Alloy, key: AlloySortKey): string | number | undefined {
  switch (key) {
    case 'designation':
      return alloy.designation;
    case 'family':
      return alloy.family;
    case 'solidus':
      return alloy.solidusC;
    case 'liquidus':
      return alloy.liquidusC;
    case 'pourSand':
      return alloy.pourRangeC.sand?.min;
    case 'pourPermanentMould':
      return alloy.pourRangeC.permanentMould?.min;
    case 'density':
      return alloy.densityGcm3;
    case 'shrinkage':
      return alloy.volumetricShrinkagePct?.min;
    case 'pattern':
      return alloy.patternShrinkPct;
  }
}

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/**
 * Rows in column order. Alloys without the value (no permanent-mould range,
 * no published shrinkage) go last in either direction: "unknown" is not
 * smaller than every number. Ties keep the designation order.
 */
export function sortAlloyEntries(entries: readonly AlloyEntry[], sort: AlloySort): AlloyEntry[] {
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return [...entries].sort((a, b) => {
    const va = sortValueOf(a.alloy, sort.key);
    const vb = sortValueOf(b.alloy, sort.key);
    if (va === undefined && vb === undefined) return collator.compare(a.alloy.designation, b.alloy.designation);
    if (va === undefined) return 1;
    if (vb === undefined) return -1;
    const order = typeof va === 'number' && typeof vb === 'number' ? va - vb : collator.compare(String(va), String(vb));
    return order !== 0 ? sign * order : collator.compare(a.alloy.designation, b.alloy.designation);
  });
}

type Searchable = {
  index: number;
  designation: string;
  folded: string;
  aliases: string[];
  commonName: string;
  family: string;
  basedOn: string;
  source: string;
};

/**
 * The fuzzy index over the rows: designation (also folded, so "a356" finds
 * "A356.0" and "za27" finds "ZA-27"), aliases, common name, family, the base
 * of a workshop alloy and its note.
 */
export function buildAlloyIndex(entries: readonly AlloyEntry[]): Fuse<Searchable> {
  const docs = entries.map((e, index): Searchable => ({
    index,
    designation: e.alloy.designation,
    folded: designationKey(e.alloy.designation),
    aliases: [...e.alloy.aliases, ...e.alloy.aliases.map(designationKey)],
    commonName: e.alloy.commonName,
    family: e.alloy.family,
    basedOn: e.alloy.basedOn ?? '',
    source: e.alloy.source ?? '',
  }));
  return new Fuse(docs, {
    keys: [
      { name: 'designation', weight: 3 },
      { name: 'folded', weight: 3 },
      { name: 'aliases', weight: 2.5 },
      { name: 'commonName', weight: 1.5 },
      { name: 'family', weight: 1 },
      { name: 'basedOn', weight: 1 },
      { name: 'source', weight: 0.4 },
    ],
    threshold: 0.35,
    ignoreLocation: true,
    ignoreDiacritics: true,
  });
}

/** Rows matching `query`, best first; every row, as given, for an empty query. */
export function searchAlloyEntries(entries: readonly AlloyEntry[], query: string, index = buildAlloyIndex(entries)): AlloyEntry[] {
  const q = query.trim();
  if (!q) return [...entries];
  return index.search(q).map((r) => entries[r.item.index]);
}
