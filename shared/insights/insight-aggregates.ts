import { CASTING_YIELD_SOURCE, DEFECT_GROUP_IDS, findDefectKind, median, pourYield } from '../domain/index.ts';
import type { DefectKindId } from '../domain/index.ts';
import type { Band, DefectFrequency, DefectRateByBand, RateKey, YieldTrend } from './insight-schemas.ts';

// The arithmetic behind the insights, kept pure so it is tested without a
// database. The server's repository hands over one row per casting or heat;
// these functions count.

/** The UTC calendar month of an ISO instant, "2026-11". */
export function monthOf(iso: string): string {
  return new Date(iso).toISOString().slice(0, 7);
}

/** Every month from `first` to `last` inclusive, so a quiet month shows as zero rather than vanishing. */
export function monthsBetween(first: string, last: string): string[] {
  const months: string[] = [];
  let [y, m] = first.split('-').map(Number);
  const [ly, lm] = last.split('-').map(Number);
  while (y < ly || (y === ly && m <= lm)) {
    months.push(`${y}-${String(m).padStart(2, '0')}`);
    m += 1;
    if (m > 12) {
      m = 1;
      y += 1;
    }
  }
  return months;
}

function monthSpan(months: Iterable<string>): string[] {
  const sorted = [...new Set(months)].sort();
  return sorted.length ? monthsBetween(sorted[0], sorted[sorted.length - 1]) : [];
}

/** Marks on a casting's photos, counted by defect kind. */
export type CastingMarks = { pouredAt: string; markCounts: Record<string, number> };

// A kind no longer in the vocabulary (renamed since it was marked) cannot be
// shown or linked to; it is left out rather than failing the whole chart.
const knownKind = (kind: string): kind is DefectKindId => findDefectKind(kind) !== undefined;

/**
 * Per month of pouring: the castings poured, and for each defect kind the
 * castings with at least one such mark and the number of marks.
 */
export function defectFrequencyOf(castings: readonly CastingMarks[]): DefectFrequency {
  const byMonth = new Map<string, { castings: number; kinds: Map<DefectKindId, { castings: number; marks: number }> }>();
  const totals = new Map<DefectKindId, number>();
  for (const c of castings) {
    const month = monthOf(c.pouredAt);
    const entry = byMonth.get(month) ?? { castings: 0, kinds: new Map() };
    entry.castings += 1;
    for (const [kind, marks] of Object.entries(c.markCounts)) {
      if (!knownKind(kind) || marks <= 0) continue;
      const k = entry.kinds.get(kind) ?? { castings: 0, marks: 0 };
      k.castings += 1;
      k.marks += marks;
      entry.kinds.set(kind, k);
      totals.set(kind, (totals.get(kind) ?? 0) + marks);
    }
    byMonth.set(month, entry);
  }
  const kinds = [...totals.entries()].sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0])).map(([k]) => k);
  return {
    months: monthSpan(byMonth.keys()).map((month) => {
      const entry = byMonth.get(month);
      return {
        month,
        castings: entry?.castings ?? 0,
        kinds: kinds.flatMap((kind) => {
          const k = entry?.kinds.get(kind);
          return k ? [{ kind, ...k }] : [];
        }),
      };
    }),
    kinds,
  };
}

/** The lower edge of the band holding `valueC`: 719 °C in 20 °C bands is the 700 band. */
export function bandStart(valueC: number, widthC: number): number {
  return Math.floor(valueC / widthC) * widthC;
}

/** One casting for a band chart: the banded value (null when not recorded) and the kinds marked on it. */
export type BandedCasting = { heatId: string; valueC: number | null; kinds: readonly string[] };

/**
 * Castings grouped into bands of `widthC`; per band the castings, their
 * heats, and the share with at least one mark of each defect group, or of
 * `kind` alone when given.
 */
export function defectRatesByBand(
  castings: readonly BandedCasting[],
  widthC: number,
  options: { kind?: DefectKindId; alloy?: string | null } = {},
): DefectRateByBand {
  const keys: RateKey[] = options.kind ? [options.kind] : [...DEFECT_GROUP_IDS];
  const keysOf = (kinds: readonly string[]): Set<RateKey> => {
    const found = new Set<RateKey>();
    for (const kind of kinds) {
      const known = findDefectKind(kind);
      if (!known) continue;
      if (options.kind) {
        if (known.id === options.kind) found.add(known.id);
      } else {
        found.add(known.group);
      }
    }
    return found;
  };
  const bands = new Map<number, { heats: Set<string>; castings: number; hits: Map<RateKey, number> }>();
  let unrecorded = 0;
  for (const c of castings) {
    if (c.valueC === null || !Number.isFinite(c.valueC)) {
      unrecorded += 1;
      continue;
    }
    const start = bandStart(c.valueC, widthC);
    const band = bands.get(start) ?? { heats: new Set(), castings: 0, hits: new Map() };
    band.heats.add(c.heatId);
    band.castings += 1;
    for (const key of keysOf(c.kinds)) band.hits.set(key, (band.hits.get(key) ?? 0) + 1);
    bands.set(start, band);
  }
  const out: Band[] = [...bands.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([fromC, b]) => ({
      fromC,
      toC: fromC + widthC,
      heats: b.heats.size,
      castings: b.castings,
      rates: keys.map((key) => {
        const hit = b.hits.get(key) ?? 0;
        return { key, castings: hit, share: hit / b.castings };
      }),
    }));
  return {
    alloy: options.alloy ?? null,
    bandWidthC: widthC,
    by: options.kind ? 'kind' : 'group',
    keys,
    bands: out,
    unrecorded: { castings: unrecorded },
  };
}

/** One heat's masses for the yield trend. */
export type HeatMasses = { pouredAt: string; chargeG: number; castingCount: number; weighedCount: number; castingsG: number };

/**
 * Per month of pouring: the median and mean casting yield of the heats whose
 * castings are all weighed, each heat's yield by the trade core's pourYield
 * (castings ÷ metal poured). Heats without castings, with an unweighed
 * casting or without a charge are counted as excluded.
 */
export function yieldTrendOf(heats: readonly HeatMasses[]): YieldTrend {
  const byMonth = new Map<string, number[]>();
  let excluded = 0;
  for (const h of heats) {
    const complete = h.castingCount > 0 && h.weighedCount === h.castingCount && h.chargeG > 0 && h.castingsG <= h.chargeG;
    if (!complete) {
      excluded += 1;
      continue;
    }
    const month = monthOf(h.pouredAt);
    const yields = byMonth.get(month) ?? [];
    yields.push(pourYield({ chargeG: h.chargeG, castingG: h.castingsG }).yieldPct);
    byMonth.set(month, yields);
  }
  return {
    months: monthSpan(byMonth.keys()).map((month) => {
      const yields = byMonth.get(month) ?? [];
      return {
        month,
        heats: yields.length,
        medianPct: yields.length ? median(yields) : null,
        meanPct: yields.length ? yields.reduce((a, b) => a + b, 0) / yields.length : null,
      };
    }),
    excluded,
    source: CASTING_YIELD_SOURCE.citation,
  };
}
