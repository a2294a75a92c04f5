import { z } from 'zod';
import type { HeatConditionField } from './heat-conditions.ts';

/** The things a caster controls that a defect can be traced back to. */
export const MELT_VARIABLE_IDS = [
  'pour_temperature',
  'hold_time',
  'charge_condition',
  'tool_preheat',
  'humidity',
  'degassing',
  'fluxing',
  'skimming',
  'mold_temperature',
  'mold_coating',
  'mold_venting',
  'mold_moisture',
  'pour_technique',
  'feeding',
  'cooling',
  'alloy_chemistry',
  'crucible_condition',
] as const;
export type MeltVariableId = (typeof MELT_VARIABLE_IDS)[number];
export const meltVariableIdSchema = z.enum(MELT_VARIABLE_IDS);

export type MeltVariable = {
  id: MeltVariableId;
  name: string;
  /** What it is and why it matters, in plain words. */
  explanation: string;
  /** Heat-log fields that tell us about it. */
  informedBy: HeatConditionField[];
  /** Whether the chosen alloy also informs it. */
  usesAlloy: boolean;
};

export const MELT_VARIABLES: readonly MeltVariable[] = [
  {
    id: 'pour_temperature',
    name: 'Pour temperature',
    explanation:
      'How hot the metal is when it leaves the crucible, and how hot it got in the furnace. Too hot and it picks up gas, grows oxide and shrinks more; too cold and it freezes before the mould is full.',
    informedBy: ['pourTempC', 'peakTempC', 'moldMaterial'],
    usesAlloy: true,
  },
  {
    id: 'hold_time',
    name: 'Hold time',
    explanation: 'How long the melt sits liquid before the pour. Every extra minute lets it take up more hydrogen and oxide.',
    informedBy: ['holdTimeMin'],
    usesAlloy: false,
  },
  {
    id: 'charge_condition',
    name: 'Charge condition',
    explanation:
      'What went into the crucible: clean ingot, clean scrap, or painted, oily, wet or corroded scrap that brings moisture, oxide and dirt with it.',
    informedBy: ['chargeKind'],
    usesAlloy: false,
  },
  {
    id: 'tool_preheat',
    name: 'Tool preheat',
    explanation: 'Whether skimmers, stirrers, ladles, plungers and thermocouple sheaths were heated dry before touching the metal.',
    informedBy: ['toolsPreheated'],
    usesAlloy: false,
  },
  {
    id: 'humidity',
    name: 'Humidity',
    explanation:
      'Water vapour in the air of the shop, best judged by the dew point. Moist air feeds hydrogen into an aluminium melt through its surface.',
    informedBy: ['ambientTempC', 'relativeHumidityPct'],
    usesAlloy: false,
  },
  {
    id: 'degassing',
    name: 'Degassing',
    explanation: 'Removing dissolved hydrogen before the pour, with dry argon or nitrogen through a lance or rotor, or with degassing tablets.',
    informedBy: ['degassed'],
    usesAlloy: false,
  },
  {
    id: 'fluxing',
    name: 'Fluxing',
    explanation: 'Salt fluxes that cover the melt, free metal from dross or gather oxide. The right flux depends on the alloy.',
    informedBy: ['fluxed', 'fluxKind'],
    usesAlloy: true,
  },
  {
    id: 'skimming',
    name: 'Skimming',
    explanation: 'Clearing the dross off the melt just before the pour, gently, so the skin is not stirred back in.',
    informedBy: ['skimmed'],
    usesAlloy: false,
  },
  {
    id: 'mold_temperature',
    name: 'Mould temperature',
    explanation:
      'How hot a metal or graphite mould is when the metal arrives. Cold moulds freeze the metal early; very hot ones slow freezing and cycle times.',
    informedBy: ['moldTempC', 'moldMaterial'],
    usesAlloy: false,
  },
  {
    id: 'mold_coating',
    name: 'Mould coating',
    explanation: 'The insulating coat on a metal mould, or the refractory wash on sand, that controls heat flow and surface finish.',
    informedBy: ['moldCoated', 'moldMaterial'],
    usesAlloy: false,
  },
  {
    id: 'mold_venting',
    name: 'Mould venting',
    explanation: 'Paths for air and mould gas to escape as the metal fills the cavity.',
    informedBy: ['moldVented'],
    usesAlloy: false,
  },
  {
    id: 'mold_moisture',
    name: 'Mould moisture',
    explanation:
      'Water in green sand, in new plaster or investment, or condensed on a cold metal mould. It turns to steam against the metal.',
    informedBy: ['moldMaterial', 'moldTempC'],
    usesAlloy: false,
  },
  {
    id: 'pour_technique',
    name: 'Pour technique',
    explanation:
      'How the metal gets into the mould: fall height, speed, steadiness and turbulence. A high, splashing stream folds oxide in and erodes sand.',
    informedBy: ['pourHeightCm'],
    usesAlloy: false,
  },
  {
    id: 'feeding',
    name: 'Feeding',
    explanation: 'Supplying liquid metal to the casting while it shrinks as it freezes, from a riser or hot top that freezes last.',
    informedBy: ['riser', 'sectionThicknessMm'],
    usesAlloy: false,
  },
  {
    id: 'cooling',
    name: 'Cooling',
    explanation:
      'How fast and how evenly the casting freezes and cools: section thickness, mould material, and when it is knocked out or quenched.',
    informedBy: ['sectionThicknessMm', 'moldMaterial', 'quenchDelayMin'],
    usesAlloy: false,
  },
  {
    id: 'alloy_chemistry',
    name: 'Alloy chemistry',
    explanation:
      'What the alloy itself brings: freezing range, fluidity, magnesium content, hot-tear tendency. Sometimes the answer is a different alloy.',
    informedBy: [],
    usesAlloy: true,
  },
  {
    id: 'crucible_condition',
    name: 'Crucible condition',
    explanation: 'The state of the crucible: heat count, cracks, erosion at the metal line, glaze loss, moisture taken up in storage.',
    informedBy: ['crucibleCycles'],
    usesAlloy: false,
  },
];

const MELT_VARIABLE_INDEX: ReadonlyMap<string, MeltVariable> = new Map(MELT_VARIABLES.map((v) => [v.id, v]));

/** The melt variable with this id; undefined for an unknown id. */
export function findMeltVariable(id: string): MeltVariable | undefined {
  return MELT_VARIABLE_INDEX.get(id);
}
