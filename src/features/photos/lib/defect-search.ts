import Fuse from 'fuse.js';
import { DEFECT_GROUPS, DEFECT_KINDS, type DefectKind } from '#shared/domain/index.ts';

/**
 * Fuzzy search over the defect vocabulary for the picker: the trade name,
 * the short name on the label and the everyday words people use ("bubbles",
 * "divot"). Forgiving of misspellings: a casting class types on phones.
 */
const groupNames = new Map(DEFECT_GROUPS.map((g) => [g.id, g.name]));

type Searchable = DefectKind & { groupName: string };

const fuse = new Fuse<Searchable>(
  DEFECT_KINDS.map((k) => ({ ...k, groupName: groupNames.get(k.group) ?? k.group })),
  {
    keys: [
      { name: 'name', weight: 3 },
      { name: 'shortName', weight: 3 },
      { name: 'synonyms', weight: 2 },
      { name: 'groupName', weight: 1 },
      { name: 'recognise', weight: 0.4 },
    ],
    threshold: 0.4,
    ignoreLocation: true,
    ignoreDiacritics: true,
    includeScore: true,
  },
);

/** Defect kinds matching `query`, best first; every kind, in catalogue order, for an empty query. */
export function searchDefectKinds(query: string): readonly DefectKind[] {
  const q = query.trim();
  if (!q) return DEFECT_KINDS;
  return fuse.search(q).map((r) => DEFECT_KINDS.find((k) => k.id === r.item.id)!);
}
