import { describe, expect, test } from 'vitest';
import { HYDROGEN_SOLUBILITY_COEFFICIENTS, hydrogenSolubility } from './hydrogen.ts';
import { ITS90_FREEZING_POINTS_C } from './its90.ts';

const MP = ITS90_FREEZING_POINTS_C.aluminium;

describe('hydrogenSolubility', () => {
  // Ransley & Neufeld, J. Inst. Metals 74 (1948) 559: log10 S = −2760/T + 2.796
  // (liquid), −2080/T + 0.788 (solid); the constants are from memory.
  test.each([
    [660, 'liquid', 0.689],
    [700, 'liquid', 0.912],
    [750, 'liquid', 1.254],
    [800, 'liquid', 1.675],
    [660, 'solid', 0.0362],
    [700, 'solid', 0.0447],
    [750, 'solid', 0.0569],
    [800, 'solid', 0.0708],
  ] as const)('when aluminium is at %d °C (%s, 1 atm H₂), then Ransley & Neufeld (constants from memory) give %d mL/100 g', (tempC, phase, s) => {
    expect(hydrogenSolubility({ tempC, phase })).toBeCloseTo(s, phase === 'liquid' ? 3 : 4);
  });

  test('when the Ransley & Neufeld constants are read, then they are marked from memory', () => {
    expect(HYDROGEN_SOLUBILITY_COEFFICIENTS['ransley-neufeld-1948'].liquid?.source.citation).toContain('from memory');
  });

  // Talbot & Anyalebechi, Mater. Sci. Technol. 4(1) (1988) 1–4, recommended
  // equation log10 S = −2700/T + 2.72 for liquid pure aluminium.
  test.each([
    [660, 0.671],
    [700, 0.882],
    [750, 1.205],
    [800, 1.6],
  ])('when liquid aluminium is at %d °C, then Talbot & Anyalebechi give %d mL/100 g', (tempC, s) => {
    expect(hydrogenSolubility({ tempC, phase: 'liquid', model: 'talbot-anyalebechi-1988' })).toBeCloseTo(s, 3);
  });

  test.each([660, 700, 750, 800])(
    'when liquid aluminium is at %d °C, then Ransley & Neufeld agree with Talbot & Anyalebechi within 5 %',
    (tempC) => {
      const rn = hydrogenSolubility({ tempC, phase: 'liquid' });
      const ta = hydrogenSolubility({ tempC, phase: 'liquid', model: 'talbot-anyalebechi-1988' });
      expect(Math.abs(rn / ta - 1)).toBeLessThan(0.05);
    },
  );

  test('when aluminium is at its melting point, then liquid solubility is within 5 % of 0.71 mL/100 g (Anyalebechi, critical review)', () => {
    const s = hydrogenSolubility({ tempC: MP, phase: 'liquid' });
    expect(Math.abs(s / 0.71 - 1)).toBeLessThan(0.05);
  });

  test('when aluminium is at its melting point, then the liquid holds about 19 times the solid (literature: 10–20×)', () => {
    const ratio = hydrogenSolubility({ tempC: MP, phase: 'liquid' }) / hydrogenSolubility({ tempC: MP, phase: 'solid' });
    expect(ratio).toBeCloseTo(19, 0);
    expect(ratio).toBeGreaterThanOrEqual(10);
    expect(ratio).toBeLessThanOrEqual(20);
  });

  test("when the hydrogen pressure is 0.01 atm, then Sieverts' square-root law gives a tenth", () => {
    const atOne = hydrogenSolubility({ tempC: 700, phase: 'liquid' });
    expect(hydrogenSolubility({ tempC: 700, phase: 'liquid', pressureAtm: 0.01 })).toBeCloseTo(atOne * 0.1, 12);
    expect(hydrogenSolubility({ tempC: 700, phase: 'liquid', pressureAtm: 0 })).toBe(0);
  });

  test('when solid solubility is asked of the liquid-only model, or the input is impossible, then it throws', () => {
    expect(() => hydrogenSolubility({ tempC: 600, phase: 'solid', model: 'talbot-anyalebechi-1988' })).toThrow();
    expect(() => hydrogenSolubility({ tempC: -300, phase: 'liquid' })).toThrow();
    expect(() => hydrogenSolubility({ tempC: 700, phase: 'liquid', pressureAtm: -1 })).toThrow();
    expect(() => hydrogenSolubility({ tempC: Number.NaN, phase: 'liquid' })).toThrow();
  });
});
