// Marks are stored in fractions of the photo (0..1 of its width and
// height), so they scale with the image at any size and zoom. These helpers
// turn pointer positions on screen into that box and back. Pure: no DOM.

export type Point = { x: number; y: number };
export type Size = { width: number; height: number };
/** Where the photo sits on screen (getBoundingClientRect), zoom included. */
export type ScreenRect = { left: number; top: number; width: number; height: number };

export type PointGeometry = { shape: 'point'; x: number; y: number };
export type BoxGeometry = { shape: 'box'; x: number; y: number; width: number; height: number };
export type MarkGeometry = PointGeometry | BoxGeometry;

/**
 * A press that moves less than this many screen pixels is a tap, not a drag:
 * a gloved thumb wobbles when it lifts.
 */
export const TAP_SLOP_PX = 12;
/** A dragged box is at least this many screen pixels each way, so it stays a target. */
export const MIN_BOX_PX = 24;

export const clamp01 = (v: number) => Math.min(1, Math.max(0, v));

/** A screen position as a fraction of the photo, kept inside it. */
export function toFraction(client: Point, rect: ScreenRect): Point {
  if (rect.width <= 0 || rect.height <= 0) return { x: 0.5, y: 0.5 };
  return { x: clamp01((client.x - rect.left) / rect.width), y: clamp01((client.y - rect.top) / rect.height) };
}

/** A fraction of the photo as pixels of an image of `size`. */
export function fractionToPixel(fraction: Point, size: Size): Point {
  return { x: fraction.x * size.width, y: fraction.y * size.height };
}

/** Pixels of an image of `size` as a fraction of it, kept inside. */
export function pixelToFraction(pixel: Point, size: Size): Point {
  if (size.width <= 0 || size.height <= 0) return { x: 0.5, y: 0.5 };
  return { x: clamp01(pixel.x / size.width), y: clamp01(pixel.y / size.height) };
}

/**
 * What a press from `start` to `end` (screen pixels) on the photo at `rect`
 * marks: a point when it barely moved, otherwise a box in fractions, grown to
 * the minimum size around its centre and kept inside the photo.
 */
export function markFromDrag(
  start: Point,
  end: Point,
  rect: ScreenRect,
  { tapSlopPx = TAP_SLOP_PX, minBoxPx = MIN_BOX_PX }: { tapSlopPx?: number; minBoxPx?: number } = {},
): MarkGeometry {
  const dx = end.x - start.x;
  const dy = end.y - start.y;
  if (Math.hypot(dx, dy) < tapSlopPx) {
    const p = toFraction(start, rect);
    return { shape: 'point', x: p.x, y: p.y };
  }
  const a = toFraction(start, rect);
  const b = toFraction(end, rect);
  const minW = rect.width > 0 ? Math.min(1, minBoxPx / rect.width) : 0;
  const minH = rect.height > 0 ? Math.min(1, minBoxPx / rect.height) : 0;
  const [x, width] = growSpan(Math.min(a.x, b.x), Math.abs(a.x - b.x), minW);
  const [y, height] = growSpan(Math.min(a.y, b.y), Math.abs(a.y - b.y), minH);
  return { shape: 'box', x, y, width, height };
}

/** Widens [start, start+length] to at least `min` about its centre, inside 0..1. */
function growSpan(start: number, length: number, min: number): [number, number] {
  if (length >= min) return [start, length];
  const centre = start + length / 2;
  const from = Math.min(Math.max(0, centre - min / 2), 1 - min);
  return [from, min];
}

/** The middle of a mark, in fractions: where its label anchors and the view centres. */
export function markCentre(m: { shape: 'point' | 'box'; x: number; y: number; width?: number | null; height?: number | null }): Point {
  if (m.shape === 'box') return { x: m.x + (m.width ?? 0) / 2, y: m.y + (m.height ?? 0) / 2 };
  return { x: m.x, y: m.y };
}

/** Moves a keyboard cursor by a step, in fractions, staying on the photo. */
export function nudge(p: Point, key: string, step: number): Point | null {
  switch (key) {
    case 'ArrowLeft':
      return { x: clamp01(p.x - step), y: p.y };
    case 'ArrowRight':
      return { x: clamp01(p.x + step), y: p.y };
    case 'ArrowUp':
      return { x: p.x, y: clamp01(p.y - step) };
    case 'ArrowDown':
      return { x: p.x, y: clamp01(p.y + step) };
    default:
      return null;
  }
}
