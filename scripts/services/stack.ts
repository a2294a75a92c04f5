import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { startStorageFake, STORAGE_FAKE_ACCESS_KEY, STORAGE_FAKE_SECRET_KEY } from '../../storage-fake/storage-fake.ts';
import { freePort, portInUse } from './free-port.ts';
import { startMailFake } from './mail-fake.ts';
import { startPostgres } from './postgres.ts';

export const BUCKET = 'pourscope';
export const DATABASE = 'pourscope';

export type Stack = {
  /** Settings for the app server, as environment variables. */
  env: Record<string, string>;
  stop: () => Promise<void>;
};

type StackOptions = {
  /** Folder holding the cluster, the bucket and the mail store. */
  dataRoot: string;
  /** Throwaway data: free ports and no fsync. Otherwise fixed ports and durable data. */
  throwaway: boolean;
  appPort: number;
  log?: (line: string) => void;
};

async function portFor(fixed: number, throwaway: boolean): Promise<number> {
  if (throwaway) return freePort();
  if (await portInUse(fixed)) {
    throw new Error(`Port ${fixed} on 127.0.0.1 is taken; is another Pourscope running? Stop it and try again.`);
  }
  return fixed;
}

/** A session secret kept beside the data so sign-ins survive a restart. */
function sessionSecret(dataRoot: string, throwaway: boolean): string {
  if (throwaway) return randomBytes(32).toString('hex');
  const file = path.join(dataRoot, 'session-secret');
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  return readFileSync(file, 'utf8').trim();
}

/**
 * Starts the local services the app needs, all on 127.0.0.1: PostgreSQL,
 * the storage fake and the mail fake. Variables already set in the
 * environment (DATABASE_URL, S3_ENDPOINT, SMTP_URL) win: that service is then
 * the real one and is not started here.
 */
export async function startStack(opts: StackOptions): Promise<Stack> {
  const log = opts.log ?? (() => {});
  mkdirSync(opts.dataRoot, { recursive: true });
  const stops: (() => Promise<void>)[] = [];
  const stop = async () => {
    for (const s of stops.reverse()) await s().catch(() => {});
  };
  try {
    const env: Record<string, string> = {
      SESSION_SECRET: process.env.SESSION_SECRET ?? sessionSecret(opts.dataRoot, opts.throwaway),
      APP_ORIGIN: process.env.APP_ORIGIN ?? `http://127.0.0.1:${opts.appPort}`,
      PORT: String(opts.appPort),
    };

    if (process.env.DATABASE_URL && !opts.throwaway) {
      env.DATABASE_URL = process.env.DATABASE_URL;
    } else {
      const pg = await startPostgres({
        dataDir: path.join(opts.dataRoot, 'postgres'),
        port: await portFor(54329, opts.throwaway),
        database: DATABASE,
        throwaway: opts.throwaway,
        log,
      });
      stops.push(pg.stop);
      env.DATABASE_URL = pg.url;
      log(`PostgreSQL on 127.0.0.1:${pg.port}`);
    }

    if (process.env.S3_ENDPOINT && !opts.throwaway) {
      for (const k of ['S3_ENDPOINT', 'S3_BUCKET', 'S3_REGION', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY']) {
        if (process.env[k]) env[k] = process.env[k]!;
      }
    } else {
      const storage = await startStorageFake({
        directory: path.join(opts.dataRoot, 'storage'),
        port: await portFor(4568, opts.throwaway),
        bucket: BUCKET,
      });
      stops.push(storage.stop);
      Object.assign(env, {
        S3_ENDPOINT: storage.endpoint,
        S3_BUCKET: BUCKET,
        S3_ACCESS_KEY_ID: STORAGE_FAKE_ACCESS_KEY,
        S3_SECRET_ACCESS_KEY: STORAGE_FAKE_SECRET_KEY,
        STORAGE_FAKE_DIR: path.join(opts.dataRoot, 'storage'),
      });
      log(`storage fake on ${storage.endpoint}`);
    }

    if (process.env.SMTP_URL && !opts.throwaway) {
      env.SMTP_URL = process.env.SMTP_URL;
    } else {
      const mail = await startMailFake({ directory: path.join(opts.dataRoot, 'mail'), port: await portFor(2525, opts.throwaway) });
      stops.push(mail.stop);
      env.SMTP_URL = mail.url;
      env.MAIL_FAKE_DIR = mail.directory;
      log(`mail fake on ${mail.url}`);
    }
    return { env, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}
