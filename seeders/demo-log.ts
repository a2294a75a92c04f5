import type { DefectKindId } from '../shared/domain/index.ts';
import type { PieceShape, Rng } from './photo-generator.ts';

/**
 * The demo class's log, as data: invented values for an invented evening
 * class, with each member's habits (one pours too hot, one skips degassing on
 * humid nights, one fills cold moulds once winter comes, one pours thick
 * ingots with no riser). Nothing here is measured; it is there to look at.
 */

/** The seed the demo log is drawn from; the same seed draws the same term. */
export const DEMO_LOG_SEED = 20261201;

export const DEMO_FURNACES = [
  { key: 'electric', name: 'Shed kiln (electric)', kind: 'electric' as const, notes: 'Reads about 15 °C hot: the metal ends up below the setpoint.' },
  { key: 'gas', name: 'Propane bucket', kind: 'gas' as const, notes: 'Outdoors on the slab. No controller; setpoint column left empty.' },
];

export const DEMO_CRUCIBLES = [
  { key: 'cg1', name: 'A8 clay-graphite #1', material: 'clay_graphite' as const, capacityG: 4000, inServiceSince: '2026-08-01', retiredOn: '2026-09-24' },
  { key: 'cg2', name: 'A8 clay-graphite #2', material: 'clay_graphite' as const, capacityG: 4000, inServiceSince: '2026-10-29' },
  { key: 'sic', name: 'A10 silicon carbide', material: 'silicon_carbide' as const, capacityG: 5000, inServiceSince: '2026-08-01' },
  { key: 'bronze', name: 'A4 clay-graphite (bronze only)', material: 'clay_graphite' as const, capacityG: 9000, inServiceSince: '2026-08-15' },
];

export const DEMO_MOULDS = [
  { key: 'graphite-bar', name: 'Graphite bar-ingot mould', material: 'graphite' as const, capacityG: 900, capacityAlloy: 'A356.0', hasRiser: false, coating: null },
  { key: 'muffin', name: 'Steel muffin tin (6 cups)', material: 'steel' as const, capacityG: 1500, capacityAlloy: 'A356.0', hasRiser: false, coating: 'soot from an acetylene flame' },
  { key: 'iron-ingot', name: 'Cast-iron ingot mould', material: 'cast_iron' as const, capacityG: 2200, capacityAlloy: 'A356.0', hasRiser: false, coating: 'boron nitride spray' },
  { key: 'green-sand', name: 'Green-sand flask 300 × 300', material: 'green_sand' as const, capacityG: 1800, capacityAlloy: 'A356.0', hasRiser: true, coating: null },
  { key: 'petrobond', name: 'Oil-bonded sand flask', material: 'bonded_sand' as const, capacityG: 1200, capacityAlloy: 'A356.0', hasRiser: true, coating: null },
  { key: 'plaster', name: 'Plaster investment (lost PLA)', material: 'plaster' as const, capacityG: 400, capacityAlloy: 'A356.0', hasRiser: true, coating: null },
];

export type DemoCasting = {
  mould: string;
  mouldPreheatC: number | null;
  coated: boolean;
  vented: boolean;
  pourHeightCm: number;
  sectionThicknessMm: number;
  massG: number;
  quenchMedium: 'none' | 'water';
  airCoolMin: number | null;
  defects: { kind: DefectKindId; severity: 1 | 2 | 3 }[];
  shape: PieceShape;
};

export type DemoHeat = {
  caster: string;
  pouredAt: Date;
  meltMinutes: number;
  alloy: string;
  furnace: string;
  crucible: string;
  setpointC: number | null;
  peakTempC: number;
  pourTempC: number;
  chargeLines: { kind: 'ingot' | 'clean_scrap' | 'dirty_scrap'; description: string; massG: number }[];
  fluxKind: 'none' | 'cover' | 'drossing' | 'cleaning' | 'borax';
  fluxAmountG: number | null;
  degassing: 'none' | 'tablet' | 'argon_lance';
  skimmed: boolean;
  toolsPreheated: boolean;
  ambientTempC: number;
  relativeHumidityPct: number;
  remainderG: number;
  crucibleShock: 'none' | 'fast_heat_up' | 'quenched';
  notes: string | null;
  castings: DemoCasting[];
};

