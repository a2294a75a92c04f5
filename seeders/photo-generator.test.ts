import sharp from 'sharp';
import { describe, expect, test } from 'vitest';
import { DEMO_LOG_SEED, buildDemoLog } from './demo-log.ts';
import { DRAWABLE_KINDS, drawPiecePhoto, rng } from './photo-generator.ts';

describe('drawPiecePhoto', () => {
  test('when drawn twice from one seed, then the photo and its marks are the same', async () => {
    const opts = { seed: 42, shape: 'bar-ingot' as const, defects: [{ kind: 'gas_porosity' as const, severity: 2 as const }] };
    const [a, b] = [await drawPiecePhoto(opts), await drawPiecePhoto(opts)];
    expect(a.jpeg.equals(b.jpeg)).toBe(true);
    expect(a.marks).toEqual(b.marks);
  });

  test.each(DRAWABLE_KINDS)('when asked for %s, then it is a real JPEG with one mark inside the frame', async (kind) => {
    const photo = await drawPiecePhoto({ seed: 7, shape: 'plate', defects: [{ kind, severity: 2 }] });
    const meta = await sharp(photo.jpeg).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', photo.width, photo.height]);
    expect(photo.marks).toHaveLength(1);
    const [m] = photo.marks;
    expect(m.kind).toBe(kind);
    for (const v of [m.x, m.y]) expect(v).toBeGreaterThanOrEqual(0);
    expect(m.x + (m.width ?? 0)).toBeLessThanOrEqual(1);
    expect(m.y + (m.height ?? 0)).toBeLessThanOrEqual(1);
  });
});

describe('buildDemoLog', () => {
  test('when built, then it holds 60 or more heats over four months, and no casting outweighs its charge', () => {
    const log = buildDemoLog(rng(DEMO_LOG_SEED));
    expect(log.length).toBeGreaterThanOrEqual(60);
    const months = new Set(log.map((h) => h.pouredAt.getUTCMonth()));
    expect(months.size).toBeGreaterThanOrEqual(4);
    for (const h of log) {
      const charged = h.chargeLines.reduce((n, l) => n + l.massG, 0);
      const out = h.castings.reduce((n, c) => n + c.massG, 0) + h.remainderG;
      expect(out).toBeLessThanOrEqual(charged);
    }
  });

  test('when a student pours hot without degassing, then the log says gas; cold winter moulds say rounded edges', () => {
    const log = buildDemoLog(rng(DEMO_LOG_SEED));
    const jonah = log.filter((h) => h.caster.startsWith('jonah'));
    expect(jonah.every((h) => h.pourTempC >= 775)).toBe(true);
    const samWinter = log.filter((h) => h.caster.startsWith('sam') && h.pouredAt.getUTCMonth() >= 9);
    expect(samWinter.some((h) => h.castings[0].defects.some((d) => d.kind === 'rounded_edges'))).toBe(true);
  });
});
