import { HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { config } from '../config.ts';

/**
 * The S3 client for whatever S3_ENDPOINT names: the local storage fake or a
 * real bucket. Checksums only WHEN_REQUIRED: with the SDK's defaults a
 * streamed upload reaches S3-compatible servers with its aws-chunked framing
 * stored as content.
 */
export const s3 = new S3Client({
  endpoint: config().storage.endpoint,
  region: config().storage.region,
  forcePathStyle: config().storage.forcePathStyle,
  credentials: {
    accessKeyId: config().storage.accessKeyId,
    secretAccessKey: config().storage.secretAccessKey,
  },
  requestChecksumCalculation: 'WHEN_REQUIRED',
  responseChecksumValidation: 'WHEN_REQUIRED',
  maxAttempts: 2,
});

export const bucket = () => config().storage.bucket;

/** Whether the bucket answers; used by /api/ready. */
export async function storageReachable(timeoutMs = 2_000): Promise<boolean> {
  try {
    await s3.send(new HeadBucketCommand({ Bucket: bucket() }), { abortSignal: AbortSignal.timeout(timeoutMs) });
    return true;
  } catch {
    return false;
  }
}
