import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import {
  DEFAULT_HUMIDITY_BANDS,
  HUMIDITY_BANDS_SOURCE,
  MAGNUS,
  MAGNUS_SOURCE,
  dewPointC,
  humidityRisk,
  saturationVapourPressureHpa,
  vapourPressureHpa,
} from './humidity.ts';

describe('saturationVapourPressureHpa', () => {
  // Magnus form with Alduchov & Eskridge 1996 coefficients (a = 17.625,
  // b = 243.04 °C), quoted by a dew-point calculator page (secondary).
  test.each([
    [20, 23.33],
    [30, 42.37],
  ])('when the air is %d °C, then saturation pressure is %d hPa', (t, es) => {
    expect(saturationVapourPressureHpa(t)).toBeCloseTo(es, 2);
  });

  test('when the coefficients are read, then they are the Alduchov & Eskridge 1996 values', () => {
    expect(MAGNUS).toEqual({ a: 17.625, b: 243.04, e0Hpa: 6.1094 });
    expect(MAGNUS_SOURCE.citation).toContain('Alduchov');
  });

  test('when extrapolated to 100 °C, then it stays within 3 % of one standard atmosphere', () => {
    // Water boils at 100 °C under 1013.25 hPa; the Magnus fit is only claimed
    // for −40…60 °C, so this is a loose sanity check of the extrapolation.
    expect(Math.abs(saturationVapourPressureHpa(100) / 1013.25 - 1)).toBeLessThan(0.03);
  });
});

describe('dewPointC', () => {
  test.each([
    [30, 80, 26.17],
    [20, 50, 9.26],
  ])('when the air is %d °C at %d %% RH, then the dew point is %d °C', (tempC, rh, td) => {
    expect(dewPointC({ tempC, relativeHumidityPct: rh })).toBeCloseTo(td, 2);
  });

  test('when the air is saturated, then the dew point equals the air temperature', () => {
    expect(dewPointC({ tempC: 17, relativeHumidityPct: 100 })).toBeCloseTo(17, 9);
  });

  test('when the relative humidity is 0 or above 100 %, then it throws', () => {
    expect(() => dewPointC({ tempC: 20, relativeHumidityPct: 0 })).toThrow();
    expect(() => dewPointC({ tempC: 20, relativeHumidityPct: 101 })).toThrow();
  });

  test('when any air state is given, then the dew point is at most the air temperature and its vapour pressure matches', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 60, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (tempC, rh) => {
        const td = dewPointC({ tempC, relativeHumidityPct: rh });
        const e = vapourPressureHpa({ tempC, relativeHumidityPct: rh });
        return td <= tempC + 1e-9 && Math.abs(saturationVapourPressureHpa(td) / e - 1) < 1e-9;
      }),
    );
  });
});

describe('humidityRisk', () => {
  test.each([
    [-3, 'low'],
    [4.9, 'low'],
    [5, 'moderate'],
    [15, 'moderate'],
    [15.1, 'high'],
    [26.17, 'high'],
  ] as const)('when the dew point is %d °C, then the default bands say %s (app heuristic)', (td, risk) => {
    expect(humidityRisk(td)).toBe(risk);
  });

  test('when a workshop sets its own bands, then they are used', () => {
    expect(humidityRisk(8, { moderateFromC: 10, highAboveC: 12 })).toBe('low');
    expect(humidityRisk(13, { moderateFromC: 10, highAboveC: 12 })).toBe('high');
  });

  test('when the default bands are read, then they are 5 and 15 °C and labelled an app heuristic', () => {
    expect(DEFAULT_HUMIDITY_BANDS).toEqual({ moderateFromC: 5, highAboveC: 15 });
    expect(HUMIDITY_BANDS_SOURCE.grade).toBe('heuristic');
  });
});
