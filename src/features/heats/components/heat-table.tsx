import {
  columnVisibilityFeature,
  createColumnHelper,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type ColumnVisibilityState,
  type SortingState,
} from '@tanstack/react-table';
import { ArrowDown, ArrowUp, ArrowUpDown, Columns3, TriangleAlert } from 'lucide-react';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { formatMass, formatNumber, formatTemperature, formatTemperatureDifference } from '#shared/domain/index.ts';
import type { HeatRow, HeatSort } from '#shared/heats/heat-schemas.ts';
import { CheckboxField } from '#src/components/ui/checkbox-field.tsx';
import { paths } from '#src/config/paths.ts';
import { cn } from '#src/lib/cn.ts';
import { formatDateTime } from '#src/lib/format.ts';
import { readLocal, writeLocal } from '#src/lib/local-store.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { percent } from '../lib/figure-text.ts';
import type { HeatListFilter } from '../lib/heat-filters.ts';

const features = tableFeatures({ rowSortingFeature, columnVisibilityFeature });
const helper = createColumnHelper<typeof features, HeatRow>();

/** Where the column choice is remembered, per browser. */
export const HEAT_COLUMNS_STORAGE_KEY = 'pourscope:heat-log-columns';

/** Columns a desk user rarely needs until they look for them. */
const HIDDEN_BY_DEFAULT: ColumnVisibilityState = { crucible: false, meltStartedAt: false, setpointC: false };

const COLUMN_LABELS: Record<string, string> = {
  pouredAt: 'Poured',
  alloy: 'Alloy',
  caster: 'Caster',
  furnace: 'Furnace',
  crucible: 'Crucible',
  meltStartedAt: 'Melt started',
  setpointC: 'Setpoint',
  pourTempC: 'Pour',
  superheat: 'Superheat',
  hold: 'Hold',
  charge: 'Charge',
  castings: 'Castings',
  yieldPct: 'Yield',
  cautions: 'Cautions',
};
const NUMERIC = new Set(['setpointC', 'pourTempC', 'superheat', 'hold', 'charge', 'castings', 'yieldPct']);

function readColumns(): ColumnVisibilityState {
  try {
    const stored = JSON.parse(readLocal(HEAT_COLUMNS_STORAGE_KEY) ?? 'null') as unknown;
    if (stored && typeof stored === 'object' && !Array.isArray(stored)) {
      return { ...HIDDEN_BY_DEFAULT, ...Object.fromEntries(Object.entries(stored).filter(([, v]) => typeof v === 'boolean')) };
    }
  } catch {
    /* a damaged entry falls back to the defaults */
  }
  return HIDDEN_BY_DEFAULT;
}

/** "not recorded", said to screen readers and shown as a dash. */
export function NotRecorded() {
  return (
    <span className="text-ink-muted">
      <span aria-hidden>—</span>
      <span className="sr-only">not recorded</span>
    </span>
  );
}

