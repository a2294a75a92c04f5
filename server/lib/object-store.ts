import { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { AppError } from './app-error.ts';
import { bucket, s3 } from './storage.ts';

/** The object store could not be reached or refused to work: a 503 for the client. */
export function storageUnavailable(cause: unknown): AppError {
  return new AppError('storage-unavailable', 'The photo store is not reachable right now; nothing was saved. Try again shortly.', 503, {
    cause,
    headers: { 'Retry-After': '10' },
  });
}

function isNotFound(error: unknown): boolean {
  return (
    error instanceof S3ServiceException &&
    (error.name === 'NoSuchKey' || error.name === 'NotFound' || error.$metadata.httpStatusCode === 404)
  );
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  try {
    await s3.send(
      new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.length }),
      { abortSignal: AbortSignal.timeout(30_000) },
    );
  } catch (error) {
    throw storageUnavailable(error);
  }
}

export type StoredObject = { body: Readable; contentType: string; contentLength?: number; etag?: string };

/** The object's bytes as a stream, or null when no such object exists. */
export async function getObject(key: string): Promise<StoredObject | null> {
  try {
    const res = await s3.send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    return {
      body: res.Body as Readable,
      contentType: res.ContentType ?? 'application/octet-stream',
      contentLength: res.ContentLength,
      etag: res.ETag,
    };
  } catch (error) {
    if (isNotFound(error)) return null;
    throw storageUnavailable(error);
  }
}

export async function objectExists(key: string): Promise<boolean> {
  try {
    await s3.send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return true;
  } catch (error) {
    if (isNotFound(error)) return false;
    throw storageUnavailable(error);
  }
}

/**
 * Deletes keys (missing ones are fine), eight at a time; returns the keys the
 * store refused. One DeleteObject per key: multi-object delete needs a
 * Content-MD5 that S3-compatible servers check differently.
 */
export async function deleteObjects(keys: string[]): Promise<string[]> {
  const failed: string[] = [];
  for (let i = 0; i < keys.length; i += 8) {
    const chunk = keys.slice(i, i + 8);
    const results = await Promise.allSettled(
      chunk.map((Key) => s3.send(new DeleteObjectCommand({ Bucket: bucket(), Key }), { abortSignal: AbortSignal.timeout(10_000) })),
    );
    results.forEach((r, j) => {
      if (r.status === 'rejected') failed.push(chunk[j]);
    });
  }
  return failed;
}

/** Every key under a prefix, with its last-modified time. */
export async function* listObjects(prefix = ''): AsyncGenerator<{ key: string; lastModified: Date }> {
  let token: string | undefined;
  do {
    const res = await s3.send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token }));
    for (const o of res.Contents ?? []) if (o.Key) yield { key: o.Key, lastModified: o.LastModified ?? new Date(0) };
    token = res.IsTruncated ? res.NextContinuationToken : undefined;
  } while (token);
}
