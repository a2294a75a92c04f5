// The trade core's one public entry: other code imports from here, so the
// files behind it can move without breaking callers.

export {
  DOMAIN_ERROR_CODES,
  DomainInputError,
} from './errors.ts';
export type { DomainErrorCode } from './errors.ts';

export {
  PUBLICATIONS,
  SOURCE_GRADES,
  sourceNoteSchema,
} from './sources.ts';
export type { SourceGrade, SourceNote } from './sources.ts';

export { inRange, rangeSchema } from './range.ts';
export type { Range } from './range.ts';

export {
  GRAMS_PER_OUNCE,
  KELVIN_OFFSET,
  KILOGRAMS_PER_POUND,
  MASS_UNITS,
  STANDARD_GRAVITY,
  TEMPERATURE_UNITS,
  UNIT_SPACE,
  cToF,
  cToK,
  fToC,
  formatMass,
  formatNumber,
  formatTemperature,
  formatTemperatureDifference,
  gToOz,
  inToCm,
  kToC,
  kgToLb,
  lbPerIn3ToGPerCm3,
  lbToKg,
  massUnitSchema,
  ozToG,
  temperatureUnitSchema,
} from './units.ts';
export type { MassUnit, TemperatureUnit } from './units.ts';

export { ITS90_FREEZING_POINTS_C, ITS90_SOURCE } from './its90.ts';
export type { Its90Metal } from './its90.ts';

export {
  ALLOYS,
  ALLOY_FAMILIES,
  ALLOY_TRAITS,
  MOULD_KINDS,
  alloySchema,
  alloySourcesSchema,
  deriveAlloy,
  designationKey,
  findAlloy,
  pourRangeFor,
} from './alloys.ts';
export type { Alloy, AlloyFamily, AlloyInput, AlloySources, AlloyTrait, MouldKind } from './alloys.ts';

export {
  QUENCH_MEDIA,
  TEMPERS,
  heatTreatmentScheduleSchema,
  heatTreatmentStepSchema,
  temperSchema,
} from './heat-treatment-schedules.ts';
export type { HeatTreatmentSchedule, HeatTreatmentStep, QuenchMedium, Temper } from './heat-treatment-schedules.ts';
export { heatTreatmentPlan, tempersFor } from './heat-treatment.ts';
export type { HeatTreatmentPlan } from './heat-treatment.ts';

export {
  ALUMINIUM_HEAT_PROPERTIES,
  ALUMINIUM_HEAT_PROPERTIES_SOURCE,
  CASTING_YIELD_SOURCE,
  chargeFor, median, meltEnergy, pourYield, suggestSetpoint, superheatC } from './melt.ts';
export type { SetpointSuggestion } from './melt.ts';

export {
  CRITICAL_INGATE_VELOCITY_M_S,
  CRITICAL_INGATE_VELOCITY_SOURCE,
  copeLiftForce,
  fallHeightForVelocityCm,
  streamVelocity,
} from './gating.ts';

export {
  DEFAULT_HUMIDITY_BANDS,
  HUMIDITY_BANDS_SOURCE,
  HUMIDITY_RISK_LEVELS,
  MAGNUS,
  MAGNUS_SOURCE,
  dewPointC,
  humidityBandsSchema,
  humidityRisk,
  saturationVapourPressureHpa,
  vapourPressureHpa,
} from './humidity.ts';
export type { HumidityBands, HumidityRisk } from './humidity.ts';

export {
  HYDROGEN_PHASES,
  HYDROGEN_SOLUBILITY_COEFFICIENTS,
  HYDROGEN_SOLUBILITY_MODELS,
  hydrogenSolubility,
} from './hydrogen.ts';
export type { HydrogenPhase, HydrogenSolubilityModel } from './hydrogen.ts';

export {
  NECK_MODULUS_FACTOR,
  RISER_MODULUS_FACTOR,
  RISER_MODULUS_RULE_SOURCES,
  barShape,
  chvorinovTimeMin,
  cubeShape,
  cylinderRiserDiameterCm,
  cylinderShape,
  modulusCm,
  modulusForTimeCm,
  moldConstantFrom,
  plateShape,
  riserModulusRule,
} from './solidification.ts';
export type { Shape } from './solidification.ts';

export { SHOP_TEXT_ALLOWANCES, SHRINK_RULES, patternDimension, shrinkPctFromInchesPerFoot } from './pattern.ts';
export type { ShopTextAllowance } from './pattern.ts';

export {
  CIATF_GROUPS,
  CIATF_GROUPS_SOURCE,
  CIATF_GROUP_IDS,
  DEFECT_GROUPS,
  DEFECT_GROUP_IDS,
  DEFECT_KINDS,
  DEFECT_KIND_IDS,
  LABEL_SHAPES,
  defectGroup,
  defectKindIdSchema,
  findDefectKind,
} from './defect-kinds.ts';
export type { CiatfGroup, DefectGroup, DefectGroupId, DefectKind, DefectKindId, LabelShape } from './defect-kinds.ts';

export { MELT_VARIABLES, MELT_VARIABLE_IDS, findMeltVariable, meltVariableIdSchema } from './melt-variables.ts';
export type { MeltVariable, MeltVariableId } from './melt-variables.ts';

export {
  CHARGE_KINDS,
  CHARGE_KIND_LABELS,
  FLUX_KINDS,
  FLUX_KIND_LABELS,
  HEAT_CONDITION_FIELDS,
  HEAT_CONDITION_LABELS,
  METAL_MOLD_MATERIALS,
  MOLD_MATERIALS,
  MOLD_MATERIAL_LABELS,
  SAND_MOLD_MATERIALS,
  heatConditionsInputSchema,
  heatConditionsSchema,
  isMetalMold,
  mouldKindOf,
} from './heat-conditions.ts';
export type { ChargeKind, FluxKind, HeatConditionField, HeatConditions, MoldMaterial } from './heat-conditions.ts';

export { CAUTION_IDS, cautionsFor } from './cautions.ts';
export type { Caution, CautionId, CautionOptions } from './cautions.ts';

export { DERIVED_FIELDS, FIELD_SPECS, TEMPLATE_EXTRAS, conditionFieldSchema } from './rules/condition-fields.ts';
export type { ConditionField, DerivedField, FieldSpec, NumberUnit } from './rules/condition-fields.ts';
export {
  ALLOY_THRESHOLD_PROPERTIES,
  COMPARISON_OPS,
  alloyThresholdSchema,
  comparisonSchema,
  conditionSchema,
  evidenceTemplateSchema,
  ruleSchema,
  ruleSetSchema,
} from './rules/rule-schemas.ts';
export type { AlloyThreshold, AlloyThresholdProperty, Comparison, ComparisonOp, Condition, Rule } from './rules/rule-schemas.ts';
export { DEFAULT_RULES } from './rules/default-rules.ts';
export { SEVERITIES, diagnose, diagnoseInputSchema } from './rules/diagnose.ts';
export type {
  Cause,
  CausePrior,
  CauseStatus,
  DiagnoseInput,
  DiagnoseOptions,
  Diagnosis,
  Finding,
  Severity,
} from './rules/diagnose.ts';
