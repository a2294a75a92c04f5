// s3rver ships no types; this declares the part of its API we call.
declare module 's3rver' {
  import type { AddressInfo } from 'node:net';
  type S3rverOptions = {
    address?: string;
    port?: number;
    directory?: string;
    silent?: boolean;
    resetOnClose?: boolean;
    allowMismatchedSignatures?: boolean;
    vhostBuckets?: boolean;
    configureBuckets?: { name: string; configs: (string | Buffer)[] }[];
  };
  export default class S3rver {
    constructor(options?: S3rverOptions);
    run(): Promise<AddressInfo | string | null>;
    close(): Promise<void>;
  }
}
