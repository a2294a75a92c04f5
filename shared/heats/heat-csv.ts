import { z } from 'zod';
import { csvValue, unescapeFormula } from './csv.ts';
import type { HeatCreateInput, HeatDetail } from './heat-schemas.ts';

// The heat log as CSV, one row per heat. This comment is the format's
// description (README's API table points here); the column names are a
// contract, so only ever add to them.
//
// - Temperatures °C, masses g, times ISO 8601 in UTC, booleans true/false,
//   an empty cell for "not recorded".
// - charge_lines: "kind:massG:description" per line, lines joined by "|",
//   e.g. "ingot:1200:A356 ingot|clean_scrap:350:wheel offcuts".
// - castings: per casting "key=value" pairs joined by ";", castings joined by
//   "|", e.g. "mass_g=420;mould=Ingot tray;mould_preheat_c=200;quench=none".
// - Inside those two list cells a backslash escapes \ | ; : = in text.
// - Text cells that start with = + - @ (or tab, CR) get a leading apostrophe
//   so spreadsheets show them instead of running them; import removes it.
// - heat_id, caster_name and the totals are written for spreadsheets and
//   ignored by import; furnace, crucible and mould are matched by id in the
//   workshop first, then by name.

export const HEAT_CSV_COLUMNS = [
  'heat_id',
  'poured_at',
  'melt_started_at',
  'caster_id',
  'caster_name',
  'alloy',
  'furnace_id',
  'furnace',
  'crucible_id',
  'crucible',
  'setpoint_c',
  'peak_temp_c',
  'pour_temp_c',
  'flux_kind',
  'flux_g',
  'degassing',
  'skimmed',
  'tools_preheated',
  'ambient_temp_c',
  'relative_humidity_pct',
  'crucible_remainder_g',
  'crucible_shock',
  'safety_dry_tools',
  'safety_ppe',
  'safety_clear_floor',
  'charge_lines',
  'charge_g',
  'castings',
  'casting_count',
  'castings_g',
  'yield_pct',
  'notes',
] as const;
export type HeatCsvColumn = (typeof HEAT_CSV_COLUMNS)[number];

/** Columns an import reads; the rest are derived and written for people. */
export const HEAT_CSV_IMPORT_FIELDS = [
  'poured_at',
  'melt_started_at',
  'caster_id',
  'alloy',
  'furnace_id',
  'furnace',
  'crucible_id',
  'crucible',
  'setpoint_c',
  'peak_temp_c',
  'pour_temp_c',
  'flux_kind',
  'flux_g',
  'degassing',
  'skimmed',
  'tools_preheated',
  'ambient_temp_c',
  'relative_humidity_pct',
  'crucible_remainder_g',
  'crucible_shock',
  'safety_dry_tools',
  'safety_ppe',
  'safety_clear_floor',
  'charge_lines',
  'castings',
  'notes',
] as const satisfies readonly HeatCsvColumn[];
export type HeatCsvImportField = (typeof HEAT_CSV_IMPORT_FIELDS)[number];

/** Without these an import row cannot become a heat. */
export const HEAT_CSV_REQUIRED_FIELDS = ['poured_at', 'alloy', 'charge_lines'] as const satisfies readonly HeatCsvImportField[];

/** Rows one import may carry; the API's 256 kB body limit binds first for wide rows. */
export const HEAT_IMPORT_MAX_ROWS = 1000;

export const heatImportSchema = z.object({
  csv: z.string().min(1, 'Paste or choose a CSV file').max(250_000, 'At most 250 000 characters per import'),
  /** Our field → the header of their column. Fields left out are read from a column of the same name, if any. */
  mapping: z.partialRecord(z.enum(HEAT_CSV_IMPORT_FIELDS), z.string().trim().min(1).max(200)).default({}),
  /** Check and preview only; nothing is written. */
  dryRun: z.boolean().default(true),
});
export type HeatImportInput = z.output<typeof heatImportSchema>;

export type HeatImportError = { row: number; field: string; message: string };
export type HeatImportResult = {
  dryRun: boolean;
  /** The rows as they would be (or were) saved, with references resolved. */
  preview: { row: number; heat: HeatCreateInput }[];
  errors: HeatImportError[];
  /** Ids of the heats written; empty on a dry run or with any error. */
  heatIds: string[];
};

