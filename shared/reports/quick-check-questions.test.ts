import { describe, expect, test } from 'vitest';
import { DEFAULT_RULES } from '../domain/index.ts';
import type { Rule } from '../domain/index.ts';
import { quickCheckQuestions } from './quick-check-questions.ts';

describe('quickCheckQuestions', () => {
  test('when the defect is gas porosity, then the questions ask for pour temperature, degassing, charge and humidity', () => {
    // Act
    const questions = quickCheckQuestions(['gas_porosity'], DEFAULT_RULES);
    const fields = questions.flatMap((q) => q.fields);

    // Assert
    expect(questions.length).toBeLessThanOrEqual(5);
    expect(fields).toEqual(expect.arrayContaining(['pourTempC', 'degassed', 'chargeKind', 'relativeHumidityPct']));
    // The dew point is one question about two readings.
    expect(questions.find((q) => q.fields.includes('relativeHumidityPct'))?.fields).toEqual(['ambientTempC', 'relativeHumidityPct']);
  });

  test('when the defect is rounded edges, then mould material, pour temperature and mould temperature come first', () => {
    const questions = quickCheckQuestions(['rounded_edges'], DEFAULT_RULES);

    expect(questions.slice(0, 3).flatMap((q) => q.fields).sort()).toEqual(['moldMaterial', 'moldTempC', 'pourTempC']);
  });

  test('when several defects are asked about, then a rule shared by both counts once', () => {
    const rule: Rule = { ...DEFAULT_RULES[0], id: 'only-rule', defects: ['gas_porosity', 'pinholes'], weight: 0.5 };

    const [question] = quickCheckQuestions(['gas_porosity', 'pinholes'], [rule]);

    expect(question.weight).toBe(0.5);
  });

  test('when a rule is switched off (left out of the set), then its fields lose its weight', () => {
    const without = DEFAULT_RULES.filter((r) => r.id !== 'undegassed-gas');

    const fields = quickCheckQuestions(['gas_porosity'], without).flatMap((q) => q.fields);

    expect(fields).not.toContain('degassed');
  });

  test('when no rule speaks to the defect, then there are no questions', () => {
    expect(quickCheckQuestions(['flash'], [])).toEqual([]);
  });
});
