import { CsvSyntaxError, parseCsv } from '#shared/heats/csv.ts';
import { HEAT_CSV_IMPORT_FIELDS, type HeatCsvImportField } from '#shared/heats/heat-csv.ts';

export type ImportMapping = Partial<Record<HeatCsvImportField, string>>;

/** "Pour temp (°C)" and "pour_temp_c" both become "pourtempc". */
export const normaliseHeader = (header: string) => header.toLowerCase().replace(/[^a-z0-9]/g, '');

/**
 * Other names spreadsheets commonly give our columns, already normalised.
 * Our own column names (written by the export) always match first.
 */
const ALIASES: Partial<Record<HeatCsvImportField, readonly string[]>> = {
  poured_at: ['poured', 'pouredon', 'pourtime', 'date', 'datetime', 'when'],
  melt_started_at: ['meltstarted', 'meltstart', 'meltedat', 'start'],
  alloy: ['metal', 'alloydesignation'],
  furnace: ['furnacename'],
  crucible: ['cruciblename', 'pot'],
  setpoint_c: ['setpoint', 'setpointdegc'],
  peak_temp_c: ['peaktemp', 'peaktemperature', 'peak'],
  pour_temp_c: ['pourtemp', 'pourtemperature', 'pour', 'pourc'],
  flux_kind: ['flux'],
  flux_g: ['fluxamount', 'fluxgrams', 'fluxmass'],
  ambient_temp_c: ['ambient', 'ambienttemp', 'airtemp', 'airtemperature'],
  relative_humidity_pct: ['humidity', 'rh', 'relativehumidity', 'rhpct'],
  crucible_remainder_g: ['remainder', 'leftincrucible'],
  charge_lines: ['charge', 'chargelines'],
  castings: ['casting'],
  notes: ['note', 'comments', 'comment'],
};

/** The header row of pasted or chosen CSV text, or a message when it is not CSV. */
export function headerOf(csv: string): { headers: string[]; rows: number; error: string | null } {
  if (!csv.trim()) return { headers: [], rows: 0, error: null };
  try {
    const [header, ...rows] = parseCsv(csv);
    return { headers: header ? header.cells.map((c) => c.trim()).filter(Boolean) : [], rows: rows.length, error: null };
  } catch (error) {
    if (error instanceof CsvSyntaxError) return { headers: [], rows: 0, error: error.message };
    throw error;
  }
}

/** Our field for each of their columns we can tell by name: an exact name first, then a common alias. */
export function autoMapping(headers: readonly string[]): ImportMapping {
  const mapping: ImportMapping = {};
  const taken = new Set<string>();
  const byName = new Map(headers.map((h) => [normaliseHeader(h), h]));
  for (const field of HEAT_CSV_IMPORT_FIELDS) {
    const exact = byName.get(normaliseHeader(field));
    if (exact && !taken.has(exact)) {
      mapping[field] = exact;
      taken.add(exact);
    }
  }
  for (const field of HEAT_CSV_IMPORT_FIELDS) {
    if (mapping[field]) continue;
    const alias = ALIASES[field]?.map((a) => byName.get(a)).find((h) => h && !taken.has(h));
    if (alias) {
      mapping[field] = alias;
      taken.add(alias);
    }
  }
  return mapping;
}

/**
 * The mapping to send: the caster's own choices over the automatic ones.
 * `''` in `overrides` means "not imported".
 */
export function effectiveMapping(auto: ImportMapping, overrides: Partial<Record<HeatCsvImportField, string>>): ImportMapping {
  const mapping: ImportMapping = {};
  for (const field of HEAT_CSV_IMPORT_FIELDS) {
    const chosen = field in overrides ? overrides[field] : auto[field];
    if (chosen) mapping[field] = chosen;
  }
  return mapping;
}