function buildColumns(workshopId: string, units: Units) {
  const { temperatureUnit: t, massUnit: m } = units;
  return helper.columns([
    helper.accessor('pouredAt', {
      header: 'Poured',
      enableHiding: false,
      cell: (info) => (
        <Link to={paths.heat.getHref(workshopId, info.row.original.id)} className="font-medium whitespace-nowrap text-link underline">
          {formatDateTime(info.getValue())}
        </Link>
      ),
    }),
    helper.accessor('alloy', { header: 'Alloy', enableSorting: false }),
    helper.accessor('casterName', { id: 'caster', header: 'Caster', enableSorting: false }),
    helper.accessor('furnaceName', { id: 'furnace', header: 'Furnace', enableSorting: false, cell: (info) => info.getValue() ?? <NotRecorded /> }),
    helper.accessor('crucibleName', { id: 'crucible', header: 'Crucible', enableSorting: false, cell: (info) => info.getValue() ?? <NotRecorded /> }),
    helper.accessor('meltStartedAt', {
      header: 'Melt started',
      cell: (info) => {
        const v = info.getValue();
        return v ? formatDateTime(v) : <NotRecorded />;
      },
    }),
    helper.accessor('setpointC', {
      header: 'Setpoint',
      enableSorting: false,
      cell: (info) => {
        const v = info.getValue();
        return v === null ? <NotRecorded /> : <span className="text-heat">{formatTemperature(v, t)}</span>;
      },
    }),
    helper.accessor('pourTempC', {
      header: 'Pour',
      cell: (info) => {
        const v = info.getValue();
        return v === null ? <NotRecorded /> : <span className="text-heat">{formatTemperature(v, t)}</span>;
      },
    }),
    helper.accessor((row) => row.figures.superheatC, {
      id: 'superheat',
      header: 'Superheat',
      enableSorting: false,
      cell: (info) => {
        const v = info.getValue();
        return v === null ? <NotRecorded /> : <span className="text-heat">{formatTemperatureDifference(v, t)}</span>;
      },
    }),
    helper.accessor((row) => row.figures.holdTimeMin, {
      id: 'hold',
      header: 'Hold',
      enableSorting: false,
      cell: (info) => {
        const v = info.getValue();
        return v === null ? <NotRecorded /> : `${formatNumber(v, 0)} min`;
      },
    }),
    helper.accessor((row) => row.figures.chargeG, {
      id: 'charge',
      header: 'Charge',
      enableSorting: false,
      cell: (info) => formatMass(info.getValue(), m),
    }),
    helper.accessor('castingCount', {
      id: 'castings',
      header: 'Castings',
      enableSorting: false,
      cell: (info) => {
        const row = info.row.original;
        if (row.castingCount === 0) return <span className="text-ink-muted">none</span>;
        return (
          <>
            {row.castingCount}
            <span className="text-ink-muted"> · {row.figures.castingsG === null ? 'not all weighed' : formatMass(row.figures.castingsG, m)}</span>
          </>
        );
      },
    }),
    helper.accessor((row) => row.figures.yieldPct, {
      id: 'yieldPct',
      header: 'Yield',
      cell: (info) => {
        const v = info.getValue();
        return v === null ? <NotRecorded /> : percent(v);
      },
    }),
    helper.accessor((row) => row.cautionIds.length, {
      id: 'cautions',
      header: 'Cautions',
      enableSorting: false,
      cell: (info) => <CautionCount count={info.getValue()} />,
    }),
  ]);
}

function CautionCount({ count }: { count: number }) {
  if (count === 0) return <span className="text-ink-muted">none</span>;
  return (
    <span className="inline-flex items-center gap-1 text-caution">
      <TriangleAlert aria-hidden className="size-4" />
      <span className="text-ink">
        {count} {count === 1 ? 'caution' : 'cautions'}
      </span>
    </span>
  );
}

type HeatTableProps = {
  workshopId: string;
  rows: readonly HeatRow[];
  units: Units;
  filter: HeatListFilter;
  onSortChange: (sort: HeatSort, dir: HeatListFilter['dir']) => void;
};

/**
 * The heat log for the desk: a dense table sorted on the server (the
 * sortable headers are the API's sorts), with the choice of columns
 * remembered in this browser. Phones get HeatCards instead.
 */
