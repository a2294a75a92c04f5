import { z } from 'zod';
import { defectKindIdSchema, type DefectKindId } from '#shared/domain/index.ts';
import { alloyDesignationSchema, calendarDateSchema } from '#shared/heats/equipment-schemas.ts';
import { paths } from '#src/config/paths.ts';

// The insights' filters live in the URL (?from=2026-09-01&alloy=A356.0&kind=misrun)
// so a view can be shared with a mentor. A value that does not parse is
// dropped, as the gallery does: an old or hand-edited link still opens.

export type InsightView = { from?: string; to?: string; casterId?: string; alloy?: string; kind?: DefectKindId };
export const VIEW_KEYS = ['from', 'to', 'casterId', 'alloy', 'kind'] as const;

const FIELD_SCHEMAS: Record<(typeof VIEW_KEYS)[number], z.ZodType<string>> = {
  from: calendarDateSchema,
  to: calendarDateSchema,
  casterId: z.uuid(),
  alloy: alloyDesignationSchema,
  kind: defectKindIdSchema,
};

export function parseInsightView(params: URLSearchParams): InsightView {
  const view: Record<string, string> = {};
  for (const key of VIEW_KEYS) {
    const raw = params.get(key);
    if (!raw || !raw.trim()) continue;
    const parsed = FIELD_SCHEMAS[key].safeParse(raw);
    if (parsed.success) view[key] = parsed.data;
  }
  // Dates the wrong way round would be refused by the server; the later one wins as "to".
  if (view.from && view.to && view.from > view.to) delete view.to;
  return view as InsightView;
}

/** Search params for a view, leaving out empty fields and keeping unrelated ones. */
export function viewToParams(view: InsightView, base = new URLSearchParams()): URLSearchParams {
  const next = new URLSearchParams(base);
  for (const key of VIEW_KEYS) {
    const value = view[key];
    if (value) next.set(key, value);
    else next.delete(key);
  }
  return next;
}

/** "?a=1&b=2" from the given values, empty ones left out. */
export function queryString(params: Record<string, string | undefined>): string {
  const search = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== '') search.set(k, v);
  const text = search.toString();
  return text ? `?${text}` : '';
}

/** The first and last day of a month ("2026-02" → 2026-02-01 … 2026-02-28), as the filters take them. */
export function monthRange(month: string): { from: string; to: string } {
  const [y, m] = month.split('-').map(Number);
  const last = new Date(Date.UTC(y, m, 0)).getUTCDate();
  return { from: `${month}-01`, to: `${month}-${String(last).padStart(2, '0')}` };
}

/** A month's range narrowed to the view's own dates, so a link never shows more than the chart counted. */
export function monthWithin(month: string, view: InsightView): { from: string; to: string } {
  const r = monthRange(month);
  return { from: view.from && view.from > r.from ? view.from : r.from, to: view.to && view.to < r.to ? view.to : r.to };
}

/** The UTC day of an instant, "2026-11-30". */
export const dayOf = (iso: string) => new Date(iso).toISOString().slice(0, 10);

/** The gallery, filtered (it matches photos by kind, alloy, caster and upload day). */
export function galleryHref(workshopId: string, f: { kind?: string; from?: string; to?: string; alloy?: string; casterId?: string }) {
  return `${paths.gallery.getHref(workshopId)}${queryString(f)}`;
}

/** The heat log, filtered by the same fields the insights count by. */
export function heatsHref(
  workshopId: string,
  f: { alloy?: string; from?: string; to?: string; casterId?: string; crucibleId?: string; furnaceId?: string },
) {
  return `${paths.heats.getHref(workshopId)}${queryString(f)}`;
}

/** "Sep 2026" for a month key. */
export function formatMonth(month: string): string {
  const [y, m] = month.split('-').map(Number);
  return new Intl.DateTimeFormat(undefined, { month: 'short', year: 'numeric', timeZone: 'UTC' }).format(new Date(Date.UTC(y, m - 1, 1)));
}