// ── list cells ──────────────────────────────────────────────────────────────

const escapeListText = (text: string) => text.replace(/[\\|;:=]/g, (ch) => `\\${ch}`);
const unescapeListText = (text: string) => text.replace(/\\(.)/gs, '$1');

/** Splits at `sep` where it is not escaped; the parts keep their escapes. */
function splitUnescaped(text: string, sep: string): string[] {
  const parts: string[] = [];
  let part = '';
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === '\\' && i + 1 < text.length) {
      part += ch + text[i + 1];
      i += 1;
    } else if (ch === sep) {
      parts.push(part);
      part = '';
    } else {
      part += ch;
    }
  }
  parts.push(part);
  return parts;
}

const num = (v: number | null) => (v === null ? '' : String(v));
const bool = (v: boolean | null) => (v === null ? '' : String(v));

/** "kind:massG:description|…" */
export function formatChargeLines(lines: HeatDetail['chargeLines']): string {
  return lines
    .map((l) => (l.description ? `${l.kind}:${l.massG}:${escapeListText(l.description)}` : `${l.kind}:${l.massG}`))
    .join('|');
}

/** "mass_g=…;mould=…|…" with only the recorded values. */
export function formatCastings(castings: HeatDetail['castings']): string {
  return castings
    .map((k) => {
      const pairs: [string, string][] = [
        ['mass_g', num(k.massG)],
        ['mould_id', k.mouldId ?? ''],
        ['mould', k.mould?.name ?? ''],
        ['mould_preheat_c', num(k.mouldPreheatC)],
        ['coated', bool(k.coated)],
        ['vented', bool(k.vented)],
        ['pour_height_cm', num(k.pourHeightCm)],
        ['section_mm', num(k.sectionThicknessMm)],
        ['air_cool_min', num(k.airCoolMin)],
        ['quench', k.quenchMedium],
        ['notes', k.notes ?? ''],
      ];
      return pairs
        .filter(([, v]) => v !== '')
        .map(([key, v]) => `${key}=${escapeListText(v)}`)
        .join(';');
    })
    .join('|');
}

/** One heat as a CSV record, cells in HEAT_CSV_COLUMNS order and already escaped. */
export function heatCsvRecord(heat: HeatDetail): string[] {
  const values: Record<HeatCsvColumn, string | number | boolean | null> = {
    heat_id: heat.id,
    poured_at: heat.pouredAt,
    melt_started_at: heat.meltStartedAt,
    caster_id: heat.casterId,
    caster_name: heat.casterName,
    alloy: heat.alloy,
    furnace_id: heat.furnaceId,
    furnace: heat.furnace?.name ?? null,
    crucible_id: heat.crucibleId,
    crucible: heat.crucible?.name ?? null,
    setpoint_c: heat.setpointC,
    peak_temp_c: heat.peakTempC,
    pour_temp_c: heat.pourTempC,
    flux_kind: heat.fluxKind,
    flux_g: heat.fluxAmountG,
    degassing: heat.degassing,
    skimmed: heat.skimmed,
    tools_preheated: heat.toolsPreheated,
    ambient_temp_c: heat.ambientTempC,
    relative_humidity_pct: heat.relativeHumidityPct,
    crucible_remainder_g: heat.crucibleRemainderG,
    crucible_shock: heat.crucibleShock,
    safety_dry_tools: heat.safety.dryTools,
    safety_ppe: heat.safety.ppe,
    safety_clear_floor: heat.safety.clearFloor,
    charge_lines: formatChargeLines(heat.chargeLines),
    charge_g: heat.figures.chargeG,
    castings: formatCastings(heat.castings),
    casting_count: heat.castings.length,
    castings_g: heat.figures.castingsG,
    yield_pct: heat.figures.yieldPct === null ? null : Number(heat.figures.yieldPct.toFixed(2)),
    notes: heat.notes,
  };
  return HEAT_CSV_COLUMNS.map((col) => csvValue(values[col]));
}

// ── reading a row ───────────────────────────────────────────────────────────

