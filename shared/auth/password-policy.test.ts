import { describe, expect, test } from 'vitest';
import { COMMON_PASSWORD_MESSAGE, commonPasswordIssues, createCommonPasswordCheck } from './password-policy.ts';

describe('createCommonPasswordCheck', () => {
  const isCommon = createCommonPasswordCheck(['password1', 'Dragon2000 ', 'letmein']);

  test.each([
    ['password1', true],
    ['PASSWORD1', true],
    ['  password1  ', true],
    ['dragon2000', true],
    ['password12', false],
    ['pass word1', false],
    ['', false],
  ])('when checking %j, then common is %s', (password, expected) => {
    expect(isCommon(password)).toBe(expected);
  });
});

describe('commonPasswordIssues', () => {
  const isCommon = createCommonPasswordCheck(['letmein1']);

  test('when a named field holds a common password, then one issue names that field', () => {
    expect(commonPasswordIssues({ currentPassword: 'letmein1', newPassword: 'LetMeIn1' }, ['newPassword'], isCommon)).toEqual([
      { path: ['newPassword'], message: COMMON_PASSWORD_MESSAGE },
    ]);
  });

  test('when the common password is also too short, then only the length rule speaks', () => {
    const short = createCommonPasswordCheck(['short']);
    expect(commonPasswordIssues({ password: 'short' }, ['password'], short)).toEqual([]);
  });

  test('when the value is not an object or the field is missing, then no issue', () => {
    expect(commonPasswordIssues(null, ['password'], isCommon)).toEqual([]);
    expect(commonPasswordIssues({}, ['password'], isCommon)).toEqual([]);
    expect(commonPasswordIssues({ password: 42 }, ['password'], isCommon)).toEqual([]);
  });
});
