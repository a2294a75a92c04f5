import { describe, expect, test } from 'vitest';
import { ALLOYS, alloySchema, deriveAlloy, findAlloy, pourRangeFor } from './alloys.ts';
import type { Alloy, AlloySources } from './alloys.ts';
import { fToC, lbPerIn3ToGPerCm3 } from './units.ts';

const alloy = (designation: string): Alloy => {
  const found = findAlloy(designation);
  if (!found) throw new Error(`missing ${designation}`);
  return found;
};

describe('ALLOYS', () => {
  test.each([
    'A356.0', '356.0', '319.0', '413.0', '4032', '6061', '535.0', '713.0', '1100', 'Pure Al',
    'C83600', 'C90300', 'C93200', 'C95400', 'C85400', 'Zamak 3', 'ZA-27', 'Grey iron', 'Pewter',
  ])('when the library is searched for %s, then it has an entry', (designation) => {
    expect(ALLOYS.some((a) => a.designation === designation)).toBe(true);
  });

  test.each(ALLOYS.map((a) => [a.designation, a] as const))(
    'when %s is parsed with alloySchema, then it comes back unchanged',
    (_, entry) => {
      expect(alloySchema.parse(JSON.parse(JSON.stringify(entry)))).toEqual(entry);
    },
  );

  // Every stored value must name its publication, and the citation must say
  // how far it can be trusted.
  const cited: [keyof AlloySources, (a: Alloy) => boolean][] = [
    ['solidusLiquidus', () => true],
    ['density', () => true],
    ['pourRange', (a) => Boolean(a.pourRangeC.sand ?? a.pourRangeC.permanentMould)],
    ['liquidDensity', (a) => a.liquidDensityGcm3 !== undefined],
    ['volumetricShrinkage', (a) => a.volumetricShrinkagePct !== undefined],
    ['patternShrink', (a) => a.patternShrinkPct !== undefined],
    ['traits', (a) => a.traits.length > 0],
  ];
  test.each(ALLOYS.map((a) => [a.designation, a] as const))(
    'when %s stores a value, then a source names its publication and grade',
    (_, entry) => {
      for (const [key, present] of cited) {
        if (!present(entry)) continue;
        const note = entry.sources[key];
        expect(note, `${entry.designation}.${key}`).toBeDefined();
        if (note?.grade === 'memory') expect(note.citation).toContain('from memory');
        if (note?.grade === 'secondary') expect(note.citation).toContain('secondary');
        if (note?.grade === 'practice') expect(note.citation).toContain('common practice');
      }
    },
  );
});

