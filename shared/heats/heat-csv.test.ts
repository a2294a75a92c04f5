import { describe, expect, test } from 'vitest';
import { csvIssueOf, decodeHeatCsvRow, formatCastings, formatChargeLines } from './heat-csv.ts';
import type { HeatCsvImportField } from './heat-csv.ts';
import type { HeatDetail } from './heat-schemas.ts';

const row = (cells: Partial<Record<HeatCsvImportField, string>>) => decodeHeatCsvRow((field) => cells[field]);

describe('charge_lines and castings cells', () => {
  test('when descriptions hold the list separators, then they are escaped and decode back exactly', () => {
    const lines: HeatDetail['chargeLines'] = [
      { kind: 'ingot', massG: 700.5, description: 'lot 7: good | fresh; a=b \\ c' },
      { kind: 'clean_scrap', massG: 300, description: null },
    ];

    const cell = formatChargeLines(lines);
    const decoded = row({ charge_lines: cell });

    expect(cell).toBe('ingot:700.5:lot 7\\: good \\| fresh\\; a\\=b \\\\ c|clean_scrap:300');
    expect(decoded.draft.chargeLines).toEqual(lines);
    expect(decoded.issues).toEqual([]);
  });

  test('when a casting cell is read, then each key lands on its field and the mould is a reference to resolve', () => {
    const decoded = row({ castings: 'mass_g=410;mould=Tray\\; two;coated=true;quench=water;air_cool_min=4|quench=none;notes=a\\|b' });

    expect(decoded.draft.castings).toEqual([
      { massG: 410, coated: true, quenchMedium: 'water', airCoolMin: 4 },
      { quenchMedium: 'none', notes: 'a|b' },
    ]);
    expect(decoded.moulds).toEqual([{ id: null, name: 'Tray; two' }, null]);
  });

  test('when formatting castings, then only recorded values are written', () => {
    const cell = formatCastings([
      {
        id: 'k1',
        heatId: 'h1',
        mouldId: null,
        mould: null,
        mouldPreheatC: null,
        coated: false,
        vented: null,
        pourHeightCm: 12.5,
        sectionThicknessMm: null,
        massG: 410,
        airCoolMin: null,
        quenchMedium: 'none',
        notes: 'cut = ok',
        createdAt: '',
        updatedAt: '',
        yieldPct: null,
        conditions: {},
      },
    ]);

    expect(cell).toBe('mass_g=410;coated=false;pour_height_cm=12.5;quench=none;notes=cut \\= ok');
  });
});

describe('decodeHeatCsvRow', () => {
  test('when cells are empty, then the fields are left out so the schema defaults apply', () => {
    const decoded = row({ poured_at: '2026-10-01T10:00:00Z', alloy: 'A356.0', charge_lines: 'ingot:900', pour_temp_c: '', notes: '  ' });

    expect(decoded.draft).toEqual({
      pouredAt: '2026-10-01T10:00:00Z',
      alloy: 'A356.0',
      chargeLines: [{ kind: 'ingot', massG: 900, description: null }],
      safety: { dryTools: false, ppe: false, clearFloor: false },
      castings: [],
    });
  });

  test.each([
    ['pour_temp_c', 'hot', 'is not a number'],
    ['skimmed', 'maybe', 'is not true or false'],
    ['charge_lines', 'ingot', 'give its mass'],
    ['castings', 'colour=red', 'unknown key "colour"'],
  ] as const)('when %s holds %j, then the issue names that column', (field, value, message) => {
    const decoded = row({ [field]: value });

    expect(decoded.issues).toEqual([{ field, message: expect.stringContaining(message) }]);
  });

  test('when a cell carries the formula escape, then it is removed before reading', () => {
    expect(row({ notes: "'=1+1", ambient_temp_c: "'-4" }).draft).toMatchObject({ notes: '=1+1', ambientTempC: -4 });
  });

  test('when yes/no words are used for booleans, then they are understood', () => {
    expect(row({ skimmed: 'Yes', tools_preheated: 'n', safety_ppe: '1' }).draft).toMatchObject({
      skimmed: true,
      toolsPreheated: false,
      safety: { ppe: true },
    });
  });
});

describe('csvIssueOf', () => {
  test.each([
    [{ path: ['pourTempC'], message: 'Too big' }, { field: 'pour_temp_c', message: 'Too big' }],
    [{ path: ['chargeLines', 1, 'massG'], message: 'Must be above 0 g' }, { field: 'charge_lines', message: 'line 2 massG: Must be above 0 g' }],
    [{ path: ['castings', 0, 'mouldId'], message: 'No such mould' }, { field: 'castings', message: 'casting 1 mouldId: No such mould' }],
    [{ path: ['safety', 'clearFloor'], message: 'Expected boolean' }, { field: 'safety_clear_floor', message: 'Expected boolean' }],
  ])('when the schema reports %j, then the CSV error is %j', (issue, expected) => {
    expect(csvIssueOf(issue)).toEqual(expected);
  });
});
