import Fuse from 'fuse.js';
import { DEFECT_GROUPS, MOLD_MATERIAL_LABELS, findDefectKind, type MoldMaterial } from '#shared/domain/index.ts';
import type { PhotoIndexItem } from '#shared/photos/photo-schemas.ts';

type Searchable = {
  item: PhotoIndexItem;
  title: string;
  notes: string;
  alloy: string;
  casterName: string;
  mould: string;
  /** Names and short names of the marked defect kinds, and their groups. */
  defects: string[];
};

const groupNames = new Map(DEFECT_GROUPS.map((g) => [g.id, g.name]));

function toSearchable(item: PhotoIndexItem): Searchable {
  const defects = new Set<string>();
  for (const id of item.kinds) {
    const kind = findDefectKind(id);
    if (!kind) continue;
    defects.add(kind.name);
    defects.add(kind.shortName);
    defects.add(groupNames.get(kind.group) ?? kind.group);
  }
  return {
    item,
    title: item.title ?? '',
    notes: item.notes ?? '',
    alloy: item.alloy ?? '',
    casterName: item.casterName ?? '',
    mould: item.mouldMaterial ? (MOLD_MATERIAL_LABELS[item.mouldMaterial as MoldMaterial] ?? item.mouldMaterial) : '',
    defects: [...defects],
  };
}

/**
 * A fuzzy searcher over the workshop's photo index: title, marked defects,
 * alloy, caster, mould and notes. Misspellings ("gass porosty") still find.
 */
export function createPhotoSearch(items: readonly PhotoIndexItem[]) {
  const fuse = new Fuse(items.map(toSearchable), {
    keys: [
      { name: 'title', weight: 3 },
      { name: 'defects', weight: 2.5 },
      { name: 'alloy', weight: 1.5 },
      { name: 'casterName', weight: 1.5 },
      { name: 'mould', weight: 1 },
      { name: 'notes', weight: 1 },
    ],
    threshold: 0.4,
    ignoreLocation: true,
    ignoreDiacritics: true,
  });
  return (query: string): PhotoIndexItem[] => {
    const q = query.trim();
    if (!q) return [...items];
    return fuse.search(q).map((r) => r.item.item);
  };
}