describe('alloy values against their sources', () => {
  test.each([
    // ASM Handbook Vol. 2, A356.0 data sheet (as reproduced): 555 / 615 °C, 2.685 g/cm³
    ['A356.0', 555, 615, 'ASM Handbook Vol. 2', 'primary'],
    // ASM Handbook Vol. 2: 356.0 carries the same thermal data as A356.0
    ['356.0', 555, 615, 'ASM Handbook Vol. 2', 'primary'],
    // MakeItFrom.com 319.0 entry (secondary)
    ['319.0', 540, 600, 'MakeItFrom', 'secondary'],
    // die-casting alloy data sheet for 413.0 (secondary)
    ['413.0', 574, 582, 'die-casting alloy data sheet', 'secondary'],
    // Aluminum Association/ASM values on a 6061 mill data sheet (secondary)
    ['6061', 582, 652, 'mill data sheet', 'secondary'],
    // non-ferrous foundry handbook Table A.3, LM0 (99.5 % Al)
    ['LM0', 640, 658, 'Table A.3', 'primary'],
    // CDA/ASTM B505 values on a supplier sheet for C95400 (secondary)
    ['C95400', 1027, 1038, 'ASTM B505', 'secondary'],
    // NADCA/IZA zinc alloy table (secondary)
    ['Zamak 3', 381, 387, 'NADCA/IZA', 'secondary'],
    ['ZA-27', 376, 484, 'IZA', 'secondary'],
    // ASM Handbook Vol. 2 data sheets, from memory
    ['4032', 532, 571, 'ASM Handbook Vol. 2', 'memory'],
    ['535.0', 550, 630, 'ASM Handbook Vol. 2', 'memory'],
    ['1100', 643, 657, 'ASM Handbook Vol. 2', 'memory'],
    // CDA Copper Casting Alloys tables, from memory
    ['C83600', 854, 1010, 'Copper Development Association', 'memory'],
    ['C90300', 854, 1000, 'Copper Development Association', 'memory'],
    ['C93200', 855, 977, 'Copper Development Association', 'memory'],
    ['C85400', 927, 941, 'Copper Development Association', 'memory'],
    // from memory: pewter suppliers' data; grey-iron eutectic
    ['Pewter', 245, 295, 'pewter suppliers', 'memory'],
    ['Grey iron', 1150, 1200, 'eutectic', 'memory'],
    ['713.0', 600, 630, 'ASM Handbook Vol. 2', 'memory'],
  ] as const)('when %s is looked up, then solidus %d °C and liquidus %d °C match %s (%s)', (d, solidus, liquidus, cite, grade) => {
    const a = alloy(d);
    expect(a.solidusC).toBe(solidus);
    expect(a.liquidusC).toBe(liquidus);
    expect(a.sources.solidusLiquidus?.citation).toContain(cite);
    expect(a.sources.solidusLiquidus?.grade).toBe(grade);
  });

  test.each([
    // ITS-90 defining fixed points (Preston-Thomas, Metrologia 27, 1990), from memory
    ['Pure Al', 660.323],
    ['Pure Zn', 419.527],
    ['Pure Sn', 231.928],
  ] as const)('when %s is looked up, then it melts at the ITS-90 freezing point %d °C (value from memory)', (d, point) => {
    const a = alloy(d);
    expect(a.solidusC).toBe(point);
    expect(a.liquidusC).toBe(point);
    expect(a.sources.solidusLiquidus?.citation).toContain('Metrologia 27 (1990)');
  });

  test('when C85400 is looked up, then its CDA figures of 1700 / 1725 °F round to the stored °C (from memory)', () => {
    const a = alloy('C85400');
    expect(fToC(1700)).toBeCloseTo(a.solidusC, 0);
    expect(fToC(1725)).toBeCloseTo(a.liquidusC, 0);
  });

  test.each([
    // ASM Handbook Vol. 2, A356.0 data sheet
    ['A356.0', 2.685, 'ASM Handbook Vol. 2'],
    // Aluminum Association typical values via MatWeb (secondary)
    ['319.0', 2.79, 'MatWeb'],
    ['413.0', 2.66, 'MatWeb'],
    // CDA/ASTM B505 supplier sheet (secondary)
    ['C95400', 7.45, 'ASTM B505'],
    // NADCA/IZA tables (secondary)
    ['Zamak 3', 6.6, 'NADCA/IZA'],
    ['ZA-27', 5.0, 'IZA'],
    // German engineering tables for metalworking (Westermann)
    ['Grey iron', 7.2, 'Westermann'],
  ] as const)('when %s is looked up, then its density is %d g/cm³ as in %s', (d, density, cite) => {
    expect(alloy(d).densityGcm3).toBe(density);
    expect(alloy(d).sources.density?.citation).toContain(cite);
  });

  test.each([
    // Aluminum Association typical densities printed in lb/in³ in a foundry table (secondary)
    ['356.0', 0.097],
    ['535.0', 0.094],
    ['713.0', 0.102],
    // CDA data repeated by a supplier: 0.318 lb/in³ (secondary)
    ['C83600', 0.318],
  ] as const)('when %s is looked up, then its density matches the published %d lb/in³ within 0.01 g/cm³', (d, lbPerIn3) => {
    expect(alloy(d).densityGcm3).toBeCloseTo(lbPerIn3ToGPerCm3(lbPerIn3), 2);
    expect(alloy(d).sources.density?.citation).toContain(`${lbPerIn3} lb/in³`);
  });

  test('when pure aluminium is looked up, then its liquid density is 2.37–2.38 g/cm³ (secondary; Assael et al. 2006 from memory)', () => {
    const liquid = alloy('Pure Al').liquidDensityGcm3 ?? 0;
    expect(liquid).toBeGreaterThanOrEqual(2.37);
    expect(liquid).toBeLessThanOrEqual(2.38);
  });

  test.each([
    // Shop Practice vol. 2, shrinkage rules: cast iron 1/8 in/ft
    ['Grey iron', 1 / 8, 'Shop Practice vol. 2'],
    // CDA casting characteristics: 3/16 in/ft (from memory for C83600, secondary via C85300 for C85400)
    ['C83600', 3 / 16, 'Copper Development Association'],
    ['C85400', 3 / 16, 'C85300'],
    // early shop-practice text: aluminium bronze 7/32 in/ft (from memory)
    ['C95400', 7 / 32, '7/32 in/ft'],
  ] as const)('when %s is looked up, then its pattern allowance is the published in/ft rule', (d, inPerFt, cite) => {
    expect(alloy(d).patternShrinkPct).toBeCloseTo((inPerFt / 12) * 100, 2);
    expect(alloy(d).sources.patternShrink?.citation).toContain(cite);
  });

  test('when Zamak 3 is looked up, then its die shrinkage is 0.006 in/in as in the NADCA/IZA table (secondary)', () => {
    expect(alloy('Zamak 3').patternShrinkPct).toBeCloseTo(0.006 * 100, 9);
  });

  test('when 295.0 is looked up, then it has no permanent-mould range (ASM Handbook Vol. 2B, 295.0 data sheet)', () => {
    const a = alloy('295.0');
    expect(a.pourRangeC.permanentMould).toBeUndefined();
    expect(a.sources.pourRange?.citation).toContain('Vol. 2B');
    expect(a.traits).toContain('hot_tear_prone');
  });

  test('when aluminium pour ranges are read, then they are the from-memory bands, all above the liquidus', () => {
    // Pouring ranges are from memory (typical foundry practice), never checked
    // against the ASM data sheets.
    expect(alloy('A356.0').pourRangeC.sand).toEqual({ min: 675, max: 790 });
    expect(alloy('A356.0').sources.pourRange?.grade).toBe('memory');
    for (const a of ALLOYS) {
      for (const r of [a.pourRangeC.sand, a.pourRangeC.permanentMould]) {
        if (r) expect(r.min, a.designation).toBeGreaterThan(a.liquidusC);
      }
    }
  });
});

