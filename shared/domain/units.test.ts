import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import {
  cToF,
  cToK,
  fToC,
  formatMass,
  formatTemperature,
  formatTemperatureDifference,
  gToOz,
  kgToLb,
  kToC,
  lbPerIn3ToGPerCm3,
  lbToKg,
  massUnitSchema,
  ozToG,
  temperatureUnitSchema,
} from './units.ts';

describe('cToF / fToC', () => {
  // °F = °C × 9/5 + 32 (NIST SP 811, Appendix B.9); vectors are the
  // handbook conversions of aluminium melting and pouring temperatures.
  test.each([
    [660, 1220],
    [700, 1292],
    [720, 1328],
    [750, 1382],
    [540, 1004], // handbooks print the A356 solution temperature as 1000 °F
    [155, 311], // handbooks print the A356 ageing temperature as 310 °F
    [0, 32],
    [100, 212],
  ])('when %d °C is converted, then it is %d °F', (c, f) => {
    expect(cToF(c)).toBeCloseTo(f, 9);
    expect(fToC(f)).toBeCloseTo(c, 9);
  });

  test('when handbook round figures are converted back, then they sit within 4 °F of the metric values', () => {
    // 1000 °F and 310 °F as printed in US heat-treating tables.
    expect(Math.abs(cToF(540) - 1000)).toBeLessThanOrEqual(4);
    expect(Math.abs(cToF(155) - 310)).toBeLessThanOrEqual(1);
  });
});

describe('cToK / kToC', () => {
  test('when the ITS-90 aluminium point 660.323 °C is converted, then it is 933.473 K', () => {
    // Preston-Thomas, Metrologia 27 (1990): 933.473 K (value from memory).
    expect(cToK(660.323)).toBeCloseTo(933.473, 9);
    expect(kToC(933.473)).toBeCloseTo(660.323, 9);
  });
});

describe('mass conversions', () => {
  // Exact definitions: 1 lb = 0.45359237 kg, 1 oz = 1/16 lb (NIST SP 811, Appendix B.9).
  test('when one ounce is converted, then it is 28.349523125 g exactly', () => {
    expect(ozToG(1)).toBe(28.349523125);
    expect(gToOz(28.349523125)).toBeCloseTo(1, 12);
  });

  test('when one pound is converted, then it is 0.45359237 kg and sixteen ounces', () => {
    expect(lbToKg(1)).toBe(0.45359237);
    expect(kgToLb(0.45359237)).toBeCloseTo(1, 12);
    expect(ozToG(16)).toBeCloseTo(lbToKg(1) * 1000, 9);
  });

  test('when 0.0975 lb/in³ is converted, then it is about 2.70 g/cm³ (aluminium)', () => {
    // 1 lb/in³ = 27.679905 g/cm³ (NIST SP 811 conversion table).
    expect(lbPerIn3ToGPerCm3(1)).toBeCloseTo(27.679905, 5);
    expect(lbPerIn3ToGPerCm3(0.0975)).toBeCloseTo(2.699, 3);
  });
});

describe('formatTemperature', () => {
  test.each([
    [720, 'C', '720 °C'],
    [720, 'F', '1328 °F'],
    [660.323, 'C', '660 °C'],
    [-0.2, 'C', '0 °C'],
  ] as const)('when %d °C is shown in %s, then it reads "%s"', (c, pref, text) => {
    expect(formatTemperature(c, pref)).toBe(text);
  });

  test('when decimals are asked for, then they are printed', () => {
    expect(formatTemperature(660.323, 'C', 3)).toBe('660.323 °C');
  });
});

describe('formatTemperatureDifference', () => {
  test('when a 52 °C excess is shown in °F, then it is scaled by 9/5 without the 32 offset', () => {
    expect(formatTemperatureDifference(52, 'C')).toBe('52 °C');
    expect(formatTemperatureDifference(52, 'F')).toBe('94 °F');
  });
});

describe('formatMass', () => {
  test.each([
    [1000, 'g', undefined, '1000 g'],
    [1000, 'oz', undefined, '35.3 oz'],
    [28.349523125, 'oz', 2, '1.00 oz'],
  ] as const)('when %d g is shown in %s, then it reads "%s"', (g, pref, decimals, text) => {
    expect(formatMass(g, pref, decimals)).toBe(text);
  });
});

describe('unit preference schemas', () => {
  test('when a known unit is parsed, then it passes, and an unknown one is rejected', () => {
    expect(temperatureUnitSchema.parse('F')).toBe('F');
    expect(massUnitSchema.parse('oz')).toBe('oz');
    expect(temperatureUnitSchema.safeParse('K').success).toBe(false);
    expect(massUnitSchema.safeParse('lb').success).toBe(false);
  });
});

describe('unit conversions (properties)', () => {
  const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true });

  test('when any temperature goes to °F and back, then it returns unchanged', () => {
    fc.assert(fc.property(finite, (c) => Math.abs(fToC(cToF(c)) - c) <= 1e-9 * Math.max(1, Math.abs(c))));
  });

  test('when any mass goes to ounces or pounds and back, then it returns unchanged', () => {
    fc.assert(
      fc.property(finite, (g) => {
        const tol = 1e-9 * Math.max(1, Math.abs(g));
        return Math.abs(ozToG(gToOz(g)) - g) <= tol && Math.abs(lbToKg(kgToLb(g)) - g) <= tol;
      }),
    );
  });

  test('when temperatures are ordered, then their °F values never reverse the order', () => {
    fc.assert(fc.property(finite, finite, (a, b) => (a <= b ? cToF(a) <= cToF(b) : cToF(a) >= cToF(b))));
  });
});
