import { describe, expect, test } from 'vitest';
import { alloySchema, findAlloy } from './alloys.ts';
import type { Alloy } from './alloys.ts';
import { heatTreatmentPlan, tempersFor } from './heat-treatment.ts';
import { heatTreatmentScheduleSchema } from './heat-treatment-schedules.ts';
import type { HeatTreatmentStep } from './heat-treatment-schedules.ts';
import { cToF, fToC } from './units.ts';

const a356 = findAlloy('A356.0') as Alloy;
const step = <K extends HeatTreatmentStep['kind']>(steps: HeatTreatmentStep[], kind: K) =>
  steps.find((s) => s.kind === kind) as Extract<HeatTreatmentStep, { kind: K }>;

describe('heatTreatmentPlan', () => {
  test('when A356.0 T6 is planned, then it is solution 540 °C 6–12 h, water 65–100 °C, age 155 °C 3–5 h', () => {
    const plan = heatTreatmentPlan(a356, 'T6');
    expect(plan).toBeDefined();
    const steps = plan?.steps ?? [];
    expect(steps.map((s) => s.kind)).toEqual(['solution', 'quench', 'artificial_age']);

    // ASTM B917, A356.0-T6, as quoted in a published paper: 540 °C for 6–12 h, age 155 °C for 3–5 h.
    const solution = step(steps, 'solution');
    expect(solution.tempC).toEqual({ min: 540, max: 540 });
    expect(solution.durationMin).toEqual({ min: 360, max: 720 });
    expect(solution.source.citation).toContain('ASTM B917');
    const age = step(steps, 'artificial_age');
    expect(age.tempC).toEqual({ min: 155, max: 155 });
    expect(age.durationMin).toEqual({ min: 180, max: 300 });

    // Foundry design guide (secondary): water at 150–212 °F.
    const quench = step(steps, 'quench');
    expect(quench.medium).toBe('water');
    expect(Math.abs(quench.mediumTempC.min - fToC(150))).toBeLessThan(1);
    expect(quench.mediumTempC.max).toBeCloseTo(fToC(212), 9);
    expect(quench.source.grade).toBe('secondary');
    // Quench delay target 10–15 s is from memory; aerospace limits in SAE AMS 2771.
    expect(quench.maxDelayMin * 60).toBe(15);
    expect(quench.delaySource.citation).toContain('from memory');
    expect(quench.delaySource.citation).toContain('AMS 2771');
  });

  test('when the T6 temperatures are shown in °F, then they match the handbook round figures', () => {
    // Foundry design guide (secondary): 1000 °F solution, 4–12 h; handbooks print 310 °F for the age.
    expect(Math.round(cToF(540))).toBe(1004);
    expect(Math.round(cToF(155))).toBe(311);
    expect(Math.abs(cToF(540) - 1000)).toBeLessThan(5);
  });

  test('when the T5 schedule is planned, then it is an as-cast age at 205–230 °C for 7–9 h (secondary)', () => {
    // Foundry design guide 400 °F / 7–9 h; practitioner post 440 °F / 7–9 h.
    const age = step(heatTreatmentPlan(a356, 'T5')?.steps ?? [], 'artificial_age');
    expect(age.tempC).toEqual({ min: 205, max: 230 });
    expect(age.durationMin).toEqual({ min: 420, max: 540 });
    expect(Math.abs(fToC(400) - age.tempC.min)).toBeLessThan(1);
    expect(fToC(440)).toBeLessThan(age.tempC.max);
    expect(age.source.grade).toBe('secondary');
  });

  test.each([
    // all three from memory of ASM heat-treating tables
    ['T61', 155, 'memory'],
    ['T7', 225, 'memory'],
    ['T51', 227, 'memory'],
  ] as const)('when A356.0 %s is planned, then it ages at %d °C and says the value is from %s', (temper, tempC, grade) => {
    const plan = heatTreatmentPlan(a356, temper);
    const age = step(plan?.steps ?? [], 'artificial_age');
    expect(age.tempC.min).toBe(tempC);
    expect(age.source.grade).toBe(grade);
    expect(age.source.citation).toContain('from memory');
  });

  test('when 356.0 T6 is planned, then it matches A356.0 (same base alloy)', () => {
    expect(heatTreatmentPlan(findAlloy('356.0') as Alloy, 'T6')?.steps).toEqual(heatTreatmentPlan(a356, 'T6')?.steps);
  });

  test('when the plan lists sources, then each publication appears once', () => {
    const citations = heatTreatmentPlan(a356, 'T6')?.sources.map((s) => s.citation) ?? [];
    expect(new Set(citations).size).toBe(citations.length);
    expect(citations.length).toBe(3);
  });

  test.each([
    ['535.0', 'T6'],
    ['A356.0', 'T4'],
    ['Zamak 3', 'T5'],
  ] as const)('when %s has no %s schedule, then the plan is undefined', (designation, temper) => {
    expect(heatTreatmentPlan(findAlloy(designation) as Alloy, temper)).toBeUndefined();
  });

  test('when a workshop alloy based on A356.0 has no schedules, then it borrows the base T6 and says so', () => {
    const wheel = alloySchema.parse({
      designation: 'Wheel scrap',
      family: 'aluminium',
      commonName: 'wheel scrap, assumed A356',
      solidusC: 555,
      liquidusC: 615,
      densityGcm3: 2.68,
      basedOn: 'a356',
    });
    const plan = heatTreatmentPlan(wheel, 'T6');
    expect(plan?.inheritedFrom).toBe('A356.0');
    expect(plan?.designation).toBe('Wheel scrap');
    expect(tempersFor(wheel)).toEqual(['T6', 'T61', 'T7', 'T5', 'T51']);
  });

  test('when the schedules are validated, then each parses with heatTreatmentScheduleSchema', () => {
    for (const schedule of a356.heatTreatments) expect(heatTreatmentScheduleSchema.parse(schedule)).toEqual(schedule);
  });

  test('when A356.0 is solution treated, then the temperature stays below its 555 °C solidus (ASM Vol. 2)', () => {
    const solution = step(heatTreatmentPlan(a356, 'T6')?.steps ?? [], 'solution');
    expect(solution.tempC.max).toBeLessThan(a356.solidusC);
  });
});
