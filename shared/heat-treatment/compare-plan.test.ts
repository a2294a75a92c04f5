import { describe, expect, test } from 'vitest';
import { findAlloy, heatTreatmentPlan } from '../domain/index.ts';
import { OVEN_TOLERANCE_C, compareToPlan, describeDeviation, formatDurationRange, formatTemperatureRange } from './compare-plan.ts';
import type { StepActual } from './heat-treatment-schemas.ts';

// The A356.0-T6 plan from the trade core: ASTM B917 as quoted in a published
// paper (solution 540 °C for 6–12 h, water quench 65–100 °C, age 155 °C for
// 3–5 h) with the 15 s quench-delay target (from memory, see the schedule).
const a356 = findAlloy('A356.0')!;
const t6 = heatTreatmentPlan(a356, 'T6')!;
const solidusC = a356.solidusC;

const step = (stepIndex: number, values: Partial<StepActual>): StepActual => ({
  stepIndex,
  startedAt: null,
  endedAt: null,
  temperatureC: null,
  quenchMedium: null,
  quenchDelayS: null,
  notes: null,
  ...values,
});
const hours = (start: string, h: number) => ({ startedAt: start, endedAt: new Date(Date.parse(start) + h * 3_600_000).toISOString() });
const codes = (actuals: StepActual[]) => compareToPlan(t6, actuals, { solidusC }).deviations.map((d) => `${d.stepIndex}:${d.code}`);

describe('compareToPlan', () => {
  test('when nothing is recorded, then every step is not recorded and nothing deviates', () => {
    const result = compareToPlan(t6, [], { solidusC });
    expect(result.steps.map((s) => s.status)).toEqual(['not_recorded', 'not_recorded', 'not_recorded']);
    expect(result.worst).toBeNull();
    expect(result.steps[1].missing).toEqual(['quench_medium', 'temperature', 'quench_delay']);
  });

  test('when every step follows the plan, then all are as planned', () => {
    const result = compareToPlan(
      t6,
      [
        step(0, { ...hours('2026-11-30T06:00:00Z', 8), temperatureC: 540 }),
        step(1, { quenchMedium: 'water', temperatureC: 80, quenchDelayS: 9 }),
        step(2, { ...hours('2026-11-30T15:00:00Z', 4), temperatureC: 155 }),
      ],
      { solidusC },
    );
    expect(result.steps.map((s) => s.status)).toEqual(['as_planned', 'as_planned', 'as_planned']);
    expect(result.deviations).toEqual([]);
  });

  test.each([
    { temperatureC: 540 + OVEN_TOLERANCE_C, expected: [] },
    { temperatureC: 540 + OVEN_TOLERANCE_C + 1, expected: ['0:temperature_above_plan'] },
    { temperatureC: 540 - OVEN_TOLERANCE_C - 1, expected: ['0:temperature_below_plan'] },
    // At the solidus the casting can begin to melt: the danger replaces the plain "above plan".
    { temperatureC: solidusC, expected: ['0:at_or_above_solidus'] },
    { temperatureC: 577, expected: ['0:at_or_above_solidus'] },
  ])('when the solution reads $temperatureC °C, then $expected', ({ temperatureC, expected }) => {
    expect(codes([step(0, { temperatureC, ...hours('2026-11-30T06:00:00Z', 8) })])).toEqual(expected);
  });

  test.each([
    { h: 5.9, expected: ['0:duration_short'] },
    { h: 6, expected: [] },
    { h: 12, expected: [] },
    { h: 12.5, expected: ['0:duration_long'] },
  ])('when the solution lasts $h h, then $expected', ({ h, expected }) => {
    expect(codes([step(0, { temperatureC: 540, ...hours('2026-11-30T06:00:00Z', h) })])).toEqual(expected);
  });

  test.each([
    { values: { quenchMedium: 'water' as const, temperatureC: 65, quenchDelayS: 15 }, expected: [] },
    { values: { quenchMedium: 'water' as const, temperatureC: 20, quenchDelayS: 15 }, expected: ['1:temperature_below_plan'] },
    { values: { quenchMedium: 'water' as const, temperatureC: 70, quenchDelayS: 16 }, expected: ['1:quench_delay_over_max'] },
    { values: { quenchMedium: 'air' as const, temperatureC: 70, quenchDelayS: 5 }, expected: ['1:quench_medium_differs'] },
  ])('when the quench is $values, then $expected', ({ values, expected }) => {
    expect(codes([step(1, values)])).toEqual(expected);
  });

  test('when the solidus is not known, then a hot reading is only above plan', () => {
    const result = compareToPlan(t6, [step(0, { temperatureC: 560 })]);
    expect(result.deviations.map((d) => d.code)).toEqual(['temperature_above_plan']);
    expect(result.worst).toBe('caution');
  });

  test('when only the temperature is recorded, then the times are listed as missing, not as a deviation', () => {
    const [solution] = compareToPlan(t6, [step(0, { temperatureC: 541 })], { solidusC }).steps;
    expect(solution).toMatchObject({ status: 'as_planned', missing: ['times'], durationMin: null });
  });
});

describe('describeDeviation', () => {
  test('when the reader uses °F, then temperatures are in °F', () => {
    const [d] = compareToPlan(t6, [step(0, { temperatureC: 560 })], { solidusC }).deviations;
    expect(describeDeviation(d, 'C')).toContain('560 °C');
    expect(describeDeviation(d, 'F')).toContain('1040 °F');
    expect(describeDeviation(d, 'F')).toContain('1031 °F');
  });

  test('when the quench took too long, then the sentence names both delays in seconds', () => {
    const [d] = compareToPlan(t6, [step(1, { quenchMedium: 'water', temperatureC: 80, quenchDelayS: 30 })]).deviations;
    expect(describeDeviation(d, 'C')).toBe('Quench: 30 s from oven to tank, over the plan’s 15 s at most.');
  });
});

describe('formatting plan values', () => {
  test.each([
    [{ min: 360, max: 720 }, '6–12 h'],
    [{ min: 180, max: 180 }, '3 h'],
    [{ min: 45, max: 45 }, '45 min'],
    [{ min: 90, max: 150 }, '1.5–2.5 h'],
  ])('when the range is %o, then %s', (range, text) => {
    expect(formatDurationRange(range)).toBe(text);
  });

  test('when a range is shown in °F, then both ends convert (65–100 °C is 149–212 °F)', () => {
    expect(formatTemperatureRange({ min: 65, max: 100 }, 'F')).toBe('149–212 °F');
    expect(formatTemperatureRange({ min: 540, max: 540 }, 'F')).toBe('1004 °F');
  });
});
