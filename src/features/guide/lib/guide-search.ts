import Fuse from 'fuse.js';
import { DEFECT_GROUPS, DEFECT_KINDS, type DefectGroup, type DefectKind } from '#shared/domain/index.ts';

// The defect guide's search. Casters type what they see ("bubbles",
// "divot"), misspell on a phone ("bubbels"), or run words together
// ("coldshut"); the trade core's vocabulary (names, label names, everyday
// words, descriptions) is indexed so all of these land on the right page.

type GuideDoc = {
  id: DefectKind['id'];
  name: string;
  shortName: string;
  synonyms: readonly string[];
  /** Names and everyday words with spaces, hyphens and brackets squeezed out: "coldshut", "hottear". */
  squeezed: string[];
  groupName: string;
  recognise: string;
  where: string;
  /**
   * The everyday words of the other kinds in the same group, at a low weight:
   * someone who says "bubbles" may be looking at pinholes, which the
   * vocabulary describes only as "tiny holes".
   */
  groupWords: string[];
};

const squeeze = (text: string) => text.toLowerCase().replace(/[^a-z0-9]+/g, '');

/** The words inside the brackets of a trade name: "Cold shut (cold lap)" → ["cold lap"]. */
const bracketed = (name: string) => [...name.matchAll(/\(([^)]*)\)/g)].map((m) => m[1]);

/** Key weights: names first, everyday words next, descriptions last (they mention many things in passing). */
export const GUIDE_SEARCH_KEYS = [
  { name: 'name', weight: 3 },
  { name: 'shortName', weight: 3 },
  { name: 'synonyms', weight: 2.5 },
  { name: 'squeezed', weight: 2 },
  { name: 'groupName', weight: 1 },
  { name: 'recognise', weight: 0.6 },
  { name: 'groupWords', weight: 0.5 },
  { name: 'where', weight: 0.3 },
] as const;

export type GuideIndex = { fuse: Fuse<GuideDoc>; kinds: readonly DefectKind[] };

/**
 * Builds the search index over the defect kinds. Pure: the same kinds give
 * the same index, so it is built once per page and tested on its own.
 * The threshold (0.3) lets one or two wrong letters in a short word pass
 * ("bubbels", "porosty") without matching everything.
 */
export function buildGuideIndex(
  kinds: readonly DefectKind[] = DEFECT_KINDS,
  groups: readonly DefectGroup[] = DEFECT_GROUPS,
): GuideIndex {
  const groupNames = new Map(groups.map((g) => [g.id, g.name]));
  const docs = kinds.map(
    (k): GuideDoc => ({
      id: k.id,
      name: k.name,
      shortName: k.shortName,
      synonyms: k.synonyms,
      squeezed: [...new Set([k.name.replace(/\([^)]*\)/g, ''), ...bracketed(k.name), k.shortName, ...k.synonyms].map(squeeze))],
      groupName: groupNames.get(k.group) ?? k.group,
      recognise: k.recognise,
      where: k.where,
      groupWords: kinds.filter((o) => o.group === k.group && o.id !== k.id).flatMap((o) => o.synonyms),
    }),
  );
  const fuse = new Fuse(docs, {
    keys: GUIDE_SEARCH_KEYS.map((k) => ({ ...k })),
    threshold: 0.3,
    ignoreLocation: true,
    ignoreDiacritics: true,
    minMatchCharLength: 2,
  });
  return { fuse, kinds };
}

/** Defect kinds matching `query`, best first; every kind in catalogue order for an empty query. */
export function searchGuide(index: GuideIndex, query: string): DefectKind[] {
  const q = query.trim();
  if (!q) return [...index.kinds];
  const byId = new Map(index.kinds.map((k) => [k.id, k]));
  return index.fuse.search(q).map((r) => byId.get(r.item.id)!);
}
