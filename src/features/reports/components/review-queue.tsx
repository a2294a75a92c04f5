import { useSuspenseQuery } from '@tanstack/react-query';
import { Inbox } from 'lucide-react';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { reportQueries } from '../api/report-queries.ts';
import { ReportRows } from './report-rows.tsx';

/** Submitted and in-review reports the viewer may review, oldest first. */
export function ReviewQueue({ workshopId, reportHref, studentHref }: { workshopId: string; reportHref: (id: string) => string; studentHref: (userId: string) => string }) {
  const { data } = useSuspenseQuery(reportQueries.reviewQueue(workshopId));
  return (
    <div className="flex flex-col gap-4">
      <dl className="flex gap-6 text-body" aria-label="Waiting per state">
        <div className="flex gap-1">
          <dt className="text-ink-muted">submitted, waiting for a review</dt>
          <dd className="font-mono font-semibold tabular-nums text-ink">{data.counts.submitted}</dd>
        </div>
        <div className="flex gap-1">
          <dt className="text-ink-muted">in review</dt>
          <dd className="font-mono font-semibold tabular-nums text-ink">{data.counts.in_review}</dd>
        </div>
      </dl>
      {data.items.length === 0 ? (
        <EmptyState icon={Inbox} title="Nothing waiting for review">
          <p>When one of your students submits a report, or someone asks for you, it arrives here, oldest first.</p>
        </EmptyState>
      ) : (
        <ReportRows rows={data.items} reportHref={reportHref} studentHref={studentHref} />
      )}
    </div>
  );
}
