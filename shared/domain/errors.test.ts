import { describe, expect, test } from 'vitest';
import { DomainInputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from './errors.ts';

describe('DomainInputError', () => {
  test('when thrown, then it is an Error with its field, code and name', () => {
    const error = new DomainInputError('chargeG', 'negative', 'chargeG must not be negative');
    expect(error).toBeInstanceOf(Error);
    expect(error).toMatchObject({ name: 'DomainInputError', field: 'chargeG', code: 'negative' });
  });

  test.each([
    ['a NaN', () => requireFinite('x', Number.NaN), 'not-a-number'],
    ['infinity', () => requireFinite('x', Number.POSITIVE_INFINITY), 'not-a-number'],
    ['a negative', () => requireNonNegative('x', -1), 'negative'],
    ['zero where positive is needed', () => requirePositive('x', 0), 'not-positive'],
    ['0 in (0, 100]', () => requireInRange('x', 0, { min: 0, max: 100, minExclusive: true }), 'out-of-range'],
    ['101 in [0, 100]', () => requireInRange('x', 101, { min: 0, max: 100 }), 'out-of-range'],
  ])('when a guard meets %s, then it throws with that code', (_, fn, code) => {
    expect(fn).toThrow(DomainInputError);
    try {
      fn();
    } catch (e) {
      expect((e as DomainInputError).code).toBe(code);
    }
  });

  test('when a guard meets a good value, then it returns it', () => {
    expect(requireInRange('x', 100, { min: 0, max: 100, minExclusive: true })).toBe(100);
    expect(requireNonNegative('x', 0)).toBe(0);
  });
});
