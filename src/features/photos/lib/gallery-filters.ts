import { photoListQuerySchema, type PhotoIndexItem, type PhotoListQuery } from '#shared/photos/photo-schemas.ts';

// The gallery's view lives in the URL (?kind=gas_porosity&alloy=A356.0&q=…)
// so it can be shared. A value that does not parse is dropped, not an error:
// an old or hand-edited link still opens the gallery.

export const FILTER_KEYS = ['kind', 'alloy', 'mouldMaterial', 'casterId', 'from', 'to'] as const;
export type FilterKey = (typeof FILTER_KEYS)[number];
export type GalleryFilters = Partial<Pick<PhotoListQuery, FilterKey>>;
export type GalleryView = GalleryFilters & { q?: string };

export const SEARCH_MAX_LENGTH = 100;

/** The gallery view a URL's search params describe. */
export function parseGalleryView(params: URLSearchParams): GalleryView {
  const view: GalleryView = {};
  for (const key of FILTER_KEYS) {
    const raw = params.get(key);
    if (raw === null || raw.trim() === '') continue;
    const parsed = photoListQuerySchema.shape[key].safeParse(raw);
    if (parsed.success && parsed.data !== undefined) (view as Record<string, string>)[key] = parsed.data;
  }
  const q = params.get('q');
  if (q && q.trim()) view.q = q.slice(0, SEARCH_MAX_LENGTH);
  return view;
}

/** Search params for a gallery view, leaving out empty fields; other params are kept. */
export function galleryViewToParams(view: GalleryView, base = new URLSearchParams()): URLSearchParams {
  const next = new URLSearchParams(base);
  for (const key of [...FILTER_KEYS, 'q'] as const) {
    const value = view[key];
    if (value === undefined || value === '') next.delete(key);
    else next.set(key, value);
  }
  return next;
}

/** Just the server-side filters of a view (the search text is matched on the client). */
export function filtersOf(view: GalleryView): GalleryFilters {
  const filters: GalleryFilters = {};
  for (const key of FILTER_KEYS) if (view[key] !== undefined) (filters as Record<string, string>)[key] = view[key];
  return filters;
}

export function hasFilters(view: GalleryView): boolean {
  return FILTER_KEYS.some((key) => view[key] !== undefined);
}

/** Query string for GET /photos. */
export function listQueryString(filters: GalleryFilters & { cursor?: string; limit?: number; castingId?: string }): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  const text = params.toString();
  return text ? `?${text}` : '';
}

/**
 * Whether a photo-index record passes the filters, so a search shows the same
 * photos the server's list would. The index carries the caster's name, not
 * their id: `casterNames` maps ids to names (from the members list).
 */
export function matchesFilters(item: PhotoIndexItem, filters: GalleryFilters, casterNames: ReadonlyMap<string, string>): boolean {
  if (filters.kind && !item.kinds.includes(filters.kind)) return false;
  if (filters.alloy && item.alloy?.toLowerCase() !== filters.alloy.toLowerCase()) return false;
  if (filters.mouldMaterial && item.mouldMaterial !== filters.mouldMaterial) return false;
  if (filters.casterId) {
    const name = casterNames.get(filters.casterId);
    if (name !== undefined && item.casterName !== name) return false;
  }
  // The server compares the upload day in UTC; so does this.
  const day = item.createdAt.slice(0, 10);
  if (filters.from && day < filters.from) return false;
  if (filters.to && day > filters.to) return false;
  return true;
}
