import { ArrowDown, ArrowUp, ArrowUpDown, ChevronDown, ChevronRight, Pencil, Plus, Trash2 } from 'lucide-react';
import { Fragment, useDeferredValue, useId, useMemo, useState } from 'react';
import type { AlloyEntry } from '#shared/alloys/alloy-schemas.ts';
import { formatTemperature, type Alloy } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { cn } from '#src/lib/cn.ts';
import { temperatureSymbol, type Units } from '#src/lib/unit-input.ts';
import { useDeleteAlloy } from '../api/use-delete-alloy.ts';
import {
  FAMILY_LABELS,
  SOURCE_FIELDS,
  SOURCE_GRADE_LABELS,
  formatDensity,
  formatPatternAllowance,
  formatPercentRange,
  formatTemperatureRange,
} from '../lib/alloy-figures.ts';
import { buildAlloyIndex, searchAlloyEntries, sortAlloyEntries, type AlloySort, type AlloySortKey } from '../lib/alloy-table.ts';
import { WorkshopAlloyForm } from './workshop-alloy-form.tsx';

type AlloyLibraryProps = {
  workshopId: string;
  entries: readonly AlloyEntry[];
  units: Units;
  /** Admins add, edit and remove the workshop's own alloys (the server decides). */
  mayEdit: boolean;
};

const rowKey = (e: AlloyEntry) => e.id ?? `library:${e.alloy.designation}`;

type Column = { key: AlloySortKey; label: string; numeric: boolean };

/**
 * Every alloy of the library and the workshop's own, with each value's
 * source one tap away in an expanding row (never hover-only). Sorted by any
 * column, searched forgivingly; temperatures in the user's unit.
 */
