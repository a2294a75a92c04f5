// Password policy beyond length (NIST SP 800-63B §3.1.1.2, OWASP ASVS 5.0
// V6.2.4): no composition rules, but a password found on a list of commonly
// used passwords is refused. The list itself is data (49k entries, about
// 200 kB gzipped), so this module takes it as an argument: the server loads
// it once (server/lib/password-policy.ts); the client never downloads it and
// shows the server's field error instead.

import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from './auth-schemas.ts';

export const COMMON_PASSWORD_MESSAGE = 'This password is on a list of commonly used passwords; choose another';

/** How a password is compared with the list: surrounding spaces and letter case do not make it new. */
export function comparablePassword(password: string): string {
  return password.trim().toLowerCase();
}

export type CommonPasswordCheck = (password: string) => boolean;

/**
 * A check against `list`, with the list turned into a Set once, so each
 * check is one lookup.
 */
export function createCommonPasswordCheck(list: Iterable<string>): CommonPasswordCheck {
  const common = new Set<string>();
  for (const entry of list) common.add(comparablePassword(entry));
  return (password) => common.has(comparablePassword(password));
}

export type PasswordPolicyIssue = { path: string[]; message: string };

/**
 * An issue for each of `fields` in `values` that holds a common password,
 * shaped like a validation issue so it lands next to that form field. A
 * password already refused for its length gets only that one message.
 */
export function commonPasswordIssues(
  values: unknown,
  fields: readonly string[],
  isCommon: CommonPasswordCheck,
): PasswordPolicyIssue[] {
  if (typeof values !== 'object' || values === null) return [];
  const record = values as Record<string, unknown>;
  return fields
    .filter((field) => {
      const password = record[field];
      if (typeof password !== 'string') return false;
      const lengthOk = password.length >= PASSWORD_MIN_LENGTH && password.length <= PASSWORD_MAX_LENGTH;
      return lengthOk && isCommon(password);
    })
    .map((field) => ({ path: [field], message: COMMON_PASSWORD_MESSAGE }));
}
