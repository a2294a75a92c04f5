import { randomBytes, randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import type {
  Mark,
  MarkCreateInput,
  MarkUpdateInput,
  Photo,
  PhotoIndexItem,
  PhotoListQuery,
  PhotoPage,
  PhotoVariant,
  UploadResult,
} from '../../../shared/photos/photo-schemas.ts';
import { markCreateSchema } from '../../../shared/photos/photo-schemas.ts';
import { config } from '../../config.ts';
import { sequelize } from '../../db/sequelize.ts';
import { AppError, forbidden } from '../../lib/app-error.ts';
import { logger } from '../../lib/logger.ts';
import { deleteObjects, getObject, putObject } from '../../lib/object-store.ts';
import { ImageRejected, processImage, type ProcessedImage } from './image-pipeline.ts';
import * as repo from './photos-repository.ts';

export type UploadFile = { originalName: string; buffer: Buffer };

const photoNotFound = () => new AppError('photo-not-found', 'Photo not found', 404);

function imageUrl(workshopId: string, photoId: string, variant: PhotoVariant) {
  return `/api/workshops/${workshopId}/photos/${photoId}/image/${variant}`;
}

function toPhoto(row: repo.PhotoRow, marks: Mark[]): Photo {
  return {
    id: row.id,
    workshopId: row.workshopId,
    castingId: row.castingId,
    heatId: row.heatId,
    uploadedBy: row.uploadedBy,
    casterId: row.casterId,
    casterName: row.casterName,
    title: row.title,
    notes: row.notes,
    fileName: row.fileName,
    alloy: row.alloy,
    mouldMaterial: row.mouldMaterial as Photo['mouldMaterial'],
    capturedAt: row.capturedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    original: { width: row.originalWidth, height: row.originalHeight },
    display: { width: row.displayWidth, height: row.displayHeight },
    thumb: { width: row.thumbWidth, height: row.thumbHeight },
    urls: {
      original: imageUrl(row.workshopId, row.id, 'original'),
      display: imageUrl(row.workshopId, row.id, 'display'),
      thumb: imageUrl(row.workshopId, row.id, 'thumb'),
    },
    marks,
  };
}

async function loadPhoto(workshopId: string, photoId: string): Promise<Photo> {
  const row = await repo.findPhoto(workshopId, photoId);
  if (!row) throw photoNotFound();
  return toPhoto(row, (await repo.marksOf([row.id])).get(row.id)!);
}

/** Uploading to a casting needs the right to change that casting's heat. */
async function assertMayUploadTo(actor: Actor, workshopId: string, castingId: string) {
  const owner = await repo.castingOwner(workshopId, castingId);
  if (!owner) throw new AppError('casting-not-found', 'Casting not found', 404);
  if (!can(actor, 'update', 'heat', { ownerId: owner.casterId })) {
    throw forbidden('Photos go on your own castings');
  }
}

function rejectionFor(fileName: string, error: ImageRejected): AppError {
  const status = error.reason === 'unsupported-type' ? 415 : error.reason === 'too-many-pixels' ? 413 : 422;
  return new AppError(`image-${error.reason}`, `${fileName}: ${error.message}`, status);
}

/** Where a photo's objects go: namespaced per workshop, with an unguessable part. */
function objectKey(workshopId: string, photoId: string, kind: string, extension: string) {
  return `workshops/${workshopId}/photos/${photoId}/${randomBytes(16).toString('hex')}-${kind}.${extension}`;
}

/** Queues keys for the deletion worker; used when a half-finished upload must be undone. */
async function queueForDeletion(keys: string[]) {
  if (!keys.length) return;
  await sequelize
    .query('INSERT INTO object_deletions (object_key) SELECT unnest(ARRAY[:keys]::varchar[]) ON CONFLICT DO NOTHING', {
      replacements: { keys },
    })
    .catch((err: unknown) => logger.error({ err, keys }, 'could not queue object deletions; the storage sweep will find them'));
}

async function storeOne(actor: Actor, workshopId: string, castingId: string, file: UploadFile, image: ProcessedImage): Promise<UploadResult> {
  const existing = await repo.findBySha(workshopId, image.sha256);
  if (existing) return { fileName: file.originalName, status: 'duplicate', photo: await loadPhoto(workshopId, existing) };

  const photoId = randomUUID();
  const placed = image.variants.map((v) => ({ ...v, key: objectKey(workshopId, photoId, v.kind, v.extension) }));
  // Wait for every PUT to settle, not just the first failure: a PUT still in
  // flight when another fails may yet land. Even a failed PUT may have landed
  // (the answer was lost), so every key is undone, now or by the worker later.
  const puts = await Promise.allSettled(placed.map((v) => putObject(v.key, v.body, v.contentType)));
  const failure = puts.find((p) => p.status === 'rejected');
  if (failure) {
    const left = await deleteObjects(placed.map((v) => v.key));
    await queueForDeletion(left);
    throw failure.reason;
  }

  const variants = Object.fromEntries(
    placed.map((v) => [v.kind, { key: v.key, width: v.width, height: v.height, bytes: v.body.length }]),
  ) as repo.NewPhoto['variants'];
  try {
    await repo.insertPhoto({
      id: photoId,
      workshopId,
      castingId,
      uploadedBy: actor.id,
      sha256: image.sha256,
      fileName: file.originalName.slice(0, 255) || null,
      sourceFormat: image.sourceFormat,
      capturedAt: image.capturedAt,
      originalContentType: placed[0].contentType,
      variants,
    });
  } catch (error) {
    // The row was never written, so its objects must go too.
    const left = await deleteObjects(placed.map((v) => v.key));
    await queueForDeletion(left);
    if ((error as { name?: string }).name === 'SequelizeUniqueConstraintError') {
      const winner = await repo.findBySha(workshopId, image.sha256);
      if (winner) return { fileName: file.originalName, status: 'duplicate', photo: await loadPhoto(workshopId, winner) };
    }
    throw error;
  }
  return { fileName: file.originalName, status: 'stored', photo: await loadPhoto(workshopId, photoId) };
}

/**
 * Stores a batch of photos on one casting. Every file is decoded first; if
 * any is refused, none is stored and the error names the file.
 */
export async function uploadPhotos(actor: Actor, workshopId: string, castingId: string, files: UploadFile[]): Promise<UploadResult[]> {
  if (!files.length) throw new AppError('no-files', 'Choose at least one photo to upload', 400);
  await assertMayUploadTo(actor, workshopId, castingId);
  const images: ProcessedImage[] = [];
  for (const file of files) {
    try {
      images.push(await processImage(file.buffer, { maxPixels: config().uploads.maxPixels }));
    } catch (error) {
      if (error instanceof ImageRejected) throw rejectionFor(file.originalName || 'The file', error);
      throw error;
    }
  }
  const results: UploadResult[] = [];
  for (let i = 0; i < files.length; i++) results.push(await storeOne(actor, workshopId, castingId, files[i], images[i]));
  return results;
}

export async function getPhoto(_actor: Actor, workshopId: string, photoId: string): Promise<Photo> {
  return loadPhoto(workshopId, photoId);
}

function decodeCursor(cursor: string | undefined): { createdAt: string; id: string } | null {
  if (!cursor) return null;
  try {
    const parsed = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')) as { c?: unknown; i?: unknown };
    if (typeof parsed.c === 'string' && typeof parsed.i === 'string' && !Number.isNaN(Date.parse(parsed.c)) && /^[0-9a-f-]{36}$/.test(parsed.i)) {
      return { createdAt: parsed.c, id: parsed.i };
    }
  } catch {
    // fall through
  }
  throw new AppError('cursor-invalid', 'This page link is out of date; start from the first page', 400);
}

const encodeCursor = (row: repo.PhotoRow) =>
  Buffer.from(JSON.stringify({ c: row.createdAt.toISOString(), i: row.id })).toString('base64url');

export async function listPhotos(_actor: Actor, workshopId: string, query: PhotoListQuery): Promise<PhotoPage> {
  const after = decodeCursor(query.cursor);
  const rows = await repo.listPhotos(workshopId, { ...query, limit: query.limit + 1 }, after);
  const page = rows.slice(0, query.limit);
  const marks = await repo.marksOf(page.map((r) => r.id));
  return {
    items: page.map((r) => toPhoto(r, marks.get(r.id)!)),
    nextCursor: rows.length > query.limit ? encodeCursor(page[page.length - 1]) : null,
  };
}

export async function photoIndex(_actor: Actor, workshopId: string): Promise<PhotoIndexItem[]> {
  const rows = await repo.searchIndex(workshopId);
  return rows.map((r) => ({
    id: r.id,
    title: r.title,
    notes: r.notes,
    alloy: r.alloy,
    casterName: r.casterName,
    mouldMaterial: r.mouldMaterial,
    kinds: r.kinds,
    createdAt: r.createdAt.toISOString(),
    thumbUrl: imageUrl(workshopId, r.id, 'thumb'),
    thumb: { width: r.thumbWidth, height: r.thumbHeight },
  }));
}

export async function updatePhoto(actor: Actor, workshopId: string, photoId: string, values: { title?: string | null; notes?: string | null }) {
  const row = await repo.findPhoto(workshopId, photoId);
  if (!row) throw photoNotFound();
  if (!can(actor, 'update', 'heat', { ownerId: row.casterId ?? '' }) && !can(actor, 'delete', 'photo', { ownerId: row.uploadedBy ?? '' })) {
    throw forbidden('Only the caster or an admin can change this photo');
  }
  await repo.updatePhoto(workshopId, photoId, values);
  return loadPhoto(workshopId, photoId);
}

/** Deletes the row; its trigger queues the objects, which go at once or on the next worker pass. */
export async function deletePhoto(actor: Actor, workshopId: string, photoId: string): Promise<void> {
  const row = await repo.findPhoto(workshopId, photoId);
  if (!row) throw photoNotFound();
  if (!can(actor, 'delete', 'photo', { ownerId: row.uploadedBy ?? '' })) {
    throw forbidden('Only the person who uploaded it or an admin can delete this photo');
  }
  await repo.deletePhoto(workshopId, photoId);
  void drainObjectDeletions().catch(() => {});
}

export async function photoImage(
  _actor: Actor,
  workshopId: string,
  photoId: string,
  variant: PhotoVariant,
): Promise<{ body: Readable; contentType: string; contentLength?: number; key: string }> {
  const row = await repo.findPhoto(workshopId, photoId);
  if (!row) throw photoNotFound();
  const key = variant === 'original' ? row.originalKey : variant === 'display' ? row.displayKey : row.thumbKey;
  const object = await getObject(key);
  if (!object) throw new AppError('photo-object-missing', 'This photo’s file is missing from the store', 404);
  return { ...object, key };
}

// ---- marks ----------------------------------------------------------------

export async function addMark(actor: Actor, workshopId: string, photoId: string, input: MarkCreateInput): Promise<Mark> {
  const m = markCreateSchema.parse(input);
  if (!(await repo.findPhoto(workshopId, photoId))) throw photoNotFound();
  if (!can(actor, 'create', 'mark')) throw forbidden();
  const id = await repo.insertMark(workshopId, photoId, actor.id, m);
  return (await repo.findMark(photoId, id))!;
}

async function ownMark(actor: Actor, workshopId: string, photoId: string, markId: string, action: 'update' | 'delete') {
  if (!(await repo.findPhoto(workshopId, photoId))) throw photoNotFound();
  const mark = await repo.findMark(photoId, markId);
  if (!mark) throw new AppError('mark-not-found', 'Mark not found', 404);
  if (!can(actor, action, 'mark', { ownerId: mark.authorId ?? '' })) {
    throw forbidden('You can change only your own marks');
  }
  return mark;
}

export async function listMarks(_actor: Actor, workshopId: string, photoId: string): Promise<Mark[]> {
  if (!(await repo.findPhoto(workshopId, photoId))) throw photoNotFound();
  return (await repo.marksOf([photoId])).get(photoId)!;
}

export async function changeMark(actor: Actor, workshopId: string, photoId: string, markId: string, input: MarkUpdateInput) {
  const mark = await ownMark(actor, workshopId, photoId, markId, 'update');
  const next = { ...mark, ...input };
  // The merged mark must still be a valid point or box inside the photo.
  markCreateSchema.parse({
    kind: next.kind,
    severity: next.severity,
    shape: mark.shape,
    x: next.x,
    y: next.y,
    ...(mark.shape === 'box' ? { width: next.width ?? undefined, height: next.height ?? undefined } : {}),
  });
  await repo.updateMark(markId, input);
  return (await repo.findMark(photoId, markId))!;
}

export async function removeMark(actor: Actor, workshopId: string, photoId: string, markId: string) {
  await ownMark(actor, workshopId, photoId, markId, 'delete');
  await repo.deleteMark(markId);
}

// ---- the deletion queue -----------------------------------------------------

let draining: Promise<number> | undefined;

/** Deletes queued objects from the store; returns how many went. One pass at a time. */
export function drainObjectDeletions(): Promise<number> {
  draining ??= (async () => {
    let total = 0;
    try {
      for (;;) {
        const keys = await repo.queuedDeletions(200);
        if (!keys.length) break;
        const failed = await deleteObjects(keys);
        await repo.finishDeletions(keys.filter((k) => !failed.includes(k)), failed);
        total += keys.length - failed.length;
        if (failed.length) break;
      }
    } finally {
      draining = undefined;
    }
    return total;
  })();
  return draining;
}

