import { randomBytes, randomUUID } from 'node:crypto';
import type { DefectKindId } from '../../shared/domain/index.ts';
import { putObject } from '../../server/lib/object-store.ts';
import * as photosRepository from '../../server/modules/photos/photos-repository.ts';

// A photo row with marks on it, without running the image pipeline: insights
// and heat-treatment tests only need the rows. The three objects are written
// too (a few bytes each) so the storage sweep, which checks every row's
// objects, still finds the store consistent after these tests.

const TINY = Buffer.from('not an image: a factory placeholder');

/** A photo of `castingId` with one point mark per entry of `kinds`; returns the photo's id. */
export async function insertPhotoWithMarks(
  workshopId: string,
  castingId: string,
  authorId: string,
  kinds: readonly DefectKindId[] = [],
): Promise<string> {
  const id = randomUUID();
  const key = (variant: string) => `workshops/${workshopId}/photos/${id}/${randomBytes(8).toString('hex')}-${variant}.bin`;
  const variants = {
    original: { key: key('original'), width: 640, height: 480, bytes: TINY.length },
    display: { key: key('display'), width: 640, height: 480, bytes: TINY.length },
    thumb: { key: key('thumb'), width: 400, height: 300, bytes: TINY.length },
  };
  await Promise.all(Object.values(variants).map((v) => putObject(v.key, TINY, 'application/octet-stream')));
  await photosRepository.insertPhoto({
    id,
    workshopId,
    castingId,
    uploadedBy: authorId,
    sha256: randomBytes(32).toString('hex'),
    fileName: null,
    sourceFormat: 'jpeg',
    capturedAt: null,
    originalContentType: 'image/jpeg',
    variants,
  });
  for (const [i, kind] of kinds.entries()) {
    await photosRepository.insertMark(workshopId, id, authorId, { kind, shape: 'point', x: 0.1 + (i % 8) * 0.1, y: 0.5, severity: 2 });
  }
  return id;
}
