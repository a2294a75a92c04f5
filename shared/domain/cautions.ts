import type { Alloy } from './alloys.ts';
import { isMetalMold } from './heat-conditions.ts';
import type { HeatConditions } from './heat-conditions.ts';
import { PUBLICATIONS } from './sources.ts';
import { formatNumber, formatTemperature } from './units.ts';

// Practice the literature advises against whatever defect is on the photo.
// Shown calmly beside the diagnosis; each names its source.

export const CAUTION_IDS = [
  'borax_on_aluminium',
  'sodium_flux_high_magnesium',
  'tools_not_preheated',
  'wet_or_dirty_scrap',
  'crucible_near_limit',
  'crucible_past_limit',
  'cold_metal_mould',
  'early_water_quench',
  'zinc_fume',
  'lead_fume',
] as const;
export type CautionId = (typeof CAUTION_IDS)[number];

export type Caution = { id: CautionId; title: string; text: string; source: string };

export type CautionOptions = {
  /** Heat count at which to start warning about a crucible (common practice: 15). */
  crucibleWarnCycles?: number;
  /** Heat count treated as the end of a clay-graphite crucible's life (common practice: 20). */
  crucibleLimitCycles?: number;
  /** Minutes after pouring below which a water quench counts as early (app heuristic: 10). */
  earlyQuenchMin?: number;
};

const DEFAULTS: Required<CautionOptions> = { crucibleWarnCycles: 15, crucibleLimitCycles: 20, earlyQuenchMin: 10 };

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

/**
 * Cautions for a heat, independent of any defect. Values that are missing
 * raise no caution; the alloy-specific ones need the alloy, except borax,
 * which is flagged unless the alloy is known not to be aluminium.
 */
export function cautionsFor(
  input: { alloy?: Alloy; conditions: Partial<HeatConditions> },
  options: CautionOptions = {},
): Caution[] {
  const o = { ...DEFAULTS, ...options };
  const { alloy, conditions: c } = input;
  const cautions: Caution[] = [];

  if (c.fluxKind === 'borax' && (!alloy || alloy.family === 'aluminium')) {
    cautions.push({
      id: 'borax_on_aluminium',
      title: 'Borax is not an aluminium flux',
      text: 'Borax belongs with copper alloys and precious metals. Aluminium fluxes are chloride–fluoride salt mixes; use one made for aluminium, dry and warm.',
      source: `${PUBLICATIONS.saltFluxReview2023}; borax in the copper-alloy and brazing literature (from memory)`,
    });
  }
  const usedFlux = c.fluxed === true || (c.fluxed === undefined && c.fluxKind !== undefined);
  if (usedFlux && alloy?.traits.includes('high_magnesium')) {
    cautions.push({
      id: 'sodium_flux_high_magnesium',
      title: 'Use a sodium-free flux on this alloy',
      text: `${alloy.designation} is a high-magnesium alloy. Sodium from the flux embrittles it and hurts fluidity, so check the flux is sodium-free.`,
      source: `${PUBLICATIONS.fluxSupplierNote} (secondary)`,
    });
  }
  if (c.toolsPreheated === false) {
    cautions.push({
      id: 'tools_not_preheated',
      title: 'Preheat tools before they touch the metal',
      text: 'A damp or cold skimmer, stirrer, ladle or thermocouple sheath can make the metal spit or explode. Heat every tool dry first.',
      source: PUBLICATIONS.hseMoltenMetal,
    });
  }
  if (c.chargeKind === 'dirty_scrap') {
    cautions.push({
      id: 'wet_or_dirty_scrap',
      title: 'Dry and check scrap before charging',
      text: 'Wet scrap is the most common cause of molten-metal explosions. Keep scrap dry and covered, dry it before it goes in, and never charge sealed tubes, cans or containers.',
      source: PUBLICATIONS.hseMoltenMetal,
    });
  }
  if (finite(c.crucibleCycles) && c.crucibleCycles >= o.crucibleWarnCycles) {
    const past = c.crucibleCycles >= o.crucibleLimitCycles;
    cautions.push({
      id: past ? 'crucible_past_limit' : 'crucible_near_limit',
      title: past ? 'Crucible at the end of its usual life' : 'Crucible nearing the end of its usual life',
      text: `This crucible has seen ${formatNumber(c.crucibleCycles)} heats; clay-graphite crucibles often last about ${o.crucibleLimitCycles}. Check for cracks, thinning at the metal line, bulging and glaze loss before every heat${past ? ', and plan to retire it' : ''}.`,
      source: `${PUBLICATIONS.fmtCrucible}; the heat counts are common practice`,
    });
  }
  if (c.moldMaterial && isMetalMold(c.moldMaterial) && finite(c.moldTempC) && c.moldTempC < 100) {
    cautions.push({
      id: 'cold_metal_mould',
      title: 'Preheat the mould above 100 °C',
      text: `The mould was at ${formatTemperature(c.moldTempC, 'C')}. Moisture condenses on a cold mould and turns to steam under the metal; preheat it before the first pour.`,
      source: `${PUBLICATIONS.hseMoltenMetal}: preheat everything that touches the melt`,
    });
  }
  if (finite(c.quenchDelayMin) && c.quenchDelayMin < o.earlyQuenchMin) {
    cautions.push({
      id: 'early_water_quench',
      title: 'Quenching soon after the pour',
      text: 'A casting that may still hold liquid metal can burst or throw steam in water. Lower it in with tongs at arm\'s length, face shield down, into plenty of water; never pour water onto hot metal.',
      source: `${PUBLICATIONS.hseMoltenMetal} on water and molten metal; quench handling from memory`,
    });
  }
  if (alloy?.traits.includes('zinc_fuming')) {
    cautions.push({
      id: 'zinc_fume',
      title: 'Zinc fume from brass',
      text: 'Overheated brass gives off zinc-oxide fume, which causes metal fume fever. Melt with good extraction and do not overheat.',
      source: 'zinc-oxide fume from brass melting, from memory',
    });
  }
  if (alloy?.traits.includes('leaded')) {
    cautions.push({
      id: 'lead_fume',
      title: 'Lead in this alloy',
      text: `${alloy.designation} contains lead. Melt with extraction, keep food and drink away, and wash before eating.`,
      source: 'lead fume and dust from leaded copper alloys, from memory',
    });
  }
  return cautions;
}
