import { describe, expect, test } from 'vitest';
import { fractionToPixel, markCentre, markFromDrag, MIN_BOX_PX, nudge, pixelToFraction, TAP_SLOP_PX, toFraction } from './mark-geometry.ts';

// A photo shown 800 × 600 px on screen, its top-left corner at (100, 50).
const rect = { left: 100, top: 50, width: 800, height: 600 };

describe('toFraction and fractionToPixel', () => {
  test('when a screen point is inside the photo, then it becomes its fraction of the width and height', () => {
    expect(toFraction({ x: 500, y: 200 }, rect)).toEqual({ x: 0.5, y: 0.25 });
  });

  test('when a screen point is outside the photo, then it is kept on its edge', () => {
    expect(toFraction({ x: 50, y: 900 }, rect)).toEqual({ x: 0, y: 1 });
  });

  test('when a fraction goes to pixels and back, then it is the same fraction', () => {
    const size = { width: 1600, height: 1200 };
    const pixel = fractionToPixel({ x: 0.3125, y: 0.75 }, size);
    expect(pixel).toEqual({ x: 500, y: 900 });
    expect(pixelToFraction(pixel, size)).toEqual({ x: 0.3125, y: 0.75 });
  });

  test('when the photo is zoomed (a larger rect on screen), then the same spot gives the same fraction', () => {
    const zoomed = { left: -700, top: -550, width: 2400, height: 1800 }; // 3× about the centre
    expect(toFraction({ x: 500, y: 350 }, zoomed)).toEqual(toFraction({ x: 500, y: 350 }, rect));
  });
});

describe('markFromDrag', () => {
  test('when the press barely moves (a wobbly thumb), then it marks a point where it started', () => {
    const mark = markFromDrag({ x: 300, y: 350 }, { x: 300 + TAP_SLOP_PX - 3, y: 352 }, rect);
    expect(mark).toEqual({ shape: 'point', x: 0.25, y: 0.5 });
  });

  test('when the press drags, then it marks the box between start and end, in either direction', () => {
    const mark = markFromDrag({ x: 500, y: 350 }, { x: 300, y: 200 }, rect);
    expect(mark.shape).toBe('box');
    if (mark.shape !== 'box') return;
    expect(mark.x).toBeCloseTo(0.25);
    expect(mark.y).toBeCloseTo(0.25);
    expect(mark.width).toBeCloseTo(0.25);
    expect(mark.height).toBeCloseTo(0.25);
  });

  test('when a drag is long but thin, then the box grows to the minimum size about its centre', () => {
    const mark = markFromDrag({ x: 300, y: 350 }, { x: 500, y: 352 }, rect);
    if (mark.shape !== 'box') throw new Error('expected a box');
    expect(mark.height * rect.height).toBeCloseTo(MIN_BOX_PX);
    expect(mark.y + mark.height / 2).toBeCloseTo((351 - rect.top) / rect.height);
    expect(mark.width).toBeCloseTo(0.25);
  });

  test('when a drag runs past the edge of the photo, then the box stops at the edge', () => {
    const mark = markFromDrag({ x: 700, y: 500 }, { x: 1200, y: 900 }, rect);
    if (mark.shape !== 'box') throw new Error('expected a box');
    expect(mark.x + mark.width).toBeCloseTo(1);
    expect(mark.y + mark.height).toBeCloseTo(1);
  });

  test('when a minimum-size box sits in a corner, then it stays inside the photo', () => {
    const mark = markFromDrag({ x: 100, y: 50 }, { x: 115, y: 60 }, rect, { tapSlopPx: 5 });
    if (mark.shape !== 'box') throw new Error('expected a box');
    expect(mark.x).toBe(0);
    expect(mark.y).toBe(0);
    expect(mark.width * rect.width).toBeCloseTo(MIN_BOX_PX);
  });
});

describe('markCentre and nudge', () => {
  test('when a mark is a box, then its centre is the middle of the box', () => {
    const centre = markCentre({ shape: 'box', x: 0.2, y: 0.4, width: 0.2, height: 0.2 });
    expect(centre.x).toBeCloseTo(0.3);
    expect(centre.y).toBeCloseTo(0.5);
  });

  test('when the keyboard cross moves past an edge, then it stays on the photo', () => {
    expect(nudge({ x: 0.99, y: 0.5 }, 'ArrowRight', 0.02)).toEqual({ x: 1, y: 0.5 });
    expect(nudge({ x: 0.5, y: 0.01 }, 'ArrowUp', 0.02)).toEqual({ x: 0.5, y: 0 });
    expect(nudge({ x: 0.5, y: 0.5 }, 'a', 0.02)).toBeNull();
  });
});
