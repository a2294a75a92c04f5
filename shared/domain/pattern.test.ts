import { describe, expect, test } from 'vitest';
import { SHOP_TEXT_ALLOWANCES, SHRINK_RULES, patternDimension, shrinkPctFromInchesPerFoot } from './pattern.ts';

describe('shrinkPctFromInchesPerFoot', () => {
  // Patternmaker's rules in inches per foot as printed in W. H. Dooley,
  // Applied Science for Metal Workers, and Shop Practice vol. 2 (shrinkage rules).
  test.each([
    [1 / 8, 1.04],
    [5 / 32, 1.3],
    [3 / 16, 1.56],
    [7 / 32, 1.82],
    [1 / 4, 2.08],
  ])('when a rule is %d in/ft, then it is %d %%', (inPerFt, pct) => {
    expect(shrinkPctFromInchesPerFoot(inPerFt)).toBeCloseTo(pct, 2);
  });

  test('when the rule list is read, then each label matches its value', () => {
    for (const rule of SHRINK_RULES) {
      const [num, den] = rule.label.split(' ')[0].split('/').map(Number);
      expect(rule.inchesPerFoot).toBe(num / den);
    }
  });
});

describe('SHOP_TEXT_ALLOWANCES', () => {
  test('when the early shop texts are compared, then they disagree for cast iron (3/32 against 1/8 in/ft)', () => {
    const iron = SHOP_TEXT_ALLOWANCES.filter((a) => a.metal === 'cast iron');
    expect(iron.map((a) => a.inchesPerFoot).sort()).toEqual([3 / 32, 1 / 8]);
    expect(iron.map((a) => a.source.citation).join(' ')).toContain('Dooley');
    expect(iron.map((a) => a.source.citation).join(' ')).toContain('Shop Practice vol. 2');
  });

  test('when Dooley\'s aluminium allowance is read, then it is 7/32 in/ft', () => {
    expect(SHOP_TEXT_ALLOWANCES.find((a) => a.metal === 'aluminium')?.inchesPerFoot).toBe(7 / 32);
  });
});

describe('patternDimension', () => {
  test('when a 300 mm aluminium casting shrinks 1.3 %, then the pattern is 303.9 mm', () => {
    expect(patternDimension({ castingMm: 300, shrinkPct: 1.3 })).toBeCloseTo(303.9, 9);
  });

  test('when the allowance is 1/8 in/ft, then a foot-long casting needs a pattern one-eighth inch longer', () => {
    const footMm = 304.8;
    expect(patternDimension({ castingMm: footMm, shrinkPct: shrinkPctFromInchesPerFoot(1 / 8) }) - footMm).toBeCloseTo(3.175, 9);
  });

  test('when the inputs are impossible, then it throws', () => {
    expect(() => patternDimension({ castingMm: -1, shrinkPct: 1 })).toThrow();
    expect(() => patternDimension({ castingMm: 10, shrinkPct: -1 })).toThrow();
  });
});
