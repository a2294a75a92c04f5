import { CircleAlert, CircleCheck, FileUp, SearchCheck, Upload } from 'lucide-react';
import { useId, useMemo, useState } from 'react';
import { formatMass, formatTemperature } from '#shared/domain/index.ts';
import { chargeTotalG } from '#shared/heats/heat-figures.ts';
import {
  HEAT_CSV_IMPORT_FIELDS,
  HEAT_CSV_REQUIRED_FIELDS,
  HEAT_IMPORT_MAX_ROWS,
  type HeatCsvImportField,
} from '#shared/heats/heat-csv.ts';
import { Button, ButtonLink } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextareaField } from '#src/components/ui/textarea-field.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDateTime } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';
import type { RelatedKeys } from '../api/heat-invalidation.ts';
import { useImportHeats, type ImportOutcome } from '../api/use-import-heats.ts';
import { autoMapping, effectiveMapping, headerOf, type ImportMapping } from '../lib/csv-mapping.ts';

/** What each of our fields holds, for the mapping list. */
const FIELD_HINTS: Record<HeatCsvImportField, string> = {
  poured_at: 'date and time of the pour, with its offset (2026-11-28T18:30:00Z)',
  melt_started_at: 'when the charge went in',
  caster_id: 'member id; your own heats when left out',
  alloy: 'a designation from the alloy library, e.g. A356.0',
  furnace_id: 'furnace id',
  furnace: 'furnace name, as on the Equipment page',
  crucible_id: 'crucible id',
  crucible: 'crucible name',
  setpoint_c: '°C',
  peak_temp_c: '°C',
  pour_temp_c: '°C',
  flux_kind: 'none, cover, drossing, cleaning, borax, other',
  flux_g: 'g',
  degassing: 'none, argon_lance, nitrogen_lance, rotary, tablet, other',
  skimmed: 'true or false',
  tools_preheated: 'true or false',
  ambient_temp_c: '°C',
  relative_humidity_pct: '%',
  crucible_remainder_g: 'g',
  crucible_shock: 'none, fast_heat_up, quenched',
  safety_dry_tools: 'true or false',
  safety_ppe: 'true or false',
  safety_clear_floor: 'true or false',
  charge_lines: '"kind:grams:description", lines joined by |',
  castings: '"mass_g=…;mould=…", castings joined by |',
  notes: 'free text',
};

const REQUIRED = new Set<string>(HEAT_CSV_REQUIRED_FIELDS);
const requestKey = (csv: string, mapping: ImportMapping) => `${csv}\u0000${JSON.stringify(mapping)}`;

/**
 * Import heats from a spreadsheet: paste or pick a CSV, match its columns
 * to ours (by header name first), check every row on the server without
 * writing anything, then import. The server writes all rows or none.
 */
