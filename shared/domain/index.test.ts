import { describe, expect, test } from 'vitest';
import * as domain from './index.ts';

describe('shared/domain entry', () => {
  test.each([
    'cToF', 'fToC', 'gToOz', 'ozToG', 'kgToLb', 'lbToKg', 'formatTemperature', 'formatMass',
    'temperatureUnitSchema', 'massUnitSchema',
    'ALLOYS', 'findAlloy', 'alloySchema',
    'superheatC', 'pourYield', 'chargeFor', 'suggestSetpoint', 'DomainInputError',
    'dewPointC', 'saturationVapourPressureHpa', 'humidityRisk',
    'hydrogenSolubility',
    'modulusCm', 'chvorinovTimeMin', 'moldConstantFrom', 'cylinderRiserDiameterCm',
    'plateShape', 'barShape', 'cylinderShape', 'cubeShape', 'riserModulusRule',
    'patternDimension', 'heatTreatmentPlan', 'streamVelocity', 'meltEnergy', 'copeLiftForce',
    'DEFECT_KINDS', 'DEFECT_GROUPS', 'defectKindIdSchema', 'findDefectKind',
    'MELT_VARIABLES', 'meltVariableIdSchema',
    'heatConditionsSchema', 'CHARGE_KINDS', 'FLUX_KINDS', 'MOLD_MATERIALS', 'isMetalMold',
    'ruleSchema', 'ruleSetSchema', 'DEFAULT_RULES', 'diagnose', 'cautionsFor',
  ])('when %s is imported from the entry, then it is defined', (name) => {
    expect((domain as Record<string, unknown>)[name]).toBeDefined();
  });

  test('when the entry diagnoses a heat, then it behaves like the module behind it', () => {
    const alloy = domain.findAlloy('A356');
    const { causes } = domain.diagnose({ alloy, defects: [{ kind: 'gas_porosity', severity: 2 }], conditions: { degassed: false } });
    expect(causes[0].variable).toBe('degassing');
  });
});
