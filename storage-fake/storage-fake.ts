import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

/**
 * The local stand-in for a hosted S3-compatible object store. It is s3rver
 * (a maintained package that speaks the S3 REST API) bound to 127.0.0.1 and
 * keeping its objects on disk, so data survives a restart like a real bucket.
 * The app talks to it with the real AWS SDK; pointing S3_ENDPOINT at a real
 * bucket needs no code change.
 */
export type StorageFakeOptions = {
  directory: string;
  port: number;
  bucket: string;
  /** Credentials the fake accepts; s3rver checks signatures made with them. */
  accessKeyId?: string;
  secretAccessKey?: string;
  silent?: boolean;
};

export type StorageFakeHandle = {
  endpoint: string;
  port: number;
  stop: () => Promise<void>;
};

export const STORAGE_FAKE_ACCESS_KEY = 'S3RVER';
export const STORAGE_FAKE_SECRET_KEY = 'S3RVER';

export async function startStorageFake(opts: StorageFakeOptions): Promise<StorageFakeHandle> {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: opts.port,
    directory: opts.directory,
    silent: opts.silent ?? true,
    // configureBuckets creates the bucket when missing and keeps it otherwise.
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  const address = await server.run();
  const port = typeof address === 'object' && address ? address.port : opts.port;
  let stopped = false;
  return {
    endpoint: `http://127.0.0.1:${port}`,
    port,
    stop: async () => {
      if (stopped) return;
      stopped = true;
      await server.close();
    },
  };
}
