import { execFile as execFileCb, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, chownSync, statSync, symlinkSync, lstatSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';

const execFile = promisify(execFileCb);

/** Debian's PostgreSQL server binaries, newest major first. */
export function findPostgresBin(): string | undefined {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return undefined;
  const majors = readdirSync(root)
    .filter((d) => existsSync(path.join(root, d, 'bin', 'pg_ctl')))
    .sort((a, b) => Number(b) - Number(a));
  return majors.length ? path.join(root, majors[0], 'bin') : undefined;
}

const isRoot = () => process.getuid?.() === 0;

/**
 * PostgreSQL refuses to run as root; as root we hand the cluster folder to the
 * `postgres` account and run its tools through runuser.
 */
function asClusterOwner(cmd: string, args: string[]): [string, string[]] {
  return isRoot() ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
}

function postgresCanEnter(dir: string): boolean {
  if (!isRoot()) return true;
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}

/**
 * Where the cluster files live. We want `wanted` (under the checkout's .data/),
 * but when the postgres account cannot enter the checkout (a checkout under a
 * 0700 home, say) the files go to a per-project folder under the temp dir and
 * `wanted` becomes a symlink to it, so .data/ still tells where the data is.
 */
function clusterDir(wanted: string): string {
  mkdirSync(path.dirname(wanted), { recursive: true });
  if (postgresCanEnter(path.dirname(wanted))) return wanted;
  const hash = createHash('sha256').update(path.resolve(wanted)).digest('hex').slice(0, 12);
  const elsewhere = path.join(tmpdir(), `pourscope-pg-${hash}`);
  mkdirSync(elsewhere, { recursive: true });
  if (!existsSync(wanted)) symlinkSync(elsewhere, wanted);
  else if (!lstatSync(wanted).isSymbolicLink()) return elsewhere;
  return elsewhere;
}

export type PostgresHandle = {
  url: string;
  port: number;
  dataDir: string;
  stop: () => Promise<void>;
};

export type StartPostgresOptions = {
  /** Cluster folder, created and initialised when empty. */
  dataDir: string;
  port: number;
  database: string;
  /** Throwaway clusters skip fsync; never for data anyone keeps. */
  throwaway?: boolean;
  log?: (line: string) => void;
};

/** Initialises (when new) and starts a cluster listening on 127.0.0.1 only. */
export async function startPostgres(opts: StartPostgresOptions): Promise<PostgresHandle> {
  const bin = findPostgresBin();
  if (!bin) throw new Error('PostgreSQL server binaries are missing (see scripts/bootstrap.sh).');
  const log = opts.log ?? (() => {});
  const dataDir = clusterDir(opts.dataDir);
  mkdirSync(dataDir, { recursive: true });
  if (isRoot()) {
    const pgUid = Number(spawnSync('id', ['-u', 'postgres']).stdout.toString().trim());
    const pgGid = Number(spawnSync('id', ['-g', 'postgres']).stdout.toString().trim());
    if (statSync(dataDir).uid !== pgUid) chownSync(dataDir, pgUid, pgGid);
  }

  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) {
    log(`initialising a PostgreSQL cluster in ${path.relative(process.cwd(), opts.dataDir) || opts.dataDir}`);
    const [cmd, args] = asClusterOwner(path.join(bin, 'initdb'), [
      '-D', dataDir, '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8', '-U', 'postgres',
      ...(opts.throwaway ? ['--no-sync'] : []),
    ]);
    await execFile(cmd, args);
  }

  const serverOptions = [
    '-c', 'listen_addresses=127.0.0.1',
    '-p', String(opts.port),
    '-c', "unix_socket_directories=''",
    ...(opts.throwaway ? ['-c', 'fsync=off', '-c', 'synchronous_commit=off', '-c', 'full_page_writes=off'] : []),
  ].join(' ');
  const logFile = path.join(dataDir, 'server.log');
  const [cmd, args] = asClusterOwner(path.join(bin, 'pg_ctl'), [
    '-D', dataDir, '-l', logFile, '-w', '-t', '30', '-o', serverOptions, 'start',
  ]);
  try {
    await execFile(cmd, args);
  } catch (error) {
    throw new Error(`PostgreSQL did not start on 127.0.0.1:${opts.port}; see ${logFile}`, { cause: error });
  }

  const adminUrl = `postgres://postgres@127.0.0.1:${opts.port}/postgres`;
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [opts.database]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE "${opts.database.replaceAll('"', '')}"`);
  } finally {
    await client.end();
  }

  let stopped = false;
  return {
    url: `postgres://postgres@127.0.0.1:${opts.port}/${opts.database}`,
    port: opts.port,
    dataDir,
    stop: async () => {
      if (stopped) return;
      stopped = true;
      const [c, a] = asClusterOwner(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
      await execFile(c, a).catch(() => {});
    },
  };
}

/** Removes a throwaway cluster folder (and the symlink pointing at it). */
export function removeCluster(handle: PostgresHandle, wanted: string): void {
  rmSync(handle.dataDir, { recursive: true, force: true });
  rmSync(wanted, { recursive: true, force: true });
}