export function HeatImportPanel({ workshopId, units, related }: { workshopId: string; units: Units; related?: RelatedKeys }) {
  const fileId = useId();
  const [csv, setCsv] = useState('');
  const [fileName, setFileName] = useState<string | null>(null);
  const [overrides, setOverrides] = useState<Partial<Record<HeatCsvImportField, string>>>({});
  const [checked, setChecked] = useState<{ key: string; outcome: ImportOutcome } | null>(null);
  const importHeats = useImportHeats(workshopId, related);

  const header = useMemo(() => headerOf(csv), [csv]);
  const auto = useMemo(() => autoMapping(header.headers), [header.headers]);
  const mapping = effectiveMapping(auto, overrides);
  const key = requestKey(csv, mapping);
  const current = checked && checked.key === key ? checked.outcome : null;
  const imported = current && !current.dryRun && current.heatIds.length > 0 ? current : null;

  /** A new file has new columns, so the caster's earlier choices and check no longer apply; an edit keeps them (the check shows as stale). */
  const loadText = (text: string, name: string | null, { fresh }: { fresh: boolean }) => {
    setCsv(text);
    setFileName(name);
    if (fresh) {
      setOverrides({});
      setChecked(null);
    }
  };

  const run = (dryRun: boolean) =>
    importHeats.mutate({ csv, mapping, dryRun }, { onSuccess: (outcome) => setChecked({ key, outcome }) });

  if (imported) {
    return (
      <Notice tone="sound" role="status" title={`Imported ${imported.heatIds.length} ${imported.heatIds.length === 1 ? 'heat' : 'heats'}`}>
        <p>They are in the heat log now, with their figures worked out.</p>
        <div className="mt-3 flex flex-wrap gap-3">
          <ButtonLink to={paths.heats.getHref(workshopId)} variant="primary">
            Open the heat log
          </ButtonLink>
          <Button onClick={() => loadText('', null, { fresh: true })}>Import another file</Button>
        </div>
      </Notice>
    );
  }

  const missingRequired = HEAT_CSV_REQUIRED_FIELDS.filter((f) => !mapping[f]);
  const problemRows = current ? new Set(current.errors.map((e) => e.row)) : new Set<number>();
  const mayImport = current !== null && current.errors.length === 0 && current.preview.length > 0;

  return (
    <div className="flex max-w-4xl flex-col gap-6">
      <Notice tone="info" title="All or nothing">
        <p>
          Checking writes nothing. The import itself saves every row or none: while any row has a problem, nothing is written, so fix the file
          (or the column choices) and check again. Temperatures are read as °C and masses as grams, as the export writes them. At most{' '}
          {HEAT_IMPORT_MAX_ROWS} heats per file.
        </p>
      </Notice>

      <Card title="1. The file">
        <div className="flex flex-col gap-4">
          <div className="flex flex-col gap-1.5">
            <label htmlFor={fileId} className="text-body font-medium text-ink">
              Choose a CSV file
            </label>
            <input
              id={fileId}
              type="file"
              accept=".csv,text/csv"
              className="min-h-12 text-body text-ink file:mr-3 file:min-h-12 file:rounded-md file:border file:border-line-strong file:bg-surface-raised file:px-4 file:font-semibold file:text-ink lg:file:min-h-10"
              onChange={async (event) => {
                const file = event.target.files?.[0];
                if (file) loadText(await file.text(), file.name, { fresh: true });
              }}
            />
            {fileName ? (
              <p className="flex items-center gap-1.5 text-caption text-ink">
                <FileUp aria-hidden className="size-4" /> {fileName}
              </p>
            ) : null}
          </div>
          <TextareaField
            label="Or paste it here"
            rows={6}
            className="font-mono"
            spellCheck={false}
            value={csv}
            hint="The first row names the columns."
            error={header.error ?? undefined}
            onChange={(e) => loadText(e.target.value, null, { fresh: false })}
          />
          {header.headers.length > 0 ? (
            <p className="text-caption text-ink">
              <span className="figures">{header.headers.length}</span> columns, <span className="figures">{header.rows}</span>{' '}
              {header.rows === 1 ? 'row' : 'rows'} of heats.
            </p>
          ) : null}
        </div>
      </Card>

      {header.headers.length > 0 ? (
        <Card title="2. Match the columns" description="Matched by their names where we could tell; change any that are wrong.">
          <div className="grid gap-4 md:grid-cols-2">
            {HEAT_CSV_IMPORT_FIELDS.map((field) => {
              // The server reads a column with our exact name whatever the mapping says, so it cannot be left out.
              const ownColumn = header.headers.includes(field);
              return (
                <SelectField
                  key={field}
                  label={
                    <>
                      <span className="figures">{field}</span>
                      {REQUIRED.has(field) ? <span className="text-caption text-ink-muted"> (needed)</span> : null}
                    </>
                  }
                  hint={FIELD_HINTS[field]}
                  value={mapping[field] ?? ''}
                  onChange={(e) => setOverrides((o) => ({ ...o, [field]: e.target.value }))}
                >
                  <option value="" disabled={ownColumn}>
                    Not imported
                  </option>
                  {header.headers.map((h, i) => (
                    <option key={`${i}-${h}`} value={h}>
                      {h}
                    </option>
                  ))}
                </SelectField>
              );
            })}
          </div>
          {missingRequired.length > 0 ? (
            <p className="mt-4 flex items-start gap-1.5 text-body text-ink">
              <CircleAlert aria-hidden className="mt-0.5 size-5 shrink-0 text-danger" />
              Every heat needs {missingRequired.join(', ')}: choose the column that holds {missingRequired.length === 1 ? 'it' : 'them'}.
            </p>
          ) : null}
        </Card>
      ) : null}

      {header.headers.length > 0 ? (
        <Card title="3. Check, then import">
          <div className="flex flex-col gap-4">
            {importHeats.isError ? (
              <Notice tone="danger" role="alert" title="That did not go through">
                {errorMessage(importHeats.error)}
              </Notice>
            ) : null}
            {current?.rejected ? (
              <Notice tone="danger" role="alert" title="Nothing was imported">
                {current.rejected} The problems are listed below.
              </Notice>
            ) : null}
            <div className="flex flex-wrap gap-3">
              <Button
                icon={<SearchCheck aria-hidden className="size-4" />}
                pending={importHeats.isPending && importHeats.variables?.dryRun === true}
                pendingLabel="Checking…"
                disabled={importHeats.isPending || missingRequired.length > 0 || Boolean(header.error)}
                onClick={() => run(true)}
              >
                Check every row
              </Button>
              <Button
                variant="primary"
                icon={<Upload aria-hidden className="size-4" />}
                pending={importHeats.isPending && importHeats.variables?.dryRun === false}
                pendingLabel="Importing…"
                disabled={!mayImport || importHeats.isPending}
                onClick={() => run(false)}
              >
                {current && mayImport ? `Import ${current.preview.length} ${current.preview.length === 1 ? 'heat' : 'heats'}` : 'Import'}
              </Button>
            </div>
            {!current ? (
              <p className="text-caption text-ink-muted">
                {checked ? 'The file or the column choices changed since the last check; check again.' : 'Check the rows first; the import opens once none has a problem.'}
              </p>
            ) : (
              <ImportPreview outcome={current} problemRows={problemRows} units={units} />
            )}
          </div>
        </Card>
      ) : null}
    </div>
  );
}

