import { useQueries, useSuspenseInfiniteQuery } from '@tanstack/react-query';
import { DEFECT_KINDS } from '#shared/domain/index.ts';
import type { DefectKindId } from '#shared/domain/index.ts';
import { REPORT_STATES, REPORT_STATE_LABELS, type ReportState } from '#shared/reports/report-states.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { reportQueries, type ReportFilters } from '../api/report-queries.ts';
import { ReportRows } from './report-rows.tsx';

type ReportListProps = {
  workshopId: string;
  filters: ReportFilters;
  onFiltersChange: (filters: ReportFilters) => void;
  students: readonly { userId: string; displayName: string }[];
  reportHref: (id: string) => string;
  studentHref?: (userId: string) => string;
  empty: React.ReactNode;
};

/** The reports the viewer may see, filtered by state, student and defect, a page at a time. */
export function ReportList({ workshopId, filters, onFiltersChange, students, reportHref, studentHref, empty }: ReportListProps) {
  const counts = useQueries({ queries: REPORT_STATES.map((s) => reportQueries.count(workshopId, s)) });
  const list = useSuspenseInfiniteQuery(reportQueries.infinite(workshopId, filters));
  const rows = list.data.pages.flatMap((p) => p.items);
  const total = counts.reduce((n, c) => n + (c.data?.count ?? 0), 0);
  return (
    <div className="flex flex-col gap-4">
      <dl className="flex flex-wrap gap-x-6 gap-y-1 text-body" aria-label="Reports per state">
        {REPORT_STATES.map((s, i) => (
          <div key={s} className="flex gap-1">
            <dt className="text-ink-muted">{REPORT_STATE_LABELS[s]}</dt>
            <dd className="font-mono font-semibold tabular-nums text-ink">
              {counts[i]?.data ? `${counts[i].data.count}${counts[i].data.more ? '+' : ''}` : '…'}
            </dd>
          </div>
        ))}
      </dl>
      <div className="flex flex-wrap gap-3">
        <SelectField label="State" value={filters.state ?? ''} onChange={(e) => onFiltersChange({ ...filters, state: (e.target.value || undefined) as ReportState | undefined })}>
          <option value="">Any state</option>
          {REPORT_STATES.map((s) => (
            <option key={s} value={s}>
              {REPORT_STATE_LABELS[s]}
            </option>
          ))}
        </SelectField>
        {students.length > 0 ? (
          <SelectField label="Student" value={filters.studentId ?? ''} onChange={(e) => onFiltersChange({ ...filters, studentId: e.target.value || undefined })}>
            <option value="">Anyone</option>
            {students.map((s) => (
              <option key={s.userId} value={s.userId}>
                {s.displayName}
              </option>
            ))}
          </SelectField>
        ) : null}
        <SelectField label="Defect" value={filters.defect ?? ''} onChange={(e) => onFiltersChange({ ...filters, defect: (e.target.value || undefined) as DefectKindId | undefined })}>
          <option value="">Any defect</option>
          {DEFECT_KINDS.map((k) => (
            <option key={k.id} value={k.id}>
              {k.name}
            </option>
          ))}
        </SelectField>
      </div>
      {rows.length === 0 ? (total === 0 && !filters.state && !filters.studentId && !filters.defect ? empty : <p className="text-body text-ink-muted">No reports match these filters.</p>) : null}
      <ReportRows rows={rows} reportHref={reportHref} studentHref={studentHref} />
      {list.hasNextPage ? (
        <Button onClick={() => void list.fetchNextPage()} pending={list.isFetchingNextPage} pendingLabel="Loading…" className="self-start">
          Load more
        </Button>
      ) : null}
    </div>
  );
}
