import { useSuspenseInfiniteQuery } from '@tanstack/react-query';
import { Download, Flame, Plus, Upload, Wrench } from 'lucide-react';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Button, ButtonLink, buttonClasses } from '#src/components/ui/button.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { paths } from '#src/config/paths.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { heatQueries, heatsCsvHref } from '../api/heat-queries.ts';
import { filterFromSearch, hasFilters, searchFromFilter, type HeatListFilter } from '../lib/heat-filters.ts';
import { HeatFilterBar, type FilterChoices } from './heat-filter-bar.tsx';
import { HeatCards, HeatTable } from './heat-table.tsx';

type HeatLogProps = {
  workshopId: string;
  units: Units;
  choices: FilterChoices;
  /** Whether this member may log heats (and so import them). */
  canLog: boolean;
};

/**
 * The heat log: filters (kept in the URL), the sorted list read a page at a
 * time from the server, the CSV of exactly what is shown, and the ways to
 * add heats. A table on a desk, cards on a phone.
 */
export function HeatLog({ workshopId, units, choices, canLog }: HeatLogProps) {
  const [search, setSearch] = useSearchParams();
  const filter = filterFromSearch(search);
  const setFilter = (next: HeatListFilter) => setSearch(searchFromFilter(next), { replace: true });

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap gap-3">
        {canLog ? (
          <>
            <ButtonLink to={paths.heatNew.getHref(workshopId)} variant="primary" icon={<Plus aria-hidden className="size-4" />}>
              Log a heat
            </ButtonLink>
            <ButtonLink to={paths.heatImport.getHref(workshopId)} icon={<Upload aria-hidden className="size-4" />}>
              Import a CSV
            </ButtonLink>
          </>
        ) : null}
        <a href={heatsCsvHref(workshopId, filter)} download className={buttonClasses('secondary')}>
          <Download aria-hidden className="size-4" />
          Download these heats as CSV
        </a>
      </div>
      <HeatFilterBar filter={filter} choices={choices} onChange={setFilter} />
      <HeatList
        workshopId={workshopId}
        units={units}
        filter={filter}
        canLog={canLog}
        onSortChange={(sort, dir) => setFilter({ ...filter, sort, dir })}
        onClear={() => setFilter({ sort: filter.sort, dir: filter.dir })}
      />
    </div>
  );
}

function HeatList({
  workshopId,
  units,
  filter,
  canLog,
  onSortChange,
  onClear,
}: {
  workshopId: string;
  units: Units;
  filter: HeatListFilter;
  canLog: boolean;
  onSortChange: (sort: HeatListFilter['sort'], dir: HeatListFilter['dir']) => void;
  onClear: () => void;
}) {
  const query = useSuspenseInfiniteQuery(heatQueries.infinite(workshopId, filter));
  const rows = useMemo(() => query.data.pages.flatMap((page) => page.items), [query.data.pages]);

  if (rows.length === 0) {
    return hasFilters(filter) ? (
      <Notice tone="info" title="No heats match these filters">
        <p>Widen the dates or clear a filter to see more of the log.</p>
        <Button className="mt-3" onClick={onClear}>
          Clear the filters
        </Button>
      </Notice>
    ) : (
      <NoHeatsYet workshopId={workshopId} canLog={canLog} />
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <p className="text-caption text-ink-muted" aria-live="polite">
        Showing <span className="figures text-ink">{rows.length}</span> {rows.length === 1 ? 'heat' : 'heats'}
        {query.hasNextPage ? '; more below' : ''}
      </p>
      <div className="hidden lg:block">
        <HeatTable workshopId={workshopId} rows={rows} units={units} filter={filter} onSortChange={onSortChange} />
      </div>
      <div className="lg:hidden">
        <HeatCards workshopId={workshopId} rows={rows} units={units} />
      </div>
      {query.hasNextPage ? (
        <Button className="self-center" pending={query.isFetchingNextPage} pendingLabel="Loading more…" onClick={() => void query.fetchNextPage()}>
          Load more heats
        </Button>
      ) : null}
    </div>
  );
}

function NoHeatsYet({ workshopId, canLog }: { workshopId: string; canLog: boolean }) {
  // The page's own "Log a heat" stays the one primary action; this teaches the order of things.
  return (
    <EmptyState
      icon={Flame}
      title="No heats logged yet"
      firstStep={
        <p>
          Add the furnace you melt in and your crucibles under Equipment, so each heat can name them.
          {canLog
            ? ' Then log your next melt as you go: the form starts the hold-time clock and works out the superheat and yield while you type.'
            : ' Heats logged by the members you mentor show here.'}
        </p>
      }
      actions={
        <ButtonLink to={paths.equipment.getHref(workshopId)} icon={<Wrench aria-hidden className="size-4" />}>
          Equipment
        </ButtonLink>
      }
    >
      <p>
        Each heat records one melt: the alloy, the charge lines (what went into the crucible, and how much), the furnace and crucible used,
        the temperatures you read and the hold time. Every casting poured from the heat links back to it.
      </p>
      <p>When a casting shows a defect, the likely causes are read from these numbers, so the more a heat records, the better the answer.</p>
    </EmptyState>
  );
}