/** A piece of equipment named in a row, by id, by name, or both. */
export type HeatCsvRef = { id: string | null; name: string | null };

export type DecodedHeatRow = {
  /** A heat draft for heatCreateSchema; furnace, crucible and mould ids are filled by the caller from the refs. */
  draft: Record<string, unknown> & { castings: Record<string, unknown>[] };
  furnace: HeatCsvRef | null;
  crucible: HeatCsvRef | null;
  /** Per casting, in order. */
  moulds: (HeatCsvRef | null)[];
  issues: { field: string; message: string }[];
};

const TRUE_WORDS = new Set(['true', 'yes', 'y', '1']);
const FALSE_WORDS = new Set(['false', 'no', 'n', '0']);
const NUMBER_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

const CASTING_KEYS = {
  mass_g: 'massG',
  mould_preheat_c: 'mouldPreheatC',
  pour_height_cm: 'pourHeightCm',
  section_mm: 'sectionThicknessMm',
  air_cool_min: 'airCoolMin',
} as const;

/**
 * Turns one row's cells into a heat draft. `cell(field)` gives the raw cell
 * of the column mapped to that field (undefined when unmapped). Empty cells
 * are left out, so the schema's defaults and nulls apply.
 */
export function decodeHeatCsvRow(cell: (field: HeatCsvImportField) => string | undefined): DecodedHeatRow {
  const issues: DecodedHeatRow['issues'] = [];
  const draft: DecodedHeatRow['draft'] = { castings: [] };
  const text = (field: HeatCsvImportField): string | undefined => {
    const raw = cell(field);
    if (raw === undefined) return undefined;
    const v = unescapeFormula(raw.trim()).trim();
    return v === '' ? undefined : v;
  };
  /** `where` prefixes the message inside list cells ("line 2: "). */
  const number = (field: string, raw: string | undefined, where = ''): number | undefined => {
    if (raw === undefined) return undefined;
    if (!NUMBER_TEXT.test(raw)) {
      issues.push({ field, message: `${where}"${raw}" is not a number; write it like 720 or 720.5` });
      return undefined;
    }
    return Number(raw);
  };
  const boolean = (field: string, raw: string | undefined, where = ''): boolean | undefined => {
    if (raw === undefined) return undefined;
    const word = raw.toLowerCase();
    if (TRUE_WORDS.has(word)) return true;
    if (FALSE_WORDS.has(word)) return false;
    issues.push({ field, message: `${where}"${raw}" is not true or false` });
    return undefined;
  };

  const set = (key: string, value: unknown) => {
    if (value !== undefined) draft[key] = value;
  };
  set('pouredAt', text('poured_at'));
  set('meltStartedAt', text('melt_started_at'));
  set('casterId', text('caster_id'));
  set('alloy', text('alloy'));
  set('setpointC', number('setpoint_c', text('setpoint_c')));
  set('peakTempC', number('peak_temp_c', text('peak_temp_c')));
  set('pourTempC', number('pour_temp_c', text('pour_temp_c')));
  set('fluxKind', text('flux_kind'));
  set('fluxAmountG', number('flux_g', text('flux_g')));
  set('degassing', text('degassing'));
  set('skimmed', boolean('skimmed', text('skimmed')));
  set('toolsPreheated', boolean('tools_preheated', text('tools_preheated')));
  set('ambientTempC', number('ambient_temp_c', text('ambient_temp_c')));
  set('relativeHumidityPct', number('relative_humidity_pct', text('relative_humidity_pct')));
  set('crucibleRemainderG', number('crucible_remainder_g', text('crucible_remainder_g')));
  set('crucibleShock', text('crucible_shock'));
  set('notes', text('notes'));
  draft.safety = {
    dryTools: boolean('safety_dry_tools', text('safety_dry_tools')) ?? false,
    ppe: boolean('safety_ppe', text('safety_ppe')) ?? false,
    clearFloor: boolean('safety_clear_floor', text('safety_clear_floor')) ?? false,
  };

  const lines = text('charge_lines');
  if (lines !== undefined) {
    draft.chargeLines = splitUnescaped(lines, '|').map((item, i) => {
      const [kind = '', mass = '', ...rest] = splitUnescaped(item.trim(), ':');
      const massText = unescapeListText(mass).trim();
      const massG = number('charge_lines', massText === '' ? undefined : massText, `line ${i + 1}: `);
      if (massText === '') issues.push({ field: 'charge_lines', message: `line ${i + 1}: give its mass in g ("kind:massG:description")` });
      const description = unescapeListText(rest.join(':')).trim();
      return { kind: unescapeListText(kind).trim(), massG, description: description || null };
    });
  }

  const ref = (id: string | undefined, name: string | undefined): HeatCsvRef | null =>
    id === undefined && name === undefined ? null : { id: id ?? null, name: name ?? null };
  const furnace = ref(text('furnace_id'), text('furnace'));
  const crucible = ref(text('crucible_id'), text('crucible'));

  const moulds: (HeatCsvRef | null)[] = [];
  const castings = text('castings');
  if (castings !== undefined) {
    splitUnescaped(castings, '|').forEach((item, i) => {
      const casting: Record<string, unknown> = {};
      let mouldId: string | undefined;
      let mouldName: string | undefined;
      for (const pair of splitUnescaped(item.trim(), ';')) {
        if (pair.trim() === '') continue;
        const [rawKey, ...rawValue] = splitUnescaped(pair, '=');
        const key = unescapeListText(rawKey).trim();
        const value = unescapeListText(rawValue.join('=')).trim();
        const where = `casting ${i + 1} ${key}: `;
        if (key in CASTING_KEYS) {
          casting[CASTING_KEYS[key as keyof typeof CASTING_KEYS]] = number('castings', value || undefined, where);
        } else if (key === 'coated' || key === 'vented') {
          casting[key] = boolean('castings', value || undefined, where);
        } else if (key === 'quench') {
          casting.quenchMedium = value;
        } else if (key === 'notes') {
          casting.notes = value;
        } else if (key === 'mould_id') {
          mouldId = value || undefined;
        } else if (key === 'mould') {
          mouldName = value || undefined;
        } else {
          issues.push({ field: 'castings', message: `casting ${i + 1}: unknown key "${key}"` });
        }
      }
      draft.castings.push(casting);
      moulds.push(ref(mouldId, mouldName));
    });
  }
  return { draft, furnace, crucible, moulds, issues };
}

