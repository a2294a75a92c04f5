import { createHash, randomBytes } from 'node:crypto';

/** A URL-safe secret for a link in an e-mail (256 bits). */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Only a token's hash is stored, so a database leak gives no usable links. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
