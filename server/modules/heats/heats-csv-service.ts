import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { CsvSyntaxError, formatCsv, parseCsv } from '../../../shared/heats/csv.ts';
import type { CsvRecord } from '../../../shared/heats/csv.ts';
import {
  HEAT_CSV_COLUMNS,
  HEAT_CSV_IMPORT_FIELDS,
  HEAT_CSV_REQUIRED_FIELDS,
  HEAT_IMPORT_MAX_ROWS,
  csvIssueOf,
  decodeHeatCsvRow,
  heatCsvRecord,
} from '../../../shared/heats/heat-csv.ts';
import type {
  HeatCsvImportField,
  HeatCsvRef,
  HeatImportError,
  HeatImportInput,
  HeatImportResult,
} from '../../../shared/heats/heat-csv.ts';
import { heatCreateSchema } from '../../../shared/heats/heat-schemas.ts';
import type { HeatFilter } from '../../../shared/heats/heat-schemas.ts';
import { forbidden } from '../../lib/app-error.ts';
import * as equipmentService from '../equipment/equipment-service.ts';
import type { HeatWrite } from './heats-repository.ts';
import * as heatsService from './heats-service.ts';

// The heat log out to a spreadsheet and back. The format is described in
// shared/heats/heat-csv.ts and README; an import checks every row first and
// writes all of them in one transaction, or none.

/** Every heat the actor may read that matches, one CSV row each, with a BOM so spreadsheets read UTF-8. */
export async function exportCsv(actor: Actor, workshopId: string, filter: HeatFilter): Promise<string> {
  const heats = await heatsService.heatsForExport(actor, workshopId, filter);
  return `\uFEFF${formatCsv([[...HEAT_CSV_COLUMNS], ...heats.map(heatCsvRecord)])}`;
}

type Named = { id: string; name: string };

/** A furnace, crucible or mould named in a row: by id in this workshop first, then by name. */
function resolveRef(
  ref: HeatCsvRef | null,
  items: readonly Named[],
  what: string,
): { id: string | null; message?: string } {
  if (!ref) return { id: null };
  const byId = ref.id ? items.find((i) => i.id === ref.id) : undefined;
  if (byId) return { id: byId.id };
  if (ref.name) {
    const key = ref.name.trim().toLowerCase();
    const matches = items.filter((i) => i.name.trim().toLowerCase() === key);
    if (matches.length === 1) return { id: matches[0].id };
    if (matches.length > 1) return { id: null, message: `more than one ${what} is called "${ref.name}"; give its id` };
    return { id: null, message: `no ${what} called "${ref.name}" in this workshop` };
  }
  return { id: null, message: `no ${what} with id ${ref.id} in this workshop` };
}

export async function importCsv(actor: Actor, workshopId: string, input: HeatImportInput): Promise<HeatImportResult> {
  if (!can(actor, 'create', 'heat')) throw forbidden();
  const result = (errors: HeatImportError[], preview: HeatImportResult['preview'] = [], heatIds: string[] = []): HeatImportResult => ({
    dryRun: input.dryRun,
    preview,
    errors,
    heatIds,
  });

  let records: CsvRecord[];
  try {
    records = parseCsv(input.csv);
  } catch (error) {
    if (error instanceof CsvSyntaxError) return result([{ row: error.row, field: 'csv', message: error.message }]);
    throw error;
  }
  const [header, ...rows] = records;
  if (!header) return result([{ row: 1, field: 'csv', message: 'The CSV has no header row' }]);
  if (rows.length === 0) return result([{ row: header.row, field: 'csv', message: 'The CSV has a header but no rows' }]);
  if (rows.length > HEAT_IMPORT_MAX_ROWS) {
    return result([{ row: header.row, field: 'csv', message: `At most ${HEAT_IMPORT_MAX_ROWS} heats per import; split the file` }]);
  }

  // Which of their columns feeds each of our fields.
  const headerIndex = new Map<string, number>();
  header.cells.forEach((h, i) => {
    if (!headerIndex.has(h.trim())) headerIndex.set(h.trim(), i);
  });
  const headerErrors: HeatImportError[] = [];
  const columnOf = new Map<HeatCsvImportField, number>();
  for (const field of HEAT_CSV_IMPORT_FIELDS) {
    const theirs = input.mapping[field];
    if (theirs !== undefined) {
      const index = headerIndex.get(theirs);
      if (index === undefined) headerErrors.push({ row: header.row, field, message: `no column "${theirs}" in the header row` });
      else columnOf.set(field, index);
    } else if (headerIndex.has(field)) {
      columnOf.set(field, headerIndex.get(field)!);
    }
  }
  for (const field of HEAT_CSV_REQUIRED_FIELDS) {
    if (!columnOf.has(field) && input.mapping[field] === undefined) {
      headerErrors.push({ row: header.row, field, message: `map a column to ${field}; every heat needs it` });
    }
  }
  if (headerErrors.length) return result(headerErrors);

  const equipment = await equipmentService.equipmentOf(workshopId);
  const casterChecks = new Map<string, Awaited<ReturnType<typeof heatsService.casterIssue>>>();
  const errors: HeatImportError[] = [];
  const preview: HeatImportResult['preview'] = [];

  for (const record of rows) {
    const rowErrors: HeatImportError[] = [];
    const fail = (field: string, message: string) => rowErrors.push({ row: record.row, field, message });
    const decoded = decodeHeatCsvRow((field) => {
      const index = columnOf.get(field);
      return index === undefined ? undefined : (record.cells[index] ?? '');
    });
    for (const issue of decoded.issues) fail(issue.field, issue.message);

    const furnace = resolveRef(decoded.furnace, equipment.furnaces, 'furnace');
    if (furnace.message) fail(decoded.furnace?.name ? 'furnace' : 'furnace_id', furnace.message);
    const crucible = resolveRef(decoded.crucible, equipment.crucibles, 'crucible');
    if (crucible.message) fail(decoded.crucible?.name ? 'crucible' : 'crucible_id', crucible.message);
    decoded.draft.furnaceId = furnace.id;
    decoded.draft.crucibleId = crucible.id;
    decoded.moulds.forEach((ref, i) => {
      const mould = resolveRef(ref, equipment.moulds, 'mould');
      if (mould.message) fail('castings', `casting ${i + 1}: ${mould.message}`);
      decoded.draft.castings[i].mouldId = mould.id;
    });

    const parsed = heatCreateSchema.safeParse(decoded.draft);
    if (!parsed.success) {
      // A value the decoder already refused comes back from the schema as a
      // missing one; report each problem once.
      const decoderFields = new Set(decoded.issues.map((i) => i.field));
      for (const issue of parsed.error.issues) {
        const { field, message } = csvIssueOf(issue);
        if (!decoderFields.has(field)) fail(field, message);
      }
    } else {
      const casterId = parsed.data.casterId ?? actor.id;
      if (!casterChecks.has(casterId)) casterChecks.set(casterId, await heatsService.casterIssue(actor, workshopId, casterId));
      const caster = casterChecks.get(casterId);
      if (caster === 'forbidden') fail('caster_id', 'only admins import heats for other members');
      else if (caster) fail('caster_id', caster.message);
      if (rowErrors.length === 0) preview.push({ row: record.row, heat: { ...parsed.data, casterId } });
    }
    errors.push(...rowErrors);
  }

  if (input.dryRun || errors.length) return result(errors, preview);
  const heatIds = await heatsService.insertCheckedHeats(
    workshopId,
    preview.map((p) => p.heat as HeatWrite),
  );
  return result([], preview, heatIds);
}
