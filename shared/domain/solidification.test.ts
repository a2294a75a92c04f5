import { describe, expect, test } from 'vitest';
import {
  barShape,
  chvorinovTimeMin,
  cubeShape,
  cylinderRiserDiameterCm,
  cylinderShape,
  modulusCm,
  moldConstantFrom,
  plateShape,
  riserModulusRule,
} from './solidification.ts';

describe('GATE 2018 ME riser worked example', () => {
  // GATE 2018 Mechanical Engineering, published question and solution:
  // steel plate 80 × 120 × 20 mm freezes in 2 min; n = 2; cylindrical riser
  // H = D must freeze in 3 min. M_c = 7.059 mm, K = 0.040139 min/mm²,
  // M_r = 8.645 mm, D = 6·M_r = 51.87 mm. Functions work in cm.
  const plate = plateShape({ lengthCm: 8, widthCm: 12, thicknessCm: 2 });

  test('when the plate modulus is computed, then it is 7.059 mm', () => {
    expect(modulusCm(plate) * 10).toBeCloseTo(7.059, 3);
  });

  test('when the mould constant is fitted from 2 min, then it is 0.040139 min/mm² (4.0139 min/cm²)', () => {
    const k = moldConstantFrom({ ...plate, timeMin: 2, n: 2 });
    expect(k / 100).toBeCloseTo(0.040139, 6);
    expect(chvorinovTimeMin({ ...plate, moldConstant: k })).toBeCloseTo(2, 12);
  });

  test('when the riser must last 3 min, then its diameter is 51.87 mm (modulus 8.645 mm)', () => {
    const k = moldConstantFrom({ ...plate, timeMin: 2 });
    const d = cylinderRiserDiameterCm({ timeMin: 3, moldConstant: k, heightOverDiameter: 1 });
    expect(d * 10).toBeCloseTo(51.87, 2);
    expect((d / 6) * 10).toBeCloseTo(8.645, 3);
    const riser = cylinderShape({ diameterCm: d, heightCm: d });
    expect(chvorinovTimeMin({ ...riser, moldConstant: k })).toBeCloseTo(3, 9);
  });

  test('when the worked riser is checked against the modulus rule, then 8.645/7.059 = 1.22 satisfies 1.2× (Wlodawer, from memory)', () => {
    const rule = riserModulusRule({ castingModulusCm: 0.7059, riserModulusCm: 0.8645 });
    expect(rule.satisfied).toBe(true);
    expect(rule.minRiserModulusCm).toBeCloseTo(0.84708, 6);
    expect(rule.neckModulusCm).toBeCloseTo(0.77649, 6);
    expect(rule.sources[0].citation).toContain('from memory');
  });
});

describe('shape moduli', () => {
  // Standard results for the casting modulus M = V/A (foundry texts; all faces cooling unless stated).
  test('when a cylinder has H = D and all faces cool, then M = D/6', () => {
    expect(modulusCm(cylinderShape({ diameterCm: 6, heightCm: 6 }))).toBeCloseTo(1, 12);
  });

  test('when a cylinder has H = D and its bottom sits on the casting, then M = D/5', () => {
    expect(modulusCm(cylinderShape({ diameterCm: 5, heightCm: 5, bottomCools: false }))).toBeCloseTo(1, 12);
  });

  test('when a general cylinder cools on top and sides, then M = D·H/(4H + D)', () => {
    const d = 4;
    const h = 10;
    expect(modulusCm(cylinderShape({ diameterCm: d, heightCm: h, bottomCools: false }))).toBeCloseTo((d * h) / (4 * h + d), 12);
  });

  test('when the riser is taller than wide (H = 1.5 D), then D = M·(4k + 2)/k', () => {
    const d = cylinderRiserDiameterCm({ timeMin: 4, moldConstant: 1, heightOverDiameter: 1.5 });
    expect(modulusCm(cylinderShape({ diameterCm: d, heightCm: 1.5 * d }))).toBeCloseTo(2, 12);
  });

  test('when a plate becomes very large, then its modulus tends to t/2', () => {
    expect(modulusCm(plateShape({ lengthCm: 1e6, widthCm: 1e6, thicknessCm: 3 }))).toBeCloseTo(1.5, 4);
  });

  test('when a square bar is long and its ends do not cool, then M = a/4', () => {
    expect(modulusCm(barShape({ lengthCm: 50, widthCm: 4, heightCm: 4, endsCool: false }))).toBeCloseTo(1, 12);
  });

  test('when a cube of side a cools on all faces, then M = a/6', () => {
    expect(modulusCm(cubeShape({ sideCm: 6 }))).toBeCloseTo(1, 12);
    expect(modulusCm(plateShape({ lengthCm: 6, widthCm: 6, thicknessCm: 6 }))).toBeCloseTo(1, 12);
  });

  test('when a size is zero or NaN, then it throws', () => {
    expect(() => plateShape({ lengthCm: 0, widthCm: 1, thicknessCm: 1 })).toThrow();
    expect(() => modulusCm({ volumeCm3: Number.NaN, areaCm2: 1 })).toThrow();
  });
});

describe('riserModulusRule', () => {
  test('when a riser modulus is below 1.2× the casting, then it is not satisfied', () => {
    expect(riserModulusRule({ castingModulusCm: 1, riserModulusCm: 1.1 }).satisfied).toBe(false);
    expect(riserModulusRule({ castingModulusCm: 1 }).satisfied).toBeUndefined();
  });
});
