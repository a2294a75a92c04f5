import { readFileSync } from 'node:fs';
import sharp from 'sharp';
import { describe, expect, test } from 'vitest';
import { ingotPhoto, jpegRotated, jpegWithGps, pngClaiming, svgWithScript } from '../../../tests/support/images.ts';
import { DISPLAY_MAX_PX, ImageRejected, processImage, THUMB_MAX_PX } from './image-pipeline.ts';

const LIMIT = { maxPixels: 100_000_000 };

describe('processImage', () => {
  test('when a JPEG carries GPS EXIF, then no stored variant carries any EXIF, and the capture time is kept', async () => {
    const input = await jpegWithGps();
    expect((await sharp(input).metadata()).exif).toBeDefined();

    const out = await processImage(input, LIMIT);

    for (const v of out.variants) {
      const meta = await sharp(v.body).metadata();
      expect(meta.exif, v.kind).toBeUndefined();
      expect(meta.xmp, v.kind).toBeUndefined();
      expect(v.body.includes(Buffer.from('GPS')), v.kind).toBe(false);
    }
    expect(out.capturedAt?.toISOString().slice(0, 10)).toBe('2026-11-19');
  });

  test('when EXIF says rotate 90°, then every variant is stored upright (portrait)', async () => {
    const out = await processImage(await jpegRotated(300, 200), LIMIT);
    for (const v of out.variants) {
      expect(v.width, v.kind).toBe(200);
      expect(v.height, v.kind).toBe(300);
    }
  });

  test('when the photo is large, then display and thumbnail fit their boxes and the thumbnail is WebP', async () => {
    const out = await processImage(await ingotPhoto({ width: 3200, height: 2400 }), LIMIT);
    const [original, display, thumb] = out.variants;
    expect([original.width, original.height]).toEqual([3200, 2400]);
    expect(Math.max(display.width, display.height)).toBe(DISPLAY_MAX_PX);
    expect(Math.max(thumb.width, thumb.height)).toBe(THUMB_MAX_PX);
    expect((await sharp(thumb.body).metadata()).format).toBe('webp');
  });

  test('when a phone sends HEIC, then it is decoded and stored as JPEG', async () => {
    const heic = readFileSync(new URL('../../../tests/fixtures/ingot-320x240.heic', import.meta.url));
    const out = await processImage(heic, LIMIT);
    expect(out.sourceFormat).toBe('heif');
    expect(out.variants[0].contentType).toBe('image/jpeg');
    expect([out.variants[0].width, out.variants[0].height]).toEqual([320, 240]);
  });

  test.each([
    ['a text file', () => Promise.resolve(Buffer.from('these are not the pixels you are looking for')), 'unsupported-type'],
    ['an SVG with a script', () => Promise.resolve(svgWithScript()), 'unsupported-type'],
    ['a truncated JPEG', async () => (await ingotPhoto()).subarray(0, 600), 'unreadable'],
    ['a 30000 × 30000 PNG', () => pngClaiming(30000, 30000), 'too-many-pixels'],
  ] as const)('when given %s, then it is refused (%s)', async (_name, make, reason) => {
    const input = await make();
    await expect(processImage(input, LIMIT)).rejects.toSatisfy((e: unknown) => e instanceof ImageRejected && e.reason === reason);
  });

  test('when the same bytes come twice, then the digest is the same', async () => {
    const input = await ingotPhoto({ seed: 7 });
    const [a, b] = await Promise.all([processImage(input, LIMIT), processImage(Buffer.from(input), LIMIT)]);
    expect(a.sha256).toBe(b.sha256);
    expect(a.sha256).toMatch(/^[0-9a-f]{64}$/);
  });
});
