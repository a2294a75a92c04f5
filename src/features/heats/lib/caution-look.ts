import type { HeatCautionId } from '#shared/heats/heat-schemas.ts';

/**
 * Which section of the safety page explains each heat caution, and which
 * count as "danger" (a risk of serious injury) rather than "caution".
 */
export const CAUTION_LOOK: Record<HeatCautionId, { section?: string; level: 'caution' | 'danger' }> = {
  crucible_shock: { section: 'crucibles', level: 'danger' },
  safety_checklist_incomplete: { level: 'caution' },
  borax_on_aluminium: { section: 'fume', level: 'caution' },
  sodium_flux_high_magnesium: { section: 'fume', level: 'caution' },
  tools_not_preheated: { section: 'moisture', level: 'danger' },
  wet_or_dirty_scrap: { section: 'moisture', level: 'danger' },
  crucible_near_limit: { section: 'crucibles', level: 'caution' },
  crucible_past_limit: { section: 'crucibles', level: 'danger' },
  cold_metal_mould: { section: 'moisture', level: 'caution' },
  early_water_quench: { section: 'quenching', level: 'caution' },
  zinc_fume: { section: 'fume', level: 'danger' },
  lead_fume: { section: 'fume', level: 'danger' },
};
