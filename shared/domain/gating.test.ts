import { describe, expect, test } from 'vitest';
import { findAlloy } from './alloys.ts';
import { CRITICAL_INGATE_VELOCITY_M_S, CRITICAL_INGATE_VELOCITY_SOURCE, copeLiftForce, fallHeightForVelocityCm, streamVelocity } from './gating.ts';
import { DomainInputError } from './errors.ts';

describe('streamVelocity', () => {
  // v = √(2gh), free fall under standard gravity (textbook kinematics).
  test.each([
    [5, 0.99],
    [10, 1.4],
    [30, 2.43],
  ])('when the stream falls %d cm, then it reaches %d m/s', (heightCm, v) => {
    expect(streamVelocity(heightCm)).toBeCloseTo(v, 2);
  });

  test('when the height is negative, then it throws', () => {
    expect(() => streamVelocity(-1)).toThrow(DomainInputError);
  });
});

describe('critical ingate velocity', () => {
  test('when the 0.5 m/s limit (Campbell, Castings 2nd ed., from memory) is turned into a fall, then it is only 12–13 mm', () => {
    expect(CRITICAL_INGATE_VELOCITY_M_S).toBe(0.5);
    expect(CRITICAL_INGATE_VELOCITY_SOURCE.citation).toContain('from memory');
    const cm = fallHeightForVelocityCm(CRITICAL_INGATE_VELOCITY_M_S);
    expect(cm).toBeGreaterThan(1.2);
    expect(cm).toBeLessThan(1.3);
  });
});

describe('copeLiftForce', () => {
  test('when liquid aluminium stands 1 m high, then it presses about 23 kPa (ρ·g·h with ρ ≈ 2370 kg/m³)', () => {
    // Hydrostatics p = ρ·g·h; 1 m² of area turns pressure into force.
    const { forceN } = copeLiftForce({ metalDensityGcm3: 2.37, headCm: 100, projectedAreaCm2: 10_000 });
    expect(forceN / 1000).toBeCloseTo(23.2, 1);
  });

  test('when the lift is balanced, then the weight equals the metal column above the projected area', () => {
    const pure = findAlloy('Pure Al');
    const rho = pure?.liquidDensityGcm3 ?? 0;
    const { balancingMassG } = copeLiftForce({ metalDensityGcm3: rho, headCm: 15, projectedAreaCm2: 200 });
    expect(balancingMassG).toBeCloseTo(rho * 15 * 200, 6);
  });
});