export function AlloyLibrary({ workshopId, entries, units, mayEdit }: AlloyLibraryProps) {
  const [query, setQuery] = useState('');
  const deferredQuery = useDeferredValue(query);
  const [sort, setSort] = useState<AlloySort | null>(null);
  const [open, setOpen] = useState<ReadonlySet<string>>(new Set());
  const [form, setForm] = useState<{ mode: 'add' } | { mode: 'edit'; entry: AlloyEntry } | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const captionId = useId();
  const t = temperatureSymbol(units.temperatureUnit);

  const index = useMemo(() => buildAlloyIndex(entries), [entries]);
  const rows = useMemo(() => {
    const found = searchAlloyEntries(entries, deferredQuery, index);
    return sort ? sortAlloyEntries(found, sort) : found;
  }, [entries, deferredQuery, index, sort]);
  const library = useMemo(() => entries.filter((e) => e.origin === 'library').map((e) => e.alloy), [entries]);
  const ownCount = entries.length - library.length;

  const columns: Column[] = [
    { key: 'designation', label: 'Alloy', numeric: false },
    { key: 'family', label: 'Family', numeric: false },
    { key: 'solidus', label: `Solidus (${t})`, numeric: true },
    { key: 'liquidus', label: `Liquidus (${t})`, numeric: true },
    { key: 'pourSand', label: `Pour, sand (${t})`, numeric: true },
    { key: 'pourPermanentMould', label: `Pour, permanent mould (${t})`, numeric: true },
    { key: 'density', label: 'Density', numeric: true },
    { key: 'shrinkage', label: 'Volumetric shrinkage', numeric: true },
    { key: 'pattern', label: 'Pattern allowance', numeric: true },
  ];

  const toggleSort = (key: AlloySortKey) =>
    setSort((s) => (s?.key === key ? { key, direction: s.direction === 'ascending' ? 'descending' : 'ascending' } : { key, direction: 'ascending' }));
  const toggleRow = (key: string) =>
    setOpen((s) => {
      const next = new Set(s);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });

  return (
    <div className="flex flex-col gap-5">
      {done ? (
        <Notice tone="sound" role="status" title={done} />
      ) : null}

      {form ? (
        <Card title={form.mode === 'edit' ? `Edit ${form.entry.alloy.designation}` : 'Add a workshop alloy'}>
          <WorkshopAlloyForm
            workshopId={workshopId}
            units={units}
            library={library}
            editing={form.mode === 'edit' ? form.entry : undefined}
            onDone={(designation) => {
              setDone(form.mode === 'edit' ? `${designation} saved` : `${designation} added to the library`);
              setForm(null);
            }}
            onCancel={() => setForm(null)}
          />
        </Card>
      ) : null}

      <div className="flex flex-wrap items-end gap-4">
        <TextField
          className="min-w-64 flex-1"
          label="Search alloys"
          type="search"
          autoComplete="off"
          hint="A designation (a356, za27), a name (bronze, Tenzaloy) or a family."
          value={query}
          onChange={(e) => setQuery(e.target.value)}
        />
        {mayEdit && !form ? (
          <Button
            variant="primary"
            icon={<Plus aria-hidden className="size-4" />}
            onClick={() => {
              setDone(null);
              setForm({ mode: 'add' });
            }}
          >
            Add a workshop alloy
          </Button>
        ) : null}
      </div>

      {ownCount === 0 ? (
        <Notice tone="info" title="Melting scrap the library does not name?">
          <p>
            {mayEdit
              ? 'Add it as a workshop alloy, e.g. “wheel scrap”, based on the library alloy it most likely is, with a note of where the values come from. Your members can then pick it.'
              : 'An admin of this workshop can add it as a workshop alloy, e.g. “wheel scrap” based on A356.0, with a note of where the values come from.'}
          </p>
        </Notice>
      ) : null}

      <p role="status" className="text-body text-ink-muted">
        {rows.length === entries.length ? `${entries.length} alloys` : `${rows.length} of ${entries.length} alloys match “${deferredQuery.trim()}”`}
        {sort ? `, sorted by ${columns.find((c) => c.key === sort.key)?.label.toLowerCase()}, ${sort.direction}` : deferredQuery.trim() ? ', best match first' : ''}.
      </p>

      {rows.length === 0 ? (
        <Notice tone="info" title="No alloy matches">
          <p>Try a designation such as A356 or 85-5-5-5, or a plain word such as bronze, brass or zinc.</p>
        </Notice>
      ) : (
        <div role="region" aria-labelledby={captionId} tabIndex={0} className="relative overflow-x-auto rounded-lg border border-line bg-surface-raised">
          <table className="w-full min-w-[64rem] border-collapse text-left text-body">
            <caption id={captionId} className="sr-only">
              Alloy library: temperatures in {t}; each row opens to show where its values come from
            </caption>
            <thead className="bg-surface-sunken">
              <tr>
                {columns.map((c) => (
                  <th
                    key={c.key}
                    scope="col"
                    aria-sort={sort?.key === c.key ? sort.direction : undefined}
                    className={cn('px-3 py-2 align-bottom font-semibold', c.numeric && 'text-right')}
                  >
                    <button
                      type="button"
                      onClick={() => toggleSort(c.key)}
                      className={cn('inline-flex min-h-12 items-center gap-1 lg:min-h-9', c.numeric && 'flex-row-reverse text-right')}
                    >
                      <span>{c.label}</span>
                      <SortIcon state={sort?.key === c.key ? sort.direction : undefined} />
                    </button>
                  </th>
                ))}
                <th scope="col" className="px-3 py-2 align-bottom font-semibold">
                  Sources
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((entry) => {
                const key = rowKey(entry);
                const expanded = open.has(key);
                const detailsId = `alloy-sources-${key.replace(/[^a-zA-Z0-9-]/g, '-')}`;
                return (
                  <Fragment key={key}>
                    <AlloyRow
                      entry={entry}
                      units={units}
                      expanded={expanded}
                      detailsId={detailsId}
                      onToggle={() => toggleRow(key)}
                    />
                    {expanded ? (
                      <tr id={detailsId} className="border-t border-line bg-surface">
                        <td colSpan={columns.length + 1} className="px-3 py-4">
                          <AlloySourcesPanel
                            workshopId={workshopId}
                            entry={entry}
                            mayEdit={mayEdit && entry.origin === 'workshop'}
                            onEdit={() => {
                              setDone(null);
                              setForm({ mode: 'edit', entry });
                            }}
                            onDeleted={(designation) => setDone(`${designation} removed from the library`)}
                          />
                        </td>
                      </tr>
                    ) : null}
                  </Fragment>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}

function SortIcon({ state }: { state?: 'ascending' | 'descending' }) {
  const Icon = state === 'ascending' ? ArrowUp : state === 'descending' ? ArrowDown : ArrowUpDown;
  return <Icon aria-hidden className={cn('size-4 shrink-0', state ? 'text-ink' : 'text-ink-muted')} />;
}

function Pair({ primary, secondary }: { primary: string; secondary?: string }) {
  return (
    <span className="figures flex flex-col items-end whitespace-nowrap">
      <span>{primary}</span>
      {secondary ? <span className="text-caption text-ink-muted">{secondary}</span> : null}
    </span>
  );
}

function AlloyRow({
  entry,
  units,
  expanded,
  detailsId,
  onToggle,
}: {
  entry: AlloyEntry;
  units: Units;
  expanded: boolean;
  detailsId: string;
  onToggle: () => void;
}) {
  const a = entry.alloy;
  const unit = units.temperatureUnit;
  const density = formatDensity(a.densityGcm3, units.massUnit);
  const pattern = formatPatternAllowance(a.patternShrinkPct);
  const num = 'px-3 py-3 text-right align-top';
  return (
    <tr className="border-t border-line">
      <th scope="row" className="min-w-48 px-3 py-3 text-left align-top font-normal">
        <span className="figures block font-semibold text-ink">{a.designation}</span>
        <span className="block text-caption text-ink-muted">{a.commonName}</span>
        {entry.origin === 'workshop' ? (
          <span className="mt-1 inline-block rounded-sm border border-line-strong px-1.5 text-caption font-medium text-ink">
            Workshop alloy{a.basedOn ? `, based on ${a.basedOn}` : ''}
          </span>
        ) : null}
      </th>
      <td className="px-3 py-3 align-top">{FAMILY_LABELS[a.family]}</td>
      <td className={num}>
        <Pair primary={formatTemperature(a.solidusC, unit)} />
      </td>
      <td className={num}>
        <Pair primary={formatTemperature(a.liquidusC, unit)} />
      </td>
      <td className={num}>
        <Pair primary={formatTemperatureRange(a.pourRangeC.sand, unit)} />
      </td>
      <td className={num}>
        <Pair primary={formatTemperatureRange(a.pourRangeC.permanentMould, unit)} />
      </td>
      <td className={num}>
        <Pair primary={density.primary} secondary={density.secondary} />
      </td>
      <td className={num}>
        <Pair primary={formatPercentRange(a.volumetricShrinkagePct)} />
      </td>
      <td className={num}>{pattern ? <Pair primary={pattern.primary} secondary={pattern.secondary} /> : <Pair primary="—" />}</td>
      <td className="px-3 py-3 align-top">
        <button
          type="button"
          aria-expanded={expanded}
          aria-controls={expanded ? detailsId : undefined}
          onClick={onToggle}
          className="inline-flex min-h-12 items-center gap-1 font-medium text-link underline lg:min-h-9"
        >
          {expanded ? <ChevronDown aria-hidden className="size-4" /> : <ChevronRight aria-hidden className="size-4" />}
          {expanded ? 'Hide sources' : 'Sources'}
          <span className="sr-only"> for {a.designation}</span>
        </button>
      </td>
    </tr>
  );
}

function AlloySourcesPanel({
  workshopId,
  entry,
  mayEdit,
  onEdit,
  onDeleted,
}: {
  workshopId: string;
  entry: AlloyEntry;
  mayEdit: boolean;
  onEdit: () => void;
  onDeleted: (designation: string) => void;
}) {
  const a: Alloy = entry.alloy;
  const remove = useDeleteAlloy(workshopId);
  const [confirming, setConfirming] = useState(false);
  return (
    <div className="flex max-w-prose flex-col gap-3">
      <h3 className="text-body font-semibold text-ink">Where the values for {a.designation} come from</h3>
      {entry.origin === 'workshop' ? (
        <p className="text-body text-ink">
          <span className="font-medium">Workshop's note:</span> {a.source ?? 'none given'}
          {entry.createdByName ? <span className="text-ink-muted"> (added by {entry.createdByName})</span> : null}
        </p>
      ) : null}
      <dl className="grid gap-2 sm:grid-cols-[minmax(10rem,auto)_1fr]">
        {SOURCE_FIELDS.filter((f) => f.present(a)).map((f) => {
          const note = a.sources[f.key];
          return (
            <Fragment key={f.key}>
              <dt className="font-medium text-ink">{f.label}</dt>
              <dd className="text-ink">
                {note ? (
                  <>
                    {entry.origin === 'workshop' && a.basedOn ? <span className="text-ink-muted">From {a.basedOn}: </span> : null}
                    {note.citation} <span className="text-caption text-ink-muted">[{SOURCE_GRADE_LABELS[note.grade]}]</span>
                  </>
                ) : entry.origin === 'workshop' ? (
                  <span>The workshop's own value (see its note).</span>
                ) : (
                  <span className="text-ink-muted">No citation stored.</span>
                )}
              </dd>
            </Fragment>
          );
        })}
      </dl>
      {mayEdit ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button size="sm" icon={<Pencil aria-hidden className="size-4" />} onClick={onEdit}>
            Edit {a.designation}
          </Button>
          {confirming ? (
            <>
              <span className="text-body text-ink">Remove {a.designation} from the library?</span>
              <Button
                size="sm"
                variant="danger"
                pending={remove.isPending}
                pendingLabel="Removing…"
                onClick={() => remove.mutate(entry.id!, { onSuccess: () => onDeleted(a.designation) })}
              >
                Yes, remove it
              </Button>
              <Button size="sm" onClick={() => setConfirming(false)}>
                Keep it
              </Button>
            </>
          ) : (
            <Button size="sm" variant="danger" icon={<Trash2 aria-hidden className="size-4" />} onClick={() => setConfirming(true)}>
              Remove {a.designation}
            </Button>
          )}
          {remove.isError ? (
            <Notice tone="danger" role="alert" title="Not removed">
              {isApiError(remove.error) ? remove.error.message : 'Something went wrong. Try again.'}
            </Notice>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