export function HeatTable({ workshopId, rows, units, filter, onSortChange }: HeatTableProps) {
  const { temperatureUnit, massUnit } = units;
  const columns = useMemo(() => buildColumns(workshopId, { temperatureUnit, massUnit }), [workshopId, temperatureUnit, massUnit]);
  const [columnVisibility, setColumnVisibility] = useState<ColumnVisibilityState>(readColumns);
  const sorting: SortingState = useMemo(() => [{ id: filter.sort, desc: filter.dir === 'desc' }], [filter.sort, filter.dir]);

  const table = useTable({
    features,
    columns,
    data: rows as HeatRow[],
    state: { sorting, columnVisibility },
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      if (first) onSortChange(first.id as HeatSort, first.desc ? 'desc' : 'asc');
    },
    onColumnVisibilityChange: (updater) => {
      setColumnVisibility((current) => {
        const next = typeof updater === 'function' ? updater(current) : updater;
        writeLocal(HEAT_COLUMNS_STORAGE_KEY, JSON.stringify(next));
        return next;
      });
    },
    getRowId: (row) => row.id,
    manualSorting: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
  });

  return (
    <div className="flex flex-col gap-3">
      <details className="self-end">
        <summary className="inline-flex min-h-10 cursor-pointer items-center gap-2 rounded-md border border-line-strong bg-surface-raised px-3 text-caption font-semibold text-ink">
          <Columns3 aria-hidden className="size-4" /> Columns
        </summary>
        <fieldset className="mt-2 grid gap-2 rounded-md border border-line bg-surface-raised p-3 sm:grid-cols-3">
          <legend className="sr-only">Columns to show</legend>
          {table
            .getAllLeafColumns()
            .filter((column) => column.getCanHide())
            .map((column) => (
              <CheckboxField
                key={column.id}
                label={COLUMN_LABELS[column.id] ?? column.id}
                checked={column.getIsVisible()}
                onChange={(e) => column.toggleVisibility(e.target.checked)}
              />
            ))}
        </fieldset>
      </details>
      <div className="overflow-x-auto rounded-lg border border-line">
        <table className="w-full border-collapse text-left text-body">
          <caption className="sr-only">Heats, sorted by {COLUMN_LABELS[filter.sort].toLowerCase()}, {filter.dir === 'desc' ? 'newest or highest first' : 'oldest or lowest first'}</caption>
          <thead className="bg-surface-sunken">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  const label = COLUMN_LABELS[header.column.id] ?? header.column.id;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                      className={cn('px-3 py-2 text-caption font-semibold whitespace-nowrap text-ink-muted', NUMERIC.has(header.column.id) && 'text-right')}
                    >
                      {canSort ? (
                        <button
                          type="button"
                          className="inline-flex min-h-10 items-center gap-1 rounded font-semibold text-ink"
                          onClick={() => header.column.toggleSorting(sorted ? sorted === 'asc' : true)}
                        >
                          {label}
                          {sorted === 'asc' ? (
                            <ArrowUp aria-hidden className="size-4" />
                          ) : sorted === 'desc' ? (
                            <ArrowDown aria-hidden className="size-4" />
                          ) : (
                            <ArrowUpDown aria-hidden className="size-4 text-ink-muted" />
                          )}
                          <span className="sr-only">{sorted ? ', change the order' : ', sort by this'}</span>
                        </button>
                      ) : (
                        <table.FlexRender header={header} />
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-line align-top">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={cn('px-3 py-2', NUMERIC.has(cell.column.id) && 'figures text-right whitespace-nowrap')}>
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** The heat log on a phone: one card per heat, the whole card a link, the figures that matter at the bench. */
export function HeatCards({ workshopId, rows, units }: { workshopId: string; rows: readonly HeatRow[]; units: Units }) {
  return (
    <ul className="flex flex-col gap-3" aria-label="Heats">
      {rows.map((row) => (
        <li key={row.id}>
          <Link
            to={paths.heat.getHref(workshopId, row.id)}
            className="flex min-h-12 flex-col gap-2 rounded-lg border border-line bg-surface-raised p-4 text-ink no-underline"
          >
            <span className="flex flex-wrap items-baseline justify-between gap-2">
              <span className="text-lead font-semibold">{row.alloy}</span>
              <span className="text-caption text-ink-muted">{formatDateTime(row.pouredAt)}</span>
            </span>
            <span className="text-caption text-ink-muted">
              {row.casterName}
              {row.furnaceName ? ` · ${row.furnaceName}` : ''}
            </span>
            <span className="figures flex flex-wrap gap-x-4 gap-y-1 text-body">
              <span>
                pour{' '}
                {row.pourTempC === null ? <NotRecorded /> : <span className="font-semibold text-heat">{formatTemperature(row.pourTempC, units.temperatureUnit)}</span>}
              </span>
              <span>
                superheat{' '}
                {row.figures.superheatC === null ? (
                  <NotRecorded />
                ) : (
                  <span className="font-semibold text-heat">{formatTemperatureDifference(row.figures.superheatC, units.temperatureUnit)}</span>
                )}
              </span>
              <span>yield {row.figures.yieldPct === null ? <NotRecorded /> : <span className="font-semibold">{percent(row.figures.yieldPct)}</span>}</span>
            </span>
            <CautionCount count={row.cautionIds.length} />
          </Link>
        </li>
      ))}
    </ul>
  );
}
