import { z } from 'zod';

// Every setting the server reads, parsed once at start-up. Nothing else reads
// process.env, so a bad value stops the process here with a list of problems.
const booleanFlag = z
  .enum(['true', 'false', '1', '0', ''])
  .transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  APP_ORIGIN: z.url().optional(),
  DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/, error: 'DATABASE_URL must be a postgres:// URL' }),
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().min(1).default('us-east-1'),
  S3_BUCKET: z.string().min(3).max(63),
  S3_ACCESS_KEY_ID: z.string().min(1),
  S3_SECRET_ACCESS_KEY: z.string().min(1),
  S3_FORCE_PATH_STYLE: booleanFlag.default(true),
  SMTP_URL: z.url({ protocol: /^smtps?$/, error: 'SMTP_URL must be an smtp:// or smtps:// URL' }),
  MAIL_FROM: z.string().min(3).default('Pourscope <no-reply@pourscope.invalid>'),
  MAIL_FAKE_DIR: z.string().optional(),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must have at least 32 characters'),
  // Idle: a session unused this long ends (the rolling cookie and store expiry).
  // Absolute: a session ends this long after sign-in however active it was.
  SESSION_IDLE_HOURS: z.coerce.number().positive().default(12),
  SESSION_MAX_AGE_HOURS: z.coerce.number().positive().default(24 * 14),
  // Key material for encrypting one-time-code secrets at rest; when unset the
  // key is derived from SESSION_SECRET (see server/lib/secret-box.ts).
  MFA_ENCRYPTION_KEY: z.string().min(32, 'MFA_ENCRYPTION_KEY must have at least 32 characters').optional(),
  COOKIE_SECURE: z.enum(['auto', 'true', 'false']).default('auto'),
  TRUST_PROXY: z.string().default('loopback'),
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).default(25 * 1024 * 1024),
  UPLOAD_MAX_FILES: z.coerce.number().int().min(1).max(100).default(20),
  // 100 MP covers every phone and most cameras; a decompression bomb has far more.
  IMAGE_MAX_PIXELS: z.coerce.number().int().min(1_000_000).default(100_000_000),
  BCRYPT_COST: z.coerce.number().int().min(12).max(15).default(12),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

export type Config = ReturnType<typeof loadConfig>;

export function loadConfig(env: Record<string, string | undefined> = process.env) {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Pourscope cannot start; fix these settings (see .env.example):\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.SESSION_IDLE_HOURS > e.SESSION_MAX_AGE_HOURS) {
    throw new Error(
      'Pourscope cannot start; fix these settings (see .env.example):\n  SESSION_IDLE_HOURS: must not be longer than SESSION_MAX_AGE_HOURS',
    );
  }
  const production = e.NODE_ENV === 'production';
  return Object.freeze({
    env: e.NODE_ENV,
    production,
    http: {
      port: e.PORT,
      host: e.HOST,
      origin: e.APP_ORIGIN ?? `http://127.0.0.1:${e.PORT}`,
      trustProxy: e.TRUST_PROXY,
    },
    db: { url: e.DATABASE_URL, poolMax: e.DATABASE_POOL_MAX },
    storage: {
      endpoint: e.S3_ENDPOINT,
      region: e.S3_REGION,
      bucket: e.S3_BUCKET,
      accessKeyId: e.S3_ACCESS_KEY_ID,
      secretAccessKey: e.S3_SECRET_ACCESS_KEY,
      forcePathStyle: e.S3_FORCE_PATH_STYLE,
    },
    mail: {
      smtpUrl: e.SMTP_URL,
      from: e.MAIL_FROM,
      // The development outbox page reads the mail fake's folder; never in production.
      fakeDir: production ? undefined : e.MAIL_FAKE_DIR,
    },
    session: {
      secret: e.SESSION_SECRET,
      idleMs: e.SESSION_IDLE_HOURS * 3600_000,
      absoluteMs: e.SESSION_MAX_AGE_HOURS * 3600_000,
      secureCookie: e.COOKIE_SECURE === 'auto' ? ('auto' as const) : e.COOKIE_SECURE === 'true',
    },
    auth: { bcryptCost: e.BCRYPT_COST, mfaKeyMaterial: e.MFA_ENCRYPTION_KEY ?? e.SESSION_SECRET },
    uploads: { maxBytes: e.UPLOAD_MAX_BYTES, maxFiles: e.UPLOAD_MAX_FILES, maxPixels: e.IMAGE_MAX_PIXELS },
    log: { level: e.LOG_LEVEL },
  });
}

let current: Config | undefined;

/** The process's configuration, parsed on first use. */
export function config(): Config {
  current ??= loadConfig();
  return current;
}
