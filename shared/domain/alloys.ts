import { z } from 'zod';
import { ALSI7MG_SCHEDULES, heatTreatmentScheduleSchema } from './heat-treatment-schedules.ts';
import { ITS90_FREEZING_POINTS_C, ITS90_SOURCE } from './its90.ts';
import { rangeSchema } from './range.ts';
import type { Range } from './range.ts';
import { PUBLICATIONS, commonPractice, fromMemory, primary, secondary, sourceNoteSchema } from './sources.ts';
import type { SourceNote } from './sources.ts';

export const ALLOY_FAMILIES = ['aluminium', 'copper', 'zinc', 'iron', 'tin'] as const;
export type AlloyFamily = (typeof ALLOY_FAMILIES)[number];

/**
 * Casting behaviour the rule engine asks about. Kept as named traits rather
 * than compositions because the published castability ratings are qualitative.
 */
export const ALLOY_TRAITS = [
  'excellent_fluidity',
  'poor_fluidity',
  'hot_tear_prone',
  'long_freezing_range',
  'high_magnesium',
  'leaded',
  'zinc_fuming',
  'oxide_film_former',
  'wrought_alloy',
] as const;
export type AlloyTrait = (typeof ALLOY_TRAITS)[number];

export const MOULD_KINDS = ['sand', 'permanentMould'] as const;
export type MouldKind = (typeof MOULD_KINDS)[number];

/** One citation per stored property; absent where the property is absent. */
export const alloySourcesSchema = z.object({
  solidusLiquidus: sourceNoteSchema.optional(),
  pourRange: sourceNoteSchema.optional(),
  density: sourceNoteSchema.optional(),
  liquidDensity: sourceNoteSchema.optional(),
  volumetricShrinkage: sourceNoteSchema.optional(),
  patternShrink: sourceNoteSchema.optional(),
  traits: sourceNoteSchema.optional(),
});

export type AlloySources = z.infer<typeof alloySourcesSchema>;

/**
 * An alloy of the library or a workshop's own ("wheel scrap, assumed A356"):
 * both parse with this schema, so one stored in a database comes back as the
 * same `Alloy` type.
 */
export const alloySchema = z
  .object({
    designation: z.string().trim().min(1).max(60),
    family: z.enum(ALLOY_FAMILIES),
    commonName: z.string().trim().min(1).max(160),
    aliases: z.array(z.string().trim().min(1).max(60)).default([]),
    solidusC: z.number().min(100).max(1700),
    liquidusC: z.number().min(100).max(1700),
    pourRangeC: z
      .object({ sand: rangeSchema.optional(), permanentMould: rangeSchema.optional() })
      .default({}),
    densityGcm3: z.number().positive().max(25),
    liquidDensityGcm3: z.number().positive().max(25).optional(),
    volumetricShrinkagePct: rangeSchema.optional(),
    patternShrinkPct: z.number().min(0).max(5).optional(),
    traits: z.array(z.enum(ALLOY_TRAITS)).default([]),
    heatTreatments: z.array(heatTreatmentScheduleSchema).default([]),
    sources: alloySourcesSchema.default({}),
    /** Library designation a workshop alloy was modelled on. */
    basedOn: z.string().trim().min(1).max(60).optional(),
    /** Free note on where a workshop alloy's values came from. */
    source: z.string().trim().max(400).optional(),
  })
  .refine((a) => a.solidusC <= a.liquidusC, { message: 'solidus must not exceed liquidus', path: ['solidusC'] })
  .refine(
    (a) => [a.pourRangeC.sand, a.pourRangeC.permanentMould].every((r) => r === undefined || r.min >= a.liquidusC),
    { message: 'a pouring range must lie above the liquidus', path: ['pourRangeC'] },
  );

export type Alloy = z.output<typeof alloySchema>;
/** What a form or a database row may hand to `alloySchema.parse` (defaults filled in). */
export type AlloyInput = z.input<typeof alloySchema>;

