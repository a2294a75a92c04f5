import { useSuspenseQuery } from '@tanstack/react-query';
import { findDefectKind } from '#shared/domain/index.ts';
import { REPORT_STATES, REPORT_STATE_LABELS } from '#shared/reports/report-states.ts';
import { reportQueries } from '../api/report-queries.ts';
import { ReportRows } from './report-rows.tsx';

/** One student's heats, reports and defect trend by month, as a table with a bar per cell. */
export function StudentOverview({ workshopId, userId, reportHref }: { workshopId: string; userId: string; reportHref: (id: string) => string }) {
  const { data } = useSuspenseQuery(reportQueries.student(workshopId, userId));
  const months = [...new Set(data.defectTrend.map((t) => t.month))];
  const kinds = [...new Set(data.defectTrend.map((t) => t.kind))];
  const max = Math.max(1, ...data.defectTrend.map((t) => t.count));
  const countOf = (month: string, kind: string) => data.defectTrend.find((t) => t.month === month && t.kind === kind)?.count ?? 0;
  return (
    <div className="flex flex-col gap-6">
      <dl className="flex flex-wrap gap-x-6 gap-y-1 text-body">
        <div className="flex gap-1">
          <dt className="text-ink-muted">heats logged</dt>
          <dd className="font-mono font-semibold tabular-nums">{data.heatCount}</dd>
        </div>
        {REPORT_STATES.map((s) => (
          <div key={s} className="flex gap-1">
            <dt className="text-ink-muted">reports {REPORT_STATE_LABELS[s]}</dt>
            <dd className="font-mono font-semibold tabular-nums">{data.reportCounts[s]}</dd>
          </div>
        ))}
      </dl>
      <section aria-labelledby="trend-heading" className="flex flex-col gap-2">
        <h2 id="trend-heading" className="text-title font-semibold text-ink">
          Defects marked per month
        </h2>
        {months.length === 0 ? (
          <p className="text-body text-ink-muted">No marked defects yet.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="min-w-full text-body">
              <caption className="sr-only">Marks per defect kind per month of the pour</caption>
              <thead>
                <tr>
                  <th scope="col" className="p-2 text-left">Month</th>
                  {kinds.map((k) => (
                    <th key={k} scope="col" className="p-2 text-left">
                      {findDefectKind(k)?.name ?? k}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {months.map((m) => (
                  <tr key={m} className="border-t border-line">
                    <th scope="row" className="p-2 text-left font-mono tabular-nums">{m}</th>
                    {kinds.map((k) => {
                      const n = countOf(m, k);
                      return (
                        <td key={k} className="p-2">
                          <span className="flex items-center gap-2">
                            <span className="w-6 text-right font-mono tabular-nums">{n}</span>
                            <span aria-hidden className="h-2 rounded-full bg-info" style={{ width: `${(n / max) * 6}rem` }} />
                          </span>
                        </td>
                      );
                    })}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      <section aria-labelledby="student-reports-heading" className="flex flex-col gap-2">
        <h2 id="student-reports-heading" className="text-title font-semibold text-ink">
          Reports
        </h2>
        {data.reports.length === 0 ? <p className="text-body text-ink-muted">No reports yet.</p> : <ReportRows rows={data.reports} reportHref={reportHref} />}
      </section>
    </div>
  );
}
