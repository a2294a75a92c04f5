import { crc32 } from 'node:zlib';
import sharp from 'sharp';

/** A drawn test photo: a grey ingot with a few dark pores, as JPEG by default. */
export async function ingotPhoto(opts: { width?: number; height?: number; format?: 'jpeg' | 'png' | 'webp'; seed?: number } = {}) {
  const width = opts.width ?? 640;
  const height = opts.height ?? 480;
  const seed = opts.seed ?? 1;
  const pores = Array.from({ length: 6 }, (_, i) => {
    const x = ((seed * 97 + i * 131) % (width - 80)) + 40;
    const y = ((seed * 53 + i * 71) % (height - 80)) + 40;
    return `<circle cx="${x}" cy="${y}" r="${3 + ((seed + i) % 5)}" fill="#4a4c50"/>`;
  }).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">
    <rect width="100%" height="100%" fill="#6f6a63"/>
    <rect x="${width * 0.08}" y="${height * 0.2}" width="${width * 0.84}" height="${height * 0.6}" rx="18" fill="#b9bcc0"/>
    ${pores}</svg>`;
  const image = sharp(Buffer.from(svg));
  const format = opts.format ?? 'jpeg';
  return format === 'jpeg' ? image.jpeg().toBuffer() : format === 'png' ? image.png().toBuffer() : image.webp().toBuffer();
}

/** A JPEG that carries camera EXIF with a GPS position and a capture time. */
export async function jpegWithGps() {
  return sharp(await ingotPhoto())
    .withExif({
      IFD0: { Make: 'TestCam', Model: 'Bench 1' },
      IFD2: { DateTimeOriginal: '2026:11:19 19:42:05' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .jpeg()
    .toBuffer();
}

/** A landscape JPEG stored sideways with EXIF orientation 6 ("rotate 90° clockwise to view"). */
export async function jpegRotated(width = 300, height = 200) {
  return sharp(await ingotPhoto({ width, height })).withMetadata({ orientation: 6 }).jpeg().toBuffer();
}

/**
 * A tiny PNG whose header claims 30000 × 30000 pixels: the shape of a
 * decompression bomb. Only the IHDR size fields are changed (and its CRC).
 */
export async function pngClaiming(width: number, height: number) {
  const png = Buffer.from(await sharp({ create: { width: 1, height: 1, channels: 3, background: '#888' } }).png().toBuffer());
  // Signature (8) + length (4) + "IHDR" (4): width and height follow.
  png.writeUInt32BE(width, 16);
  png.writeUInt32BE(height, 20);
  png.writeUInt32BE(crc32(png.subarray(12, 29)) >>> 0, 29);
  return png;
}

export const svgWithScript = () =>
  Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10"/></svg>');