/** Thursday evenings from early August to late November 2026. */
function classEvenings(): Date[] {
  const out: Date[] = [];
  for (let d = new Date(Date.UTC(2026, 7, 6, 18, 30)); d < new Date(Date.UTC(2026, 10, 27)); d = new Date(d.getTime() + 7 * 86400_000)) {
    out.push(d);
  }
  return out;
}

/** Evening air cools from late summer into November; humidity wanders. */
function weather(r: Rng, date: Date) {
  const weeks = (date.getTime() - Date.UTC(2026, 7, 6)) / (7 * 86400_000);
  const ambientTempC = Math.round((23 - weeks * 1.05 + r.between(-2.5, 2.5)) * 10) / 10;
  const relativeHumidityPct = Math.round(Math.min(96, Math.max(38, 55 + weeks * 1.4 + r.between(-15, 18))));
  return { ambientTempC, relativeHumidityPct };
}

const round5 = (n: number) => Math.round(n / 5) * 5;

/** What came out of a charge: the casting at 55–80 % yield, a little left in the crucible. */
function outcome(r: Rng, chargeG: number) {
  return { massG: round5(chargeG * r.between(0.55, 0.8)), remainderG: round5(chargeG * r.between(0.04, 0.1)) };
}
const total = (lines: { massG: number }[]) => lines.reduce((n, l) => n + l.massG, 0);

/**
 * Every heat of the demo workshop, drawn from a seeded PRNG so each start
 * builds the same log.
 */