function ImportPreview({ outcome, problemRows, units }: { outcome: ImportOutcome; problemRows: Set<number>; units: Units }) {
  const rows = [...new Set([...outcome.preview.map((p) => p.row), ...outcome.errors.map((e) => e.row)])].sort((a, b) => a - b);
  const byRow = new Map(outcome.preview.map((p) => [p.row, p.heat]));
  return (
    <div className="flex flex-col gap-3">
      {outcome.errors.length === 0 ? (
        <Notice tone="sound" title={`All ${outcome.preview.length} rows are ready`}>
          <p>Nothing has been written yet. Import them when the preview looks right.</p>
        </Notice>
      ) : (
        <Notice tone="danger" title={`${problemRows.size} ${problemRows.size === 1 ? 'row has' : 'rows have'} problems; nothing will be imported until they are fixed`}>
          <p>
            {outcome.preview.length} {outcome.preview.length === 1 ? 'row is' : 'rows are'} ready. Fix the others in the file and check again.
          </p>
        </Notice>
      )}
      <div className="overflow-x-auto rounded-lg border border-line">
        <table className="w-full border-collapse text-left text-body">
          <caption className="sr-only">Rows of the file as they would be imported</caption>
          <thead className="bg-surface-sunken text-caption text-ink-muted">
            <tr>
              <th scope="col" className="px-3 py-2 font-medium">Row</th>
              <th scope="col" className="px-3 py-2 font-medium">Status</th>
              <th scope="col" className="px-3 py-2 font-medium">Poured</th>
              <th scope="col" className="px-3 py-2 font-medium">Alloy</th>
              <th scope="col" className="px-3 py-2 text-right font-medium">Charge</th>
              <th scope="col" className="px-3 py-2 text-right font-medium">Pour</th>
              <th scope="col" className="px-3 py-2 text-right font-medium">Castings</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => {
              const heat = byRow.get(row);
              const errors = outcome.errors.filter((e) => e.row === row);
              return (
                <tr key={row} className="border-t border-line align-top">
                  <th scope="row" className="figures px-3 py-2 font-medium">
                    {row}
                  </th>
                  <td className="px-3 py-2">
                    {errors.length === 0 ? (
                      <span className="inline-flex items-center gap-1.5">
                        <CircleCheck aria-hidden className="size-4 text-sound" /> ready
                      </span>
                    ) : (
                      <ul className="flex flex-col gap-1">
                        {errors.map((e, i) => (
                          <li key={i} className="flex items-start gap-1.5">
                            <CircleAlert aria-hidden className="mt-0.5 size-4 shrink-0 text-danger" />
                            <span>
                              <span className="figures font-semibold">{e.field}</span>: {e.message}
                            </span>
                          </li>
                        ))}
                      </ul>
                    )}
                  </td>
                  <td className="px-3 py-2">{heat ? formatDateTime(heat.pouredAt) : null}</td>
                  <td className="px-3 py-2">{heat?.alloy}</td>
                  <td className="figures px-3 py-2 text-right">
                    {heat ? formatMass(chargeTotalG(heat.chargeLines), units.massUnit) : null}
                  </td>
                  <td className="figures px-3 py-2 text-right text-heat">
                    {heat?.pourTempC == null ? null : formatTemperature(heat.pourTempC, units.temperatureUnit)}
                  </td>
                  <td className="figures px-3 py-2 text-right">{heat ? heat.castings.length : null}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