const P = PUBLICATIONS;
const range = (min: number, max: number): Range => ({ min, max });
const AL_PATTERN_SHRINK: SourceNote = fromMemory(
  "5/32 in/ft (1.3 %), the usual patternmaker's allowance for aluminium; a foundry shrink table also lists 1.3 %",
);
const AL_POUR_RANGE = (alloy: string): SourceNote =>
  fromMemory(`typical foundry pouring range for ${alloy}; thin sections are poured at the hot end`);

/** The alloy library. Every stored value names its publication in `sources`. */
export const ALLOYS: readonly Alloy[] = [
  {
    designation: 'A356.0',
    family: 'aluminium',
    commonName: 'Al-7Si-0.35Mg (wheels, general sand and permanent-mould castings)',
    aliases: [],
    solidusC: 555,
    liquidusC: 615,
    pourRangeC: { sand: range(675, 790), permanentMould: range(675, 790) },
    densityGcm3: 2.685,
    volumetricShrinkagePct: range(4, 5),
    patternShrinkPct: 1.3,
    traits: ['excellent_fluidity'],
    heatTreatments: ALSI7MG_SCHEDULES,
    sources: {
      solidusLiquidus: primary(
        `${P.asmVol2}, A356.0 data sheet as reproduced (555 / 615 °C); ${P.tableA3} lists 550 / 615 °C for LM25/A356`,
      ),
      pourRange: AL_POUR_RANGE('Al-7Si-Mg'),
      density: primary(`${P.asmVol2}, A356.0 data sheet`),
      volumetricShrinkage: fromMemory('foundry shrinkage tables: about 4–5 % for Al-7Si alloys'),
      patternShrink: AL_PATTERN_SHRINK,
      traits: secondary(`${P.aaCastability}: excellent fluidity and hot-crack resistance`),
    },
  },
  {
    designation: '356.0',
    family: 'aluminium',
    commonName: 'Al-7Si-0.3Mg (higher-iron sibling of A356.0)',
    aliases: [],
    solidusC: 555,
    liquidusC: 615,
    pourRangeC: { sand: range(675, 790), permanentMould: range(675, 790) },
    densityGcm3: 2.68,
    volumetricShrinkagePct: range(4, 5),
    patternShrinkPct: 1.3,
    traits: ['excellent_fluidity'],
    heatTreatments: ALSI7MG_SCHEDULES,
    sources: {
      solidusLiquidus: primary(`${P.asmVol2}: 356.0 and A356.0 carry identical thermal data`),
      pourRange: AL_POUR_RANGE('Al-7Si-Mg'),
      density: secondary('Aluminum Association typical density 0.097 lb/in³, printed in a foundry alloy table'),
      volumetricShrinkage: fromMemory('foundry shrinkage tables: about 4–5 % for Al-7Si alloys'),
      patternShrink: AL_PATTERN_SHRINK,
      traits: secondary(`${P.aaCastability}: excellent fluidity and hot-crack resistance`),
    },
  },
  {
    designation: '319.0',
    family: 'aluminium',
    commonName: 'Al-6Si-3.5Cu (engine and general castings)',
    aliases: [],
    solidusC: 540,
    liquidusC: 600,
    pourRangeC: { sand: range(675, 790), permanentMould: range(675, 790) },
    densityGcm3: 2.79,
    patternShrinkPct: 1.3,
    traits: ['long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary(
        `MakeItFrom.com, 319.0 aluminium entry (540 / 600 °C); ASM gives about 515 / 605 °C (from memory) and ${P.tableA3} lists LM4 at 504–615 °C`,
      ),
      pourRange: AL_POUR_RANGE('Al-Si-Cu'),
      density: secondary('Aluminum Association typical value, as listed by MatWeb'),
      patternShrink: secondary('foundry alloy data table listing 1.3 % pattern shrinkage'),
      traits: commonPractice('copper-bearing Al-Si alloys freeze over a long range and feed poorly'),
    },
  },
  {
    designation: '413.0',
    family: 'aluminium',
    commonName: 'Al-12Si eutectic (thin-walled and pressure-tight castings)',
    aliases: [],
    solidusC: 574,
    liquidusC: 582,
    pourRangeC: { sand: range(650, 760), permanentMould: range(650, 760) },
    densityGcm3: 2.66,
    volumetricShrinkagePct: range(3.5, 3.5),
    patternShrinkPct: 1.0,
    traits: ['excellent_fluidity'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary(
        `die-casting alloy data sheet for 413.0/A413.0 (574 / 582 °C); ${P.tableA3} lists LM20 at 565–575 °C and LM6 at 567–579 °C`,
      ),
      pourRange: fromMemory('typical foundry pouring range for eutectic Al-Si; die casting runs cooler, about 635–705 °C'),
      density: secondary('Aluminum Association typical value, as listed by MatWeb'),
      volumetricShrinkage: fromMemory('foundry shrinkage tables: near-eutectic Al-Si shrinks least, about 3.5 %'),
      patternShrink: fromMemory("patternmaker's allowance of about 1.0 % for eutectic Al-Si"),
      traits: secondary(`${P.aaCastability}: excellent fluidity`),
    },
  },
  {
    designation: '4032',
    family: 'aluminium',
    commonName: 'Al-12Si-1Cu-1Mg-1Ni wrought piston/forging alloy (remelted scrap)',
    aliases: [],
    solidusC: 532,
    liquidusC: 571,
    pourRangeC: { sand: range(650, 760) },
    densityGcm3: 2.68,
    traits: ['wrought_alloy'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.asmVol2}, 4032 data sheet`),
      pourRange: fromMemory('not a foundry alloy; when remelted it is poured like eutectic Al-Si (413.0)'),
      density: fromMemory(`${P.asmVol2}, 4032 data sheet`),
      traits: commonPractice('4032 is a wrought forging alloy, not sold for casting'),
    },
  },
  {
    designation: '6061',
    family: 'aluminium',
    commonName: 'Al-Mg-Si wrought alloy (extrusion and plate scrap)',
    aliases: [],
    solidusC: 582,
    liquidusC: 652,
    pourRangeC: { sand: range(700, 760) },
    densityGcm3: 2.7,
    volumetricShrinkagePct: range(6, 6),
    traits: ['wrought_alloy', 'hot_tear_prone'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary('Aluminum Association/ASM values printed on a 6061 mill data sheet'),
      pourRange: fromMemory('pouring range used when 6061 scrap is cast; it is not a casting alloy'),
      density: secondary('6061 mill data sheet'),
      volumetricShrinkage: fromMemory('foundry shrinkage tables: about 6 % for dilute Al alloys'),
      traits: secondary(`${P.aaCastability}: wrought compositions such as 6061 hot-tear readily`),
    },
  },
  {
    designation: '535.0',
    family: 'aluminium',
    commonName: 'Al-7Mg "Almag 35" (bright, corrosion-resistant castings)',
    aliases: ['Almag 35'],
    solidusC: 550,
    liquidusC: 630,
    pourRangeC: { sand: range(690, 760) },
    densityGcm3: 2.6,
    patternShrinkPct: 1.3,
    traits: ['high_magnesium', 'hot_tear_prone', 'poor_fluidity', 'long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.asmVol2}, 535.0 data sheet (${P.tableA3} lists the related B535/LM5 at 580–642 °C)`),
      pourRange: fromMemory('typical sand-foundry pouring range for Al-Mg alloys'),
      density: secondary('Aluminum Association typical density 0.094 lb/in³, printed in a foundry alloy table'),
      patternShrink: fromMemory("patternmaker's allowance of about 1.3 % for aluminium"),
      traits: secondary(`${P.aaCastability}: poor fluidity, prone to hot cracking; about 7 % Mg by composition`),
    },
  },
  {
    designation: '713.0',
    family: 'aluminium',
    commonName: 'Al-7.5Zn-0.7Cu-0.35Mg "Tenzaloy" (self-ageing)',
    aliases: ['Tenzaloy'],
    solidusC: 600,
    liquidusC: 630,
    pourRangeC: { sand: range(700, 790) },
    densityGcm3: 2.82,
    patternShrinkPct: 1.3,
    traits: ['hot_tear_prone', 'long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.asmVol2}, 713.0 data sheet (about 600–630 °C)`),
      pourRange: fromMemory('typical sand-foundry pouring range for Al-Zn-Mg alloys'),
      density: secondary('Aluminum Association typical density 0.102 lb/in³, printed in a foundry alloy table'),
      patternShrink: fromMemory("patternmaker's allowance of about 1.3 % for aluminium"),
      traits: secondary(`${P.aaCastability}: Al-Zn-Mg alloys are prone to hot cracking`),
    },
  },
  {
    designation: '295.0',
    family: 'aluminium',
    commonName: 'Al-4.5Cu-1Si (formerly 195; sand castings)',
    aliases: ['195'],
    solidusC: 530,
    liquidusC: 640,
    pourRangeC: { sand: range(700, 790) },
    densityGcm3: 2.81,
    patternShrinkPct: 1.3,
    traits: ['hot_tear_prone', 'long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary('foundry alloy data table (530 / 640 °C); ASM gives about 520 / 645 °C (from memory)'),
      pourRange: fromMemory(
        `typical sand-foundry pouring range for Al-Cu; no permanent-mould range because ${P.asmVol2B295} rates it unsuited to permanent-mould and die casting`,
      ),
      density: fromMemory(`${P.asmVol2}, 295.0 data sheet`),
      patternShrink: secondary('foundry alloy data table listing 1.3 % pattern shrinkage'),
      traits: primary(`${P.asmVol2B295}: only fair resistance to hot cracking`),
    },
  },
  {
    designation: '1100',
    family: 'aluminium',
    commonName: 'Commercially pure aluminium, 99.0 % min (sheet and foil scrap)',
    aliases: ['commercially pure aluminium'],
    solidusC: 643,
    liquidusC: 657,
    pourRangeC: { sand: range(700, 760), permanentMould: range(700, 760) },
    densityGcm3: 2.71,
    volumetricShrinkagePct: range(6.6, 7.1),
    patternShrinkPct: 1.3,
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.asmVol2}, 1100 data sheet`),
      pourRange: AL_POUR_RANGE('pure aluminium'),
      density: fromMemory(`${P.asmVol2}, 1100 data sheet`),
      volumetricShrinkage: fromMemory('solidification shrinkage of pure aluminium, 6.6–7.1 % (Flemings; Campbell tables)'),
      patternShrink: fromMemory("patternmaker's allowance of about 1.3–1.7 % for pure aluminium"),
    },
  },
  {
    designation: 'LM0',
    family: 'aluminium',
    commonName: 'Aluminium 99.5 % (BS 1490 LM0)',
    aliases: ['99.5 aluminium'],
    solidusC: 640,
    liquidusC: 658,
    pourRangeC: { sand: range(700, 760), permanentMould: range(700, 760) },
    densityGcm3: 2.7,
    volumetricShrinkagePct: range(6.6, 7.1),
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: primary(`${P.tableA3}, LM0 (99.5 % Al)`),
      pourRange: AL_POUR_RANGE('pure aluminium'),
      density: fromMemory('density of pure aluminium, 2.70 g/cm³ (CRC Handbook of Chemistry and Physics)'),
      volumetricShrinkage: fromMemory('solidification shrinkage of pure aluminium, 6.6–7.1 % (Flemings; Campbell tables)'),
    },
  },
  {
    designation: 'Pure Al',
    family: 'aluminium',
    commonName: 'Pure aluminium, 99.99 % (melting-point reference)',
    aliases: ['pure aluminium', 'pure aluminum', 'Al 99.99'],
    solidusC: ITS90_FREEZING_POINTS_C.aluminium,
    liquidusC: ITS90_FREEZING_POINTS_C.aluminium,
    pourRangeC: { sand: range(700, 760), permanentMould: range(700, 760) },
    densityGcm3: 2.7,
    liquidDensityGcm3: 2.377,
    volumetricShrinkagePct: range(6.6, 7.1),
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: ITS90_SOURCE,
      pourRange: AL_POUR_RANGE('pure aluminium'),
      density: fromMemory('density of pure aluminium, 2.70 g/cm³ (CRC Handbook of Chemistry and Physics)'),
      liquidDensity: secondary(
        'liquid density 2.37–2.38 g/cm³ at the melting point; 2377 kg/m³ is the value of Assael et al., J. Phys. Chem. Ref. Data 35 (2006), from memory',
      ),
      volumetricShrinkage: fromMemory('solidification shrinkage of pure aluminium, 6.6–7.1 % (Flemings; Campbell tables)'),
    },
  },
  {
    designation: 'C83600',
    family: 'copper',
    commonName: '85-5-5-5 leaded red brass (valves, plumbing)',
    aliases: ['85-5-5-5', 'leaded red brass'],
    solidusC: 854,
    liquidusC: 1010,
    pourRangeC: { sand: range(1150, 1260) },
    densityGcm3: 8.8,
    volumetricShrinkagePct: range(5, 5),
    patternShrinkPct: 1.56,
    traits: ['leaded', 'long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.cdaCopperCasting}, C83600`),
      pourRange: fromMemory(`${P.cdaCopperCasting}, C83600 pouring range`),
      density: secondary(`${P.cdaCopperCasting} repeated on a supplier sheet: 0.318 lb/in³`),
      volumetricShrinkage: fromMemory('about 5 % solidification shrinkage for leaded red brass'),
      patternShrink: fromMemory(`${P.cdaCopperCasting}: 3/16 in/ft`),
      traits: commonPractice('85-5-5-5 carries about 5 % lead and freezes over more than 150 °C'),
    },
  },
  {
    designation: 'C90300',
    family: 'copper',
    commonName: 'Tin bronze 88-8-0-4 "Navy G"',
    aliases: ['Navy G', '88-8-0-4'],
    solidusC: 854,
    liquidusC: 1000,
    pourRangeC: { sand: range(1100, 1230) },
    densityGcm3: 8.8,
    patternShrinkPct: 1.56,
    traits: ['long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.cdaCopperCasting}, C90300`),
      pourRange: fromMemory(`${P.cdaCopperCasting}, C90300 pouring range`),
      density: fromMemory(`${P.cdaCopperCasting}, C90300`),
      patternShrink: fromMemory(`${P.cdaCopperCasting}: 3/16 in/ft`),
      traits: commonPractice('tin bronzes freeze over a long range and give dispersed shrinkage'),
    },
  },
  {
    designation: 'C93200',
    family: 'copper',
    commonName: 'Leaded tin bearing bronze 83-7-7-3 (SAE 660)',
    aliases: ['SAE 660', '83-7-7-3', 'bearing bronze'],
    solidusC: 855,
    liquidusC: 977,
    pourRangeC: { sand: range(1065, 1200) },
    densityGcm3: 8.93,
    patternShrinkPct: 1.56,
    traits: ['leaded', 'long_freezing_range'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.cdaCopperCasting}, C93200`),
      pourRange: fromMemory(`${P.cdaCopperCasting}, C93200 pouring range`),
      density: fromMemory(`${P.cdaCopperCasting}, C93200`),
      patternShrink: fromMemory(`${P.cdaCopperCasting}: 3/16 in/ft`),
      traits: commonPractice('83-7-7-3 carries about 7 % lead; tin bronzes freeze over a long range'),
    },
  },
  {
    designation: 'C95400',
    family: 'copper',
    commonName: 'Aluminium bronze Cu-11Al-4Fe',
    aliases: ['aluminium bronze', 'aluminum bronze'],
    solidusC: 1027,
    liquidusC: 1038,
    pourRangeC: { sand: range(1120, 1200) },
    densityGcm3: 7.45,
    patternShrinkPct: 1.82,
    traits: ['oxide_film_former'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary('CDA/ASTM B505 values printed on a supplier sheet for C95400'),
      pourRange: fromMemory('typical foundry pouring range for aluminium bronze'),
      density: secondary('CDA/ASTM B505 values printed on a supplier sheet for C95400'),
      patternShrink: fromMemory(
        "about 2 % (7/32–1/4 in/ft) for aluminium bronze; an early shop-practice text lists 7/32 in/ft, which is stored here",
      ),
      traits: primary(`${P.meighAlBronze}: strong hydrogen pick-up, and its oxide film lowers fluidity`),
    },
  },
  {
    designation: 'C85400',
    family: 'copper',
    commonName: 'No. 1 yellow brass (ornamental castings)',
    aliases: ['yellow brass', 'No. 1 yellow brass'],
    solidusC: 927,
    liquidusC: 941,
    pourRangeC: { sand: range(1040, 1150) },
    densityGcm3: 8.44,
    patternShrinkPct: 1.56,
    traits: ['zinc_fuming'],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(`${P.cdaCopperCasting}, C85400 (1700 / 1725 °F)`),
      pourRange: fromMemory('typical foundry pouring range for yellow brass'),
      density: fromMemory(`${P.cdaCopperCasting}, C85400`),
      patternShrink: secondary(`${P.cdaCopperCasting}, casting characteristics: 3/16 in/ft for the similar C85300`),
      traits: fromMemory('yellow brass is about 30 % zinc; zinc boils at 907 °C, so overheating fumes it off'),
    },
  },
  {
    designation: 'Zamak 3',
    family: 'zinc',
    commonName: 'Zn-4Al-0.04Mg zinc die-casting and gravity alloy',
    aliases: ['ZP3', 'Alloy 3'],
    solidusC: 381,
    liquidusC: 387,
    pourRangeC: { sand: range(415, 440), permanentMould: range(415, 440) },
    densityGcm3: 6.6,
    patternShrinkPct: 0.6,
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary('zinc die-casting alloy property table (NADCA/IZA data)'),
      pourRange: fromMemory('gravity-casting range for Zamak 3; die casting runs about 395–425 °C'),
      density: secondary('zinc die-casting alloy property table (NADCA/IZA data)'),
      patternShrink: secondary('zinc die-casting alloy property table: die shrinkage 0.006 in/in'),
    },
  },
  {
    designation: 'ZA-27',
    family: 'zinc',
    commonName: 'Zn-27Al-2Cu high-strength zinc-aluminium alloy',
    aliases: [],
    solidusC: 376,
    liquidusC: 484,
    pourRangeC: { sand: range(560, 600), permanentMould: range(560, 600) },
    densityGcm3: 5.0,
    patternShrinkPct: 1.3,
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: secondary('zinc-aluminium alloy property table (IZA data)'),
      pourRange: fromMemory('typical gravity-casting range for ZA-27'),
      density: secondary('zinc-aluminium alloy property table (IZA data)'),
      patternShrink: secondary('MakeItFrom.com, ZA-27 entry: 1.3 % sand-cast shrinkage (die casting about 0.8 %)'),
    },
  },
  {
    designation: 'Grey iron',
    family: 'iron',
    commonName: 'Grey cast iron (flake graphite)',
    aliases: ['gray iron', 'grey cast iron', 'gray cast iron', 'cast iron'],
    solidusC: 1150,
    liquidusC: 1200,
    pourRangeC: { sand: range(1370, 1450) },
    densityGcm3: 7.2,
    patternShrinkPct: 1.04,
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory(
        'graphite eutectic about 1147–1153 °C; the liquidus depends on carbon equivalent, about 1200 °C taken for a typical hypoeutectic iron',
      ),
      pourRange: fromMemory('typical pouring range for grey iron in sand'),
      density: primary('German engineering tables for metalworking (Westermann), grey cast iron 7.2 g/cm³'),
      patternShrink: primary(`${P.shopPractice2}: 1/8 in/ft for cast iron`),
    },
  },
  {
    designation: 'Pewter',
    family: 'tin',
    commonName: 'Lead-free pewter Sn-7.5Sb-0.5Cu (ASTM B560)',
    aliases: ['ASTM B560', 'lead-free pewter'],
    solidusC: 245,
    liquidusC: 295,
    pourRangeC: { sand: range(300, 350), permanentMould: range(300, 350) },
    densityGcm3: 7.3,
    patternShrinkPct: 0.75,
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: fromMemory('pewter suppliers\' data for ASTM B560 alloys'),
      pourRange: fromMemory('pewter suppliers\' casting guidance (rubber and metal moulds)'),
      density: fromMemory('pewter suppliers\' data for ASTM B560 alloys'),
      patternShrink: fromMemory('about 0.5–1 % for pewter'),
    },
  },
  {
    designation: 'Pure Zn',
    family: 'zinc',
    commonName: 'Pure zinc (melting-point reference)',
    aliases: ['pure zinc'],
    solidusC: ITS90_FREEZING_POINTS_C.zinc,
    liquidusC: ITS90_FREEZING_POINTS_C.zinc,
    densityGcm3: 7.14,
    pourRangeC: {},
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: ITS90_SOURCE,
      density: fromMemory('density of zinc, 7.14 g/cm³ (CRC Handbook of Chemistry and Physics)'),
    },
  },
  {
    designation: 'Pure Sn',
    family: 'tin',
    commonName: 'Pure tin (melting-point reference)',
    aliases: ['pure tin'],
    solidusC: ITS90_FREEZING_POINTS_C.tin,
    liquidusC: ITS90_FREEZING_POINTS_C.tin,
    densityGcm3: 7.29,
    pourRangeC: {},
    traits: [],
    heatTreatments: [],
    sources: {
      solidusLiquidus: ITS90_SOURCE,
      density: fromMemory('density of white (β) tin, 7.29 g/cm³ (CRC Handbook of Chemistry and Physics)'),
    },
  },
];

/**
 * Folds a designation to its lookup key: case, spaces, hyphens and the
 * Aluminum Association ".0" casting suffix do not matter ("a356" = "A356.0",
 * "zamak 3" = "Zamak3", "za27" = "ZA-27").
 */
export function designationKey(designation: string): string {
  const folded = designation.toUpperCase().replace(/[\s\-_]+/g, '');
  return /^[A-Z]?\d{3}\.0$/.test(folded) ? folded.slice(0, -2) : folded;
}

const ALLOY_INDEX: ReadonlyMap<string, Alloy> = new Map(
  ALLOYS.flatMap((alloy) => [alloy.designation, ...alloy.aliases].map((name) => [designationKey(name), alloy] as const)),
);

/**
 * Finds a library alloy by designation or alias, tolerant of case, spaces and
 * the ".0" suffix; undefined when unknown.
 */
export function findAlloy(designation: string): Alloy | undefined {
  return ALLOY_INDEX.get(designationKey(designation));
}

/**
 * The pouring range for a mould kind, falling back to the only range stored.
 * With no mould kind given it returns the envelope of both ranges, so a pour
 * outside it is outside for any mould.
 */
export function pourRangeFor(
  alloy: Alloy,
  mouldKind?: MouldKind,
): { range: Range; mouldKind: MouldKind | 'any' } | undefined {
  const { sand, permanentMould } = alloy.pourRangeC;
  if (mouldKind === 'sand' && sand) return { range: sand, mouldKind };
  if (mouldKind === 'permanentMould' && permanentMould) return { range: permanentMould, mouldKind };
  if (sand && permanentMould) {
    return {
      range: { min: Math.min(sand.min, permanentMould.min), max: Math.max(sand.max, permanentMould.max) },
      mouldKind: 'any',
    };
  }
  const only = sand ?? permanentMould;
  if (!only) return undefined;
  return { range: only, mouldKind: sand ? 'sand' : 'permanentMould' };
}

/**
 * A workshop alloy modelled on a library one ("wheel scrap, assumed A356"):
 * the base's values and citations are copied, `basedOn` names the base and
 * `source` records why the workshop assumes it.
 */
export function deriveAlloy(
  base: Alloy,
  own: { designation: string; commonName?: string; source: string },
): Alloy {
  return alloySchema.parse({
    ...base,
    designation: own.designation,
    commonName: own.commonName ?? `${own.designation} (assumed ${base.designation})`,
    aliases: [],
    basedOn: base.designation,
    source: own.source,
  });
}
