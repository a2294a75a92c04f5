import pg from 'pg';
import { Sequelize, type Transaction } from 'sequelize';
import { config } from '../config.ts';

// NUMERIC and BIGINT arrive as strings by default; our counts and masses fit
// comfortably in a double.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));

/** The one Sequelize instance; snake_case columns everywhere. */
export const sequelize = new Sequelize(config().db.url, {
  dialect: 'postgres',
  dialectModule: pg,
  logging: false,
  pool: { max: config().db.poolMax, min: 0, idle: 10_000, acquire: 10_000 },
  define: { underscored: true, timestamps: true },
});

/** A plain pg pool for the session store and the sign-in limiter. */
export const pgPool = new pg.Pool({
  connectionString: config().db.url,
  max: 4,
  connectionTimeoutMillis: 5_000,
});
// An idle client dropped by a database restart must not crash the process.
pgPool.on('error', () => {});

export type Tx = Transaction;

/** Runs `work` in one transaction; repositories take the opaque `tx`. */
export function withTransaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
  return sequelize.transaction((tx) => work(tx));
}

export async function closeDatabase(): Promise<void> {
  await Promise.allSettled([sequelize.close(), pgPool.end()]);
}
