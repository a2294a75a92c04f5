import { dictionary } from '@zxcvbn-ts/language-common';
import type { z } from 'zod';
import {
  commonPasswordIssues,
  createCommonPasswordCheck,
  type CommonPasswordCheck,
} from '../../shared/auth/password-policy.ts';

let check: CommonPasswordCheck | undefined;

/** Whether the password is on zxcvbn-ts's common-password list (built into a Set on first use). */
export function isCommonPassword(password: string): boolean {
  check ??= createCommonPasswordCheck(dictionary['passwords-common']);
  return check(password);
}

/**
 * `schema` that also refuses a common password in each of `fields`, as a
 * validation issue naming the field: the same 400 a too-short password gets.
 */
export function withPasswordPolicy<S extends z.ZodType>(schema: S, fields: readonly string[]): S {
  return schema.superRefine((value, ctx) => {
    for (const issue of commonPasswordIssues(value, fields, isCommonPassword)) {
      ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
    }
  }) as S;
}