const PATH_FIELDS: Record<string, HeatCsvImportField> = {
  pouredAt: 'poured_at',
  meltStartedAt: 'melt_started_at',
  casterId: 'caster_id',
  alloy: 'alloy',
  furnaceId: 'furnace',
  crucibleId: 'crucible',
  setpointC: 'setpoint_c',
  peakTempC: 'peak_temp_c',
  pourTempC: 'pour_temp_c',
  fluxKind: 'flux_kind',
  fluxAmountG: 'flux_g',
  degassing: 'degassing',
  skimmed: 'skimmed',
  toolsPreheated: 'tools_preheated',
  ambientTempC: 'ambient_temp_c',
  relativeHumidityPct: 'relative_humidity_pct',
  crucibleRemainderG: 'crucible_remainder_g',
  crucibleShock: 'crucible_shock',
  chargeLines: 'charge_lines',
  castings: 'castings',
  notes: 'notes',
};
const SAFETY_FIELDS: Record<string, HeatCsvImportField> = {
  dryTools: 'safety_dry_tools',
  ppe: 'safety_ppe',
  clearFloor: 'safety_clear_floor',
};

/**
 * Where a heat-schema issue belongs in the CSV: the column it came from, and
 * for list cells which line or casting (1-based) it is about.
 */
export function csvIssueOf(issue: { path: readonly PropertyKey[]; message: string }): { field: string; message: string } {
  const [top, index, sub] = issue.path;
  if (top === 'safety' && typeof index === 'string') return { field: SAFETY_FIELDS[index] ?? 'safety', message: issue.message };
  const field = PATH_FIELDS[String(top)] ?? String(top ?? 'row');
  if (typeof index === 'number') {
    const what = top === 'chargeLines' ? 'line' : 'casting';
    return { field, message: `${what} ${index + 1}${sub === undefined ? '' : ` ${String(sub)}`}: ${issue.message}` };
  }
  return { field, message: issue.message };
}