export function buildDemoLog(r: Rng): DemoHeat[] {
  const heats: DemoHeat[] = [];
  for (const evening of classEvenings()) {
    const w = weather(r, evening);
    const humid = w.relativeHumidityPct >= 75;
    const winter = evening.getUTCMonth() >= 9; // from October the moulds go in cold
    // #1 until it cracked in September, the silicon carbide one while the
    // replacement was on order, then #2, which is now close to its limit.
    const crucibleAl =
      evening < new Date(Date.UTC(2026, 8, 24)) ? 'cg1' : evening < new Date(Date.UTC(2026, 9, 29)) ? 'sic' : 'cg2';
    let slot = 0;
    const at = () => new Date(evening.getTime() + (slot++ * 35 + r.int(0, 10)) * 60_000);

    // Jonah: wheel scrap, pours hot, degasses when a mentor reminds him.
    {
      const pour = round5(r.between(775, 830));
      const dirty = r.next() < 0.5;
      const degassed = r.next() < 0.25;
      const defects: DemoCasting['defects'] = [];
      if (!degassed) defects.push({ kind: pour > 800 ? 'gas_porosity' : 'pinholes', severity: pour > 810 ? 3 : 2 });
      if (dirty && r.next() < 0.6) defects.push({ kind: 'dross_inclusions', severity: 2 });
      heats.push({
        caster: 'jonah@harbourlane.test',
        pouredAt: at(),
        meltMinutes: r.int(50, 80),
        alloy: 'A356.0',
        furnace: 'electric',
        crucible: crucibleAl,
        setpointC: pour + 15 + r.int(-6, 6),
        peakTempC: pour + r.int(5, 25),
        pourTempC: pour,
        chargeLines: [
          { kind: dirty ? 'dirty_scrap' : 'clean_scrap', description: dirty ? 'wheel offcuts, some paint' : 'wheel spokes, wire-brushed', massG: round5(r.between(1800, 2600)) },
        ],
        fluxKind: r.next() < 0.3 ? 'cover' : 'none',
        fluxAmountG: null,
        degassing: degassed ? 'tablet' : 'none',
        skimmed: r.next() < 0.7,
        toolsPreheated: r.next() < 0.6,
        ...w,
        remainderG: round5(r.between(150, 400)),
        crucibleShock: 'none',
        notes: pour > 815 ? 'Left it in while I set up the mould.' : null,
        castings: [
          {
            mould: 'iron-ingot',
            mouldPreheatC: round5(r.between(150, 260)),
            coated: true,
            vented: false,
            pourHeightCm: round5(r.between(15, 35)),
            sectionThicknessMm: 38,
            massG: round5(r.between(1200, 1900)),
            quenchMedium: 'none',
            airCoolMin: null,
            defects,
            shape: 'bar-ingot',
          },
        ],
      });
    }

    // Lena: good temperatures, skips the degassing tablet, skims late.
    {
      const pour = round5(r.between(700, 735));
      const defects: DemoCasting['defects'] = [];
      if (humid) defects.push({ kind: 'pinholes', severity: w.relativeHumidityPct > 85 ? 3 : 2 });
      if (r.next() < 0.35) defects.push({ kind: 'oxide_inclusions', severity: 1 });
      heats.push({
        caster: 'lena@harbourlane.test',
        pouredAt: at(),
        meltMinutes: r.int(40, 60),
        alloy: 'A356.0',
        furnace: 'electric',
        crucible: crucibleAl,
        setpointC: pour + 15 + r.int(-5, 5),
        peakTempC: pour + r.int(5, 15),
        pourTempC: pour,
        chargeLines: [
          { kind: 'ingot', description: 'A356 ingot from the supplier', massG: round5(r.between(1000, 1500)) },
          { kind: 'clean_scrap', description: 'last week’s risers', massG: round5(r.between(200, 500)) },
        ],
        fluxKind: 'cover',
        fluxAmountG: 5,
        degassing: 'none',
        skimmed: r.next() < 0.5,
        toolsPreheated: true,
        ...w,
        remainderG: round5(r.between(100, 300)),
        crucibleShock: 'none',
        notes: humid ? 'Muggy evening, the shed door was shut.' : null,
        castings: [
          {
            mould: 'green-sand',
            mouldPreheatC: null,
            coated: false,
            vented: true,
            pourHeightCm: 10,
            sectionThicknessMm: 12,
            massG: round5(r.between(650, 1000)),
            quenchMedium: 'none',
            airCoolMin: null,
            defects,
            shape: 'plate',
          },
        ],
      });
    }

    // Sam: steel muffin tin, preheated less and less as the evenings cool.
    if (r.next() < 0.85) {
      const pour = round5(r.between(690, 715));
      const preheat = winter ? round5(r.between(30, 110)) : round5(r.between(180, 300));
      const defects: DemoCasting['defects'] = [];
      if (preheat < 150) {
        defects.push({ kind: 'rounded_edges', severity: preheat < 80 ? 3 : 2 });
        if (r.next() < 0.55) defects.push({ kind: 'misrun', severity: 2 });
        else defects.push({ kind: 'laps', severity: 2 });
      }
      heats.push({
        caster: 'sam@harbourlane.test',
        pouredAt: at(),
        meltMinutes: r.int(40, 55),
        alloy: 'A356.0',
        furnace: 'gas',
        crucible: 'sic',
        setpointC: null,
        peakTempC: pour + r.int(5, 20),
        pourTempC: pour,
        chargeLines: [{ kind: 'ingot', description: 'A356 ingot', massG: round5(r.between(1400, 1800)) }],
        fluxKind: 'cover',
        fluxAmountG: 4,
        degassing: 'tablet',
        skimmed: true,
        toolsPreheated: true,
        ...w,
        remainderG: round5(r.between(100, 250)),
        crucibleShock: 'none',
        notes: winter && preheat < 100 ? 'Tin only warmed on the furnace lid for a few minutes.' : null,
        castings: [
          {
            mould: 'muffin',
            mouldPreheatC: preheat,
            coated: true,
            vented: false,
            pourHeightCm: 8,
            sectionThicknessMm: 30,
            massG: round5(r.between(1100, 1500)),
            quenchMedium: 'none',
            airCoolMin: null,
            defects,
            shape: 'muffin-ingot',
          },
        ],
      });
    }

    // Aiko: careful melt, thick ingots in the graphite mould with no riser.
    {
      const pour = round5(r.between(700, 725));
      const thick = r.next() < 0.6;
      const quench = r.next() < 0.2;
      const defects: DemoCasting['defects'] = [];
      if (thick) defects.push({ kind: r.next() < 0.5 ? 'shrinkage_sink' : 'ingot_pipe', severity: 2 });
      if (quench) defects.push({ kind: 'cold_crack', severity: 1 });
      heats.push({
        caster: 'aiko@harbourlane.test',
        pouredAt: at(),
        meltMinutes: r.int(35, 50),
        alloy: 'A356.0',
        furnace: 'electric',
        crucible: crucibleAl,
        setpointC: pour + 15 + r.int(-4, 4),
        peakTempC: pour + r.int(3, 10),
        pourTempC: pour,
        chargeLines: [{ kind: 'ingot', description: 'A356 ingot', massG: round5(r.between(900, 1200)) }],
        fluxKind: 'cover',
        fluxAmountG: 4,
        degassing: 'tablet',
        skimmed: true,
        toolsPreheated: true,
        ...w,
        remainderG: round5(r.between(60, 160)),
        crucibleShock: 'none',
        notes: quench ? 'Dropped it in the quench bucket after ten minutes to get it home.' : null,
        castings: [
          {
            mould: 'graphite-bar',
            mouldPreheatC: round5(r.between(200, 320)),
            coated: false,
            vented: false,
            pourHeightCm: 6,
            sectionThicknessMm: thick ? 55 : 25,
            massG: round5(r.between(700, 900)),
            quenchMedium: quench ? 'water' : 'none',
            airCoolMin: quench ? 10 : null,
            defects,
            shape: 'bar-ingot',
          },
        ],
      });
    }

    // A mentor's demonstration heat now and then: sound castings.
    if (r.next() < 0.3) {
      const pour = round5(r.between(705, 725));
      heats.push({
        caster: r.next() < 0.5 ? 'priya@harbourlane.test' : 'tomasz@harbourlane.test',
        pouredAt: at(),
        meltMinutes: r.int(35, 45),
        alloy: 'A356.0',
        furnace: 'electric',
        crucible: crucibleAl,
        setpointC: pour + 15,
        peakTempC: pour + 5,
        pourTempC: pour,
        chargeLines: [{ kind: 'ingot', description: 'A356 ingot', massG: 1500 }],
        fluxKind: 'cover',
        fluxAmountG: 5,
        degassing: 'argon_lance',
        skimmed: true,
        toolsPreheated: true,
        ...w,
        remainderG: 150,
        crucibleShock: 'none',
        notes: 'Demonstration pour for the class.',
        castings: [
          {
            mould: 'petrobond',
            mouldPreheatC: null,
            coated: false,
            vented: true,
            pourHeightCm: 10,
            sectionThicknessMm: 15,
            massG: round5(r.between(800, 1100)),
            quenchMedium: 'none',
            airCoolMin: null,
            defects: [],
            shape: 'plate',
          },
        ],
      });
    }

    // Ray, the independent caster: bronze in sand, some weekends.
    if (r.next() < 0.45) {
      const pour = round5(r.between(1120, 1200));
      const saturday = new Date(evening.getTime() + 2 * 86400_000 - 6 * 3600_000);
      heats.push({
        caster: 'ray@harbourlane.test',
        pouredAt: saturday,
        meltMinutes: r.int(70, 95),
        alloy: 'C90300',
        furnace: 'gas',
        crucible: 'bronze',
        setpointC: null,
        peakTempC: pour + r.int(10, 30),
        pourTempC: pour,
        chargeLines: [
          { kind: 'ingot', description: 'tin bronze ingot', massG: round5(r.between(4000, 6000)) },
          { kind: 'clean_scrap', description: 'sprues from the last pour', massG: round5(r.between(500, 1200)) },
        ],
        fluxKind: 'borax',
        fluxAmountG: 15,
        degassing: 'none',
        skimmed: true,
        toolsPreheated: true,
        ...w,
        remainderG: round5(r.between(300, 700)),
        crucibleShock: r.next() < 0.15 ? 'fast_heat_up' : 'none',
        notes: 'Bronze fittings for a boat restoration.',
        castings: [
          {
            mould: 'green-sand',
            mouldPreheatC: null,
            coated: false,
            vented: true,
            pourHeightCm: 12,
            sectionThicknessMm: 20,
            massG: round5(r.between(2500, 4000)),
            quenchMedium: 'none',
            airCoolMin: null,
            defects: r.next() < 0.5 ? [{ kind: r.next() < 0.5 ? 'rough_surface' : 'hot_tear', severity: 2 }] : [],
            shape: 'disc',
          },
        ],
      });
    }
  }
  // Masses follow from the charge, so no casting outweighs the metal that made it.
  for (const heat of heats) {
    const charged = total(heat.chargeLines);
    const out = outcome(r, charged);
    heat.remainderG = out.remainderG;
    heat.castings[0].massG = out.massG;
  }
  return heats.sort((a, b) => a.pouredAt.getTime() - b.pouredAt.getTime());
}
