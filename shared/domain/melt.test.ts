import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { findAlloy } from './alloys.ts';
import type { Alloy } from './alloys.ts';
import { DomainInputError } from './errors.ts';
import { chargeFor, median, meltEnergy, pourYield, suggestSetpoint, superheatC } from './melt.ts';

const a356 = findAlloy('A356.0') as Alloy;

const errorOf = (fn: () => unknown): DomainInputError | undefined => {
  try {
    fn();
  } catch (e) {
    return e as DomainInputError;
  }
  return undefined;
};

describe('superheatC', () => {
  test('when A356.0 is poured at 720 °C, then the superheat is 105 °C over its 615 °C liquidus (ASM Vol. 2)', () => {
    expect(superheatC(720, a356)).toBe(105);
  });

  test('when the pour is below the liquidus, then the superheat is negative', () => {
    expect(superheatC(600, a356)).toBe(-15);
  });
});

describe('pourYield', () => {
  test('when 450 kg of castings come from 600 kg poured, then the yield is 75 % (Giesserei-Lexikon, "Output")', () => {
    expect(pourYield({ chargeG: 600_000, castingG: 450_000 })).toEqual({ yieldPct: 75, remainderG: 150_000 });
  });

  test.each([
    ['negative casting', { chargeG: 100, castingG: -1 }, 'castingG', 'negative'],
    ['zero charge', { chargeG: 0, castingG: 0 }, 'chargeG', 'not-positive'],
    ['NaN charge', { chargeG: Number.NaN, castingG: 1 }, 'chargeG', 'not-a-number'],
    ['casting heavier than charge', { chargeG: 100, castingG: 101 }, 'castingG', 'casting-heavier-than-charge'],
  ])('when given a %s, then it throws a DomainInputError naming the field', (_, input, field, code) => {
    const error = errorOf(() => pourYield(input));
    expect(error).toBeInstanceOf(DomainInputError);
    expect(error).toMatchObject({ field, code, name: 'DomainInputError' });
  });
});

describe('chargeFor', () => {
  test('when a 450 g casting is expected at 75 % yield, then 600 g is weighed out', () => {
    expect(chargeFor({ castingG: 450, expectedYieldPct: 75 })).toBe(600);
  });

  test('when a 10 % margin is added, then the charge rises by 10 % and rounds up to the gram', () => {
    expect(chargeFor({ castingG: 450, expectedYieldPct: 75, marginPct: 10 })).toBe(660);
    expect(chargeFor({ castingG: 100, expectedYieldPct: 70 })).toBe(143);
  });

  test.each([
    ['yield 0', { castingG: 100, expectedYieldPct: 0 }, 'expectedYieldPct'],
    ['yield above 100', { castingG: 100, expectedYieldPct: 101 }, 'expectedYieldPct'],
    ['negative margin', { castingG: 100, expectedYieldPct: 50, marginPct: -5 }, 'marginPct'],
    ['NaN casting', { castingG: Number.NaN, expectedYieldPct: 50 }, 'castingG'],
  ])('when given %s, then it throws for that field', (_, input, field) => {
    expect(errorOf(() => chargeFor(input))).toMatchObject({ field });
  });

  test('when any valid casting and yield are given, then pouring the charge gives back at least the casting', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e6, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (castingG, expectedYieldPct) => {
          const charge = chargeFor({ castingG, expectedYieldPct });
          return (charge * expectedYieldPct) / 100 >= castingG - 1e-6;
        },
      ),
    );
  });
});

describe('suggestSetpoint', () => {
  test('when the furnace usually reads 20 °C under its setpoint, then it sets 20 °C above the target', () => {
    const history = [700, 710, 720].map((setpointC) => ({ setpointC, measuredC: setpointC - 20 }));
    expect(suggestSetpoint({ targetC: 720, history })).toEqual({
      setpointC: 740,
      offsetC: -20,
      spreadC: 0,
      samples: 3,
      basis: 'history',
    });
  });

  test('when one heat is an outlier, then the median offset ignores it and the MAD reports the spread', () => {
    const history = [
      { setpointC: 740, measuredC: 722 }, // −18
      { setpointC: 740, measuredC: 720 }, // −20
      { setpointC: 740, measuredC: 718 }, // −22
      { setpointC: 740, measuredC: 721 }, // −19
      { setpointC: 740, measuredC: 640 }, // −100: lid left off
    ];
    const result = suggestSetpoint({ targetC: 700, history });
    expect(result.offsetC).toBe(-20);
    expect(result.setpointC).toBe(720);
    expect(result.spreadC).toBe(2);
  });

  test('when there is no history, then it returns the target and says so', () => {
    expect(suggestSetpoint({ targetC: 700, history: [] })).toEqual({
      setpointC: 700,
      offsetC: 0,
      spreadC: 0,
      samples: 0,
      basis: 'no-history',
    });
  });

  test('when a heat has a NaN reading, then it throws naming the entry', () => {
    expect(errorOf(() => suggestSetpoint({ targetC: 700, history: [{ setpointC: 700, measuredC: Number.NaN }] }))).toMatchObject({
      field: 'history[0].measuredC',
    });
  });

  test('when median is taken of an even list, then it averages the middle pair', () => {
    expect(median([4, 1, 3, 2])).toBe(2.5);
  });
});

describe('meltEnergy', () => {
  test('when 1 kg of aluminium goes from 20 °C to 720 °C, then it needs about 1.08 MJ (0.30 kWh) — heat data from memory', () => {
    // 0.95 J/g·K × 640 K + 397 J/g + 1.18 J/g·K × 60 K ≈ 1076 J/g (handbook heat data, from memory)
    const { energyKj, energyKwh } = meltEnergy({ massG: 1000, fromC: 20, toC: 720 });
    expect(energyKj).toBeCloseTo(1076, -1);
    expect(energyKwh).toBeCloseTo(0.3, 1);
  });

  test('when the metal is heated but not melted, then only sensible heat counts', () => {
    expect(meltEnergy({ massG: 1000, fromC: 20, toC: 120 }).energyKj).toBeCloseTo(95, 6);
  });
});
