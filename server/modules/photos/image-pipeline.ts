import { createHash } from 'node:crypto';
import decodeHeic from 'heic-decode';
import exifReader from 'exif-reader';
import sharp, { type Metadata, type Sharp } from 'sharp';

/** The formats we store; anything else is refused with 415, whatever its name says. */
export const ACCEPTED_FORMATS = ['jpeg', 'png', 'webp', 'heif'] as const;
export type AcceptedFormat = (typeof ACCEPTED_FORMATS)[number];

export const DISPLAY_MAX_PX = 1600;
export const THUMB_MAX_PX = 400;

export type ImageVariant = {
  kind: 'original' | 'display' | 'thumb';
  body: Buffer;
  contentType: 'image/jpeg' | 'image/png' | 'image/webp';
  extension: 'jpg' | 'png' | 'webp';
  width: number;
  height: number;
};

export type ProcessedImage = {
  /** SHA-256 of the bytes as uploaded: the same file uploaded twice has the same digest. */
  sha256: string;
  sourceFormat: AcceptedFormat;
  /** When the camera says the photo was taken (EXIF DateTimeOriginal), if it says. */
  capturedAt: Date | null;
  variants: ImageVariant[];
};

export class ImageRejected extends Error {
  readonly reason: 'unsupported-type' | 'too-many-pixels' | 'unreadable';
  constructor(reason: ImageRejected['reason'], message: string) {
    super(message);
    this.name = 'ImageRejected';
    this.reason = reason;
  }
}

function capturedAtFrom(exif: Buffer | undefined): Date | null {
  if (!exif) return null;
  try {
    const tags = exifReader(exif);
    const when = tags.Photo?.DateTimeOriginal ?? tags.Image?.DateTime;
    return when instanceof Date && !Number.isNaN(when.getTime()) ? when : null;
  } catch {
    return null;
  }
}

/**
 * Decodes an uploaded photo and makes what we store: the original re-encoded
 * upright with every metadata block dropped (EXIF, GPS, XMP, ICC: sharp keeps
 * none unless asked), a display size and a WebP thumbnail. The type is read
 * from the content, never from the name; sharp's pixel limit refuses
 * decompression bombs before any pixel is decoded.
 */
export async function processImage(input: Buffer, opts: { maxPixels: number }): Promise<ProcessedImage> {
  const sha256 = createHash('sha256').update(input).digest('hex');
  let meta: Metadata;
  try {
    meta = await sharp(input, { limitInputPixels: opts.maxPixels }).metadata();
  } catch (error) {
    const message = (error as Error).message ?? '';
    if (/pixel limit/i.test(message)) {
      throw new ImageRejected('too-many-pixels', 'The image has more pixels than we accept');
    }
    throw new ImageRejected('unsupported-type', 'This is not a JPEG, PNG, WebP or HEIC photo');
  }
  const format = meta.format as string;
  if (!(ACCEPTED_FORMATS as readonly string[]).includes(format)) {
    throw new ImageRejected('unsupported-type', `${format.toUpperCase()} files are not accepted; send a JPEG, PNG, WebP or HEIC photo`);
  }
  if ((meta.width ?? 0) * (meta.height ?? 0) > opts.maxPixels) {
    throw new ImageRejected('too-many-pixels', 'The image has more pixels than we accept');
  }
  const capturedAt = capturedAtFrom(meta.exif);

  let source: Sharp;
  let sourceFormat = format as AcceptedFormat;
  if (format === 'heif' && meta.compression === 'hevc') {
    // The prebuilt sharp reads HEIC headers but has no HEVC decoder; heic-decode
    // (libheif compiled to wasm) gives raw RGBA that sharp takes as input. The
    // orientation it reports is applied below.
    let decoded: { width: number; height: number; data: Uint8ClampedArray };
    try {
      decoded = await decodeHeic({ buffer: input });
    } catch {
      throw new ImageRejected('unreadable', 'This HEIC photo could not be decoded');
    }
    source = sharp(Buffer.from(decoded.data.buffer, decoded.data.byteOffset, decoded.data.byteLength), {
      raw: { width: decoded.width, height: decoded.height, channels: 4 },
      limitInputPixels: opts.maxPixels,
    });
    sourceFormat = 'heif';
  } else {
    source = sharp(input, { limitInputPixels: opts.maxPixels, failOn: 'error' });
  }

  try {
    // One decode, upright; each variant is a clone of the same pipeline.
    const upright = source.autoOrient();
    const keepPng = format === 'png';
    const original = await upright
      .clone()
      .toFormat(keepPng ? 'png' : format === 'webp' ? 'webp' : 'jpeg', keepPng ? {} : { quality: 92 })
      .toBuffer({ resolveWithObject: true });
    const display = await upright
      .clone()
      .resize({ width: DISPLAY_MAX_PX, height: DISPLAY_MAX_PX, fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await upright
      .clone()
      .resize({ width: THUMB_MAX_PX, height: THUMB_MAX_PX, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 75 })
      .toBuffer({ resolveWithObject: true });
    const originalType = keepPng ? 'png' : format === 'webp' ? 'webp' : 'jpeg';
    return {
      sha256,
      sourceFormat,
      capturedAt,
      variants: [
        {
          kind: 'original',
          body: original.data,
          contentType: `image/${originalType}`,
          extension: originalType === 'jpeg' ? 'jpg' : originalType,
          width: original.info.width,
          height: original.info.height,
        },
        { kind: 'display', body: display.data, contentType: 'image/jpeg', extension: 'jpg', width: display.info.width, height: display.info.height },
        { kind: 'thumb', body: thumb.data, contentType: 'image/webp', extension: 'webp', width: thumb.info.width, height: thumb.info.height },
      ],
    };
  } catch (error) {
    if (error instanceof ImageRejected) throw error;
    throw new ImageRejected('unreadable', 'The photo is damaged or incomplete and could not be read');
  }
}
