import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { pgPool } from '../../db/sequelize.ts';
import { AppError } from '../../lib/app-error.ts';

// Failed sign-ins are counted per account and per address in PostgreSQL, so
// every app server shares the count. Ten wrong passwords for one account
// blocks it for 15 minutes; one address gets 100 failures an hour across all
// accounts (OWASP Authentication cheat sheet: throttle per account and per IP).
const storeOptions = {
  storeClient: pgPool,
  storeType: 'pool',
  tableName: 'rate_limits',
  tableCreated: true,
  clearExpiredByTimeout: true,
};

export const SIGN_IN_LIMITS = {
  perAccount: { points: 10, durationS: 15 * 60 },
  perAddress: { points: 100, durationS: 60 * 60 },
} as const;

const byAccount = new RateLimiterPostgres({
  ...storeOptions,
  keyPrefix: 'sign-in-account',
  points: SIGN_IN_LIMITS.perAccount.points,
  duration: SIGN_IN_LIMITS.perAccount.durationS,
  blockDuration: SIGN_IN_LIMITS.perAccount.durationS,
});
const byAddress = new RateLimiterPostgres({
  ...storeOptions,
  keyPrefix: 'sign-in-address',
  points: SIGN_IN_LIMITS.perAddress.points,
  duration: SIGN_IN_LIMITS.perAddress.durationS,
  blockDuration: SIGN_IN_LIMITS.perAddress.durationS,
});

// Password-reset and sign-up mails: a few per address and per e-mail an hour.
const mailByKey = new RateLimiterPostgres({
  ...storeOptions,
  keyPrefix: 'mail-request',
  points: 5,
  duration: 60 * 60,
});

function tooMany(retryAfterS: number): AppError {
  const minutes = Math.max(1, Math.ceil(retryAfterS / 60));
  return new AppError(
    'rate-limited',
    `Too many attempts. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`,
    429,
    { headers: { 'Retry-After': String(Math.ceil(retryAfterS)) } },
  );
}

/** Throws 429 when this account or this address has failed too often. */
export async function assertMaySignIn(email: string, address: string): Promise<void> {
  const [account, ip] = await Promise.all([byAccount.get(email), byAddress.get(address)]);
  const blocked = [
    { res: account, limit: SIGN_IN_LIMITS.perAccount.points },
    { res: ip, limit: SIGN_IN_LIMITS.perAddress.points },
  ].filter((x) => x.res && x.res.consumedPoints >= x.limit);
  if (blocked.length) throw tooMany(Math.max(...blocked.map((b) => b.res!.msBeforeNext / 1000)));
}

export async function recordFailure(email: string, address: string): Promise<void> {
  await Promise.all([
    byAccount.penalty(email, 1),
    byAddress.penalty(address, 1),
  ]);
}

export async function recordSuccess(email: string): Promise<void> {
  await byAccount.delete(email);
}

/** Counts one mail request for each key; throws 429 past the limit. */
export async function consumeMailRequest(...keys: string[]): Promise<void> {
  try {
    for (const key of keys) await mailByKey.consume(key);
  } catch (rejection) {
    if (rejection instanceof RateLimiterRes) throw tooMany(rejection.msBeforeNext / 1000);
    throw rejection;
  }
}
