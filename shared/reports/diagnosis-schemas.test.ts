import { describe, expect, test } from 'vitest';
import { diagnosisRequestSchema, missingFieldsOf, quickCheckQuestionsQuerySchema, rankingKey } from './diagnosis-schemas.ts';

describe('missingFieldsOf', () => {
  test('when causes wait on fields, then each field is listed once in form order with its label and the causes waiting', () => {
    const missing = missingFieldsOf([
      { variable: 'humidity', missing: ['relativeHumidityPct', 'ambientTempC'] },
      { variable: 'pour_temperature', missing: ['pourTempC'] },
      { variable: 'mold_moisture', missing: ['ambientTempC'] },
    ]);

    expect(missing).toEqual([
      { field: 'pourTempC', label: 'pour temperature', variables: ['pour_temperature'] },
      { field: 'ambientTempC', label: 'air temperature', variables: ['humidity', 'mold_moisture'] },
      { field: 'relativeHumidityPct', label: 'relative humidity', variables: ['humidity'] },
    ]);
  });
});

describe('rankingKey', () => {
  test('when only scores differ, then the key is the same; when order or status differs, then it changes', () => {
    const a = rankingKey([{ variable: 'degassing', status: 'confirmed' }, { variable: 'humidity', status: 'suspected' }]);

    expect(rankingKey([{ variable: 'degassing', status: 'confirmed' }, { variable: 'humidity', status: 'suspected' }])).toBe(a);
    expect(rankingKey([{ variable: 'humidity', status: 'suspected' }, { variable: 'degassing', status: 'confirmed' }])).not.toBe(a);
    expect(rankingKey([{ variable: 'degassing', status: 'normal' }, { variable: 'humidity', status: 'suspected' }])).not.toBe(a);
  });
});

describe('request schemas', () => {
  test.each([
    [{ defects: [], conditions: {} }, true],
    [{ defects: [], conditions: { pourTemp: 700 } }, false],
    [{ alloy: 'a356', defects: [{ kind: 'misrun', severity: 2 }] }, true],
    [{ defects: [{ kind: 'misrun', severity: 0 }] }, false],
  ])('when a what-if is %j, then it parses: %s', (body, ok) => {
    expect(diagnosisRequestSchema.safeParse(body).success).toBe(ok);
  });

  test('when kinds come comma-separated or repeated, then both give the same list', () => {
    expect(quickCheckQuestionsQuerySchema.parse({ kinds: 'gas_porosity, pinholes' }).kinds).toEqual(['gas_porosity', 'pinholes']);
    expect(quickCheckQuestionsQuerySchema.parse({ kinds: ['gas_porosity', 'pinholes'] }).kinds).toEqual(['gas_porosity', 'pinholes']);
  });
});