describe('findAlloy', () => {
  test.each([
    ['a356', 'A356.0'],
    ['A356.0', 'A356.0'],
    ['A 356', 'A356.0'],
    ['356', '356.0'],
    ['356.0', '356.0'],
    ['zamak 3', 'Zamak 3'],
    ['ZAMAK3', 'Zamak 3'],
    ['za27', 'ZA-27'],
    ['ZA-27', 'ZA-27'],
    ['c83600', 'C83600'],
    ['navy g', 'C90300'],
    ['pure aluminium', 'Pure Al'],
    ['gray iron', 'Grey iron'],
    ['  6061 ', '6061'],
  ])('when "%s" is asked for, then it finds %s', (query, designation) => {
    expect(findAlloy(query)?.designation).toBe(designation);
  });

  test.each(['A357', 'unobtanium', '', '3560'])('when "%s" is asked for, then it returns undefined', (query) => {
    expect(findAlloy(query)).toBeUndefined();
  });
});

describe('pourRangeFor', () => {
  test('when a mould kind is given, then its range is used, falling back to the only one stored', () => {
    expect(pourRangeFor(alloy('A356.0'), 'permanentMould')).toEqual({ range: { min: 675, max: 790 }, mouldKind: 'permanentMould' });
    expect(pourRangeFor(alloy('535.0'), 'permanentMould')).toEqual({ range: { min: 690, max: 760 }, mouldKind: 'sand' });
  });

  test('when no mould kind is given, then the envelope of both ranges is used', () => {
    const custom = alloySchema.parse({
      ...alloy('A356.0'),
      designation: 'test',
      pourRangeC: { sand: { min: 700, max: 760 }, permanentMould: { min: 680, max: 740 } },
    });
    expect(pourRangeFor(custom)).toEqual({ range: { min: 680, max: 760 }, mouldKind: 'any' });
  });

  test('when an alloy stores no range, then it returns undefined', () => {
    expect(pourRangeFor(alloy('Pure Zn'))).toBeUndefined();
  });
});

describe('alloySchema', () => {
  test('when a workshop alloy is stored as JSON, then it parses back into the Alloy type with defaults', () => {
    const row = JSON.stringify({
      designation: 'Wheel scrap',
      family: 'aluminium',
      commonName: 'Car wheel scrap, assumed A356',
      solidusC: 555,
      liquidusC: 615,
      densityGcm3: 2.68,
      basedOn: 'A356.0',
      source: 'workshop assumption: cast wheels are usually A356',
    });
    const parsed = alloySchema.parse(JSON.parse(row));
    expect(parsed).toMatchObject({ basedOn: 'A356.0', aliases: [], traits: [], heatTreatments: [], pourRangeC: {} });
  });

  test('when a workshop alloy is derived from A356.0, then it keeps the values and cites the base', () => {
    const wheel = deriveAlloy(alloy('A356.0'), { designation: 'Wheel scrap', source: 'assumed A356' });
    expect(wheel.basedOn).toBe('A356.0');
    expect(wheel.liquidusC).toBe(615);
    expect(wheel.commonName).toContain('assumed A356.0');
    expect(findAlloy('Wheel scrap')).toBeUndefined();
  });

  test.each([
    ['solidus above liquidus', { solidusC: 700, liquidusC: 600 }],
    ['pour range below the liquidus', { pourRangeC: { sand: { min: 500, max: 600 } } }],
    ['negative density', { densityGcm3: -1 }],
    ['unknown family', { family: 'magnesium' }],
  ])('when an alloy has %s, then it is rejected', (_, patch) => {
    expect(alloySchema.safeParse({ ...alloy('A356.0'), ...patch }).success).toBe(false);
  });
});
