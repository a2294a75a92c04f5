import { describe, expect, test } from 'vitest';
import { HEAT_CONDITION_FIELDS } from './heat-conditions.ts';
import { MELT_VARIABLES, MELT_VARIABLE_IDS, findMeltVariable, meltVariableIdSchema } from './melt-variables.ts';

describe('MELT_VARIABLES', () => {
  test('when the ids are listed, then they are exactly the seventeen the engine traces causes to', () => {
    expect([...MELT_VARIABLE_IDS]).toEqual([
      'pour_temperature', 'hold_time', 'charge_condition', 'tool_preheat', 'humidity', 'degassing', 'fluxing',
      'skimming', 'mold_temperature', 'mold_coating', 'mold_venting', 'mold_moisture', 'pour_technique', 'feeding',
      'cooling', 'alloy_chemistry', 'crucible_condition',
    ]);
    expect(MELT_VARIABLES.map((v) => v.id)).toEqual([...MELT_VARIABLE_IDS]);
  });

  test.each(MELT_VARIABLES.map((v) => [v.id, v] as const))('when %s is read, then it explains itself and names real fields', (_, v) => {
    expect(v.explanation.length).toBeGreaterThan(30);
    for (const f of v.informedBy) expect(HEAT_CONDITION_FIELDS).toContain(f);
    expect(v.informedBy.length > 0 || v.usesAlloy).toBe(true);
  });

  test('when an id is looked up or parsed, then known ids pass and unknown ones do not', () => {
    expect(findMeltVariable('degassing')?.name).toBe('Degassing');
    expect(findMeltVariable('luck')).toBeUndefined();
    expect(meltVariableIdSchema.safeParse('luck').success).toBe(false);
  });
});
