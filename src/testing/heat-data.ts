import { heatConditionsOf } from '#shared/heats/heat-conditions-of.ts';
import { castingsTotalG, chargeTotalG, heatCautionsOf, heatFiguresOf } from '#shared/heats/heat-figures.ts';
import {
  crucibleSchema,
  furnaceSchema,
  mouldSchema,
  type Crucible,
  type Furnace,
  type Mould,
} from '#shared/heats/equipment-schemas.ts';
import {
  heatDefaultsSchema,
  heatDetailSchema,
  heatRowSchema,
  type HeatCreateInput,
  type HeatDefaults,
  type HeatDetail,
  type HeatRow,
} from '#shared/heats/heat-schemas.ts';
import { testId } from './data.ts';

// Heat-log and equipment answers for component tests, parsed with the
// shared schemas so a stub can never drift from the API's contract. The
// figures come from the same shared functions the server uses.

const STAMP = '2026-11-20T18:00:00.000Z';

export function buildFurnace(overrides: Partial<Furnace> = {}): Furnace {
  return furnaceSchema.parse({ id: testId(), name: 'Devil forge', kind: 'gas', notes: null, heatCount: 0, createdAt: STAMP, updatedAt: STAMP, ...overrides });
}

export function buildCrucible(overrides: Partial<Crucible> = {}): Crucible {
  return crucibleSchema.parse({
    id: testId(),
    name: 'A6 clay-graphite',
    material: 'clay_graphite',
    capacityG: 3000,
    inServiceSince: '2026-09-01',
    retired: false,
    retiredOn: null,
    cycleCount: 3,
    warnAt: 15,
    limitAt: 20,
    status: 'ok',
    lastShock: null,
    createdAt: STAMP,
    updatedAt: STAMP,
    ...overrides,
  });
}

export function buildMould(overrides: Partial<Mould> = {}): Mould {
  return mouldSchema.parse({
    id: testId(),
    name: 'Ingot tray',
    material: 'steel',
    capacityG: 450,
    capacityAlloy: 'A356.0',
    hasRiser: false,
    coating: null,
    notes: null,
    castingCount: 0,
    createdAt: STAMP,
    updatedAt: STAMP,
    ...overrides,
  });
}

export function buildDefaults(overrides: Partial<HeatDefaults> = {}): HeatDefaults {
  return heatDefaultsSchema.parse({
    basedOnHeatId: null,
    alloy: null,
    furnaceId: null,
    crucibleId: null,
    setpointC: null,
    fluxKind: null,
    fluxAmountG: null,
    degassing: null,
    mouldId: null,
    ...overrides,
  });
}

/** The API's answer to POST /heats for `input`, with figures and cautions as the server works them out. */
export function heatDetailFrom(
  input: HeatCreateInput,
  extra: { id?: string; casterId?: string; casterName?: string; workshopId?: string } = {},
): HeatDetail {
  const id = extra.id ?? testId();
  const heat = {
    meltStartedAt: input.meltStartedAt ?? null,
    pouredAt: input.pouredAt,
    alloy: input.alloy,
    pourTempC: input.pourTempC ?? null,
    peakTempC: input.peakTempC ?? null,
    chargeLines: input.chargeLines,
    degassing: input.degassing,
    fluxKind: input.fluxKind,
    skimmed: input.skimmed ?? null,
    toolsPreheated: input.toolsPreheated ?? null,
    ambientTempC: input.ambientTempC ?? null,
    relativeHumidityPct: input.relativeHumidityPct ?? null,
    crucibleCycle: null,
  };
  const chargeG = chargeTotalG(input.chargeLines);
  const castings = input.castings.map((k) => ({
    id: testId(),
    heatId: id,
    mouldId: k.mouldId ?? null,
    mould: null,
    mouldPreheatC: k.mouldPreheatC ?? null,
    coated: k.coated ?? null,
    vented: k.vented ?? null,
    pourHeightCm: k.pourHeightCm ?? null,
    sectionThicknessMm: k.sectionThicknessMm ?? null,
    massG: k.massG ?? null,
    airCoolMin: k.airCoolMin ?? null,
    quenchMedium: k.quenchMedium,
    notes: k.notes ?? null,
    createdAt: STAMP,
    updatedAt: STAMP,
    yieldPct: null,
    conditions: heatConditionsOf(heat, k),
  }));
  const conditions = heatConditionsOf(heat);
  return heatDetailSchema.parse({
    id,
    workshopId: extra.workshopId ?? testId(),
    casterId: extra.casterId ?? testId(),
    casterName: extra.casterName ?? 'Ada Caster',
    meltStartedAt: heat.meltStartedAt,
    pouredAt: input.pouredAt,
    alloy: input.alloy,
    workshopAlloyId: null,
    chargeLines: input.chargeLines.map((l) => ({ kind: l.kind, description: l.description ?? null, massG: l.massG })),
    furnaceId: input.furnaceId ?? null,
    furnace: null,
    crucibleId: input.crucibleId ?? null,
    crucible: null,
    setpointC: input.setpointC ?? null,
    peakTempC: heat.peakTempC,
    pourTempC: heat.pourTempC,
    fluxKind: input.fluxKind,
    fluxAmountG: input.fluxAmountG ?? null,
    degassing: input.degassing,
    skimmed: heat.skimmed,
    toolsPreheated: heat.toolsPreheated,
    ambientTempC: heat.ambientTempC,
    relativeHumidityPct: heat.relativeHumidityPct,
    crucibleRemainderG: input.crucibleRemainderG ?? null,
    notes: input.notes ?? null,
    safety: input.safety,
    crucibleShock: input.crucibleShock,
    castings,
    createdAt: STAMP,
    updatedAt: STAMP,
    figures: heatFiguresOf({ ...heat, chargeG, castingsG: castingsTotalG(castings) }),
    cautions: heatCautionsOf({ alloy: input.alloy, safety: input.safety, crucibleShock: input.crucibleShock, conditions: [conditions] }),
    conditions,
  });
}

export function buildHeatRow(overrides: Partial<HeatRow> = {}): HeatRow {
  return heatRowSchema.parse({
    id: testId(),
    casterId: testId(),
    casterName: 'Ada Caster',
    meltStartedAt: '2026-11-20T17:15:00.000Z',
    pouredAt: STAMP,
    alloy: 'A356.0',
    furnaceId: null,
    furnaceName: null,
    crucibleId: null,
    crucibleName: null,
    setpointC: 740,
    pourTempC: 720,
    castingCount: 1,
    figures: { chargeG: 1000, castingsG: 420, yieldPct: 42, remainderG: 580, superheatC: 105, holdTimeMin: 45 },
    cautionIds: [],
    ...overrides,
  });
}
