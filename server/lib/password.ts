import { createHash } from 'node:crypto';
import bcrypt from 'bcryptjs';

// bcrypt reads only the first 72 bytes of its input, so a long passphrase is
// first reduced to a fixed 44-byte SHA-256 digest: every character counts.
function prepare(password: string): string {
  return createHash('sha256').update(password, 'utf8').digest('base64');
}

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(prepare(password), cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(prepare(password), hash);
}

// Compared against when the e-mail is unknown, so both answers take as long.
const DUMMY_HASH = bcrypt.hashSync(prepare('no account has this password'), 12);
export async function burnPasswordCheck(password: string): Promise<false> {
  await bcrypt.compare(prepare(password), DUMMY_HASH);
  return false;
}
