import { faker } from '@faker-js/faker';
import type { z } from 'zod';
import {
  crucibleCreateSchema,
  furnaceCreateSchema,
  mouldCreateSchema,
} from '../../shared/heats/equipment-schemas.ts';
import type { CrucibleCreateInput, FurnaceCreateInput, MouldCreateInput } from '../../shared/heats/equipment-schemas.ts';
import { heatCreateSchema } from '../../shared/heats/heat-schemas.ts';
import type { HeatCreateDraft } from '../../shared/heats/heat-schemas.ts';
import { withTransaction } from '../../server/db/sequelize.ts';
import * as equipmentRepository from '../../server/modules/equipment/equipment-repository.ts';
import * as heatsRepository from '../../server/modules/heats/heats-repository.ts';

// Equipment and heats written through the modules' repositories, after the
// same schemas the API parses, so a factory row is always one the API could
// have written.

type FurnaceOverrides = Partial<z.input<typeof furnaceCreateSchema>>;
type CrucibleOverrides = Partial<z.input<typeof crucibleCreateSchema>>;
type MouldOverrides = Partial<z.input<typeof mouldCreateSchema>>;

export async function insertFurnace(workshopId: string, overrides: FurnaceOverrides = {}) {
  const input: FurnaceCreateInput = furnaceCreateSchema.parse({
    name: `${faker.word.adjective()} furnace ${faker.string.alphanumeric(4)}`,
    kind: 'electric',
    ...overrides,
  });
  const id = await equipmentRepository.createFurnace(workshopId, input);
  return { id, ...input };
}

export async function insertCrucible(workshopId: string, overrides: CrucibleOverrides = {}) {
  const input: CrucibleCreateInput = crucibleCreateSchema.parse({
    name: `A${faker.number.int({ min: 2, max: 30 })} crucible ${faker.string.alphanumeric(4)}`,
    material: 'clay_graphite',
    capacityG: 3000,
    inServiceSince: '2026-09-01',
    ...overrides,
  });
  const id = await equipmentRepository.createCrucible(workshopId, {
    ...input,
    retired: input.retired ?? false,
    retiredOn: input.retiredOn ?? null,
  });
  return { id, ...input };
}

export async function insertMould(workshopId: string, overrides: MouldOverrides = {}) {
  const input: MouldCreateInput = mouldCreateSchema.parse({
    name: `${faker.word.noun()} mould ${faker.string.alphanumeric(4)}`,
    material: 'steel',
    capacityG: 450,
    capacityAlloy: 'A356.0',
    hasRiser: true,
    ...overrides,
  });
  const id = await equipmentRepository.createMould(workshopId, input);
  return { id, ...input };
}

let minutesBack = 0;
/**
 * A plausible aluminium heat as the API accepts it: A356 ingot, poured at
 * 720 °C from a 740 °C setpoint after a 45-minute melt, checklist ticked.
 * Each call pours a little earlier than the last so orders are stable.
 */
export function buildHeat(overrides: Partial<HeatCreateDraft> = {}): HeatCreateDraft {
  minutesBack += 7;
  const pouredAt = overrides.pouredAt ?? new Date(Date.UTC(2026, 10, 20, 18, 0) - minutesBack * 60_000).toISOString();
  return {
    pouredAt,
    meltStartedAt: new Date(Date.parse(pouredAt) - 45 * 60_000).toISOString(),
    alloy: 'A356.0',
    chargeLines: [{ kind: 'ingot', massG: 1000, description: 'A356 ingot' }],
    setpointC: 740,
    peakTempC: 735,
    pourTempC: 720,
    fluxKind: 'cover',
    fluxAmountG: 5,
    degassing: 'tablet',
    skimmed: true,
    toolsPreheated: true,
    ambientTempC: 18,
    relativeHumidityPct: 55,
    safety: { dryTools: true, ppe: true, clearFloor: true },
    ...overrides,
  };
}

/** Writes a heat for `casterId` in `workshopId`; returns its id and the parsed input. */
export async function insertHeat(overrides: Partial<HeatCreateDraft> & { workshopId: string; casterId: string }) {
  const { workshopId, casterId, ...rest } = overrides;
  const input = heatCreateSchema.parse(buildHeat(rest));
  const id = await withTransaction((tx) => heatsRepository.insertHeat(workshopId, { ...input, casterId }, tx));
  return { id, ...input, casterId };
}
