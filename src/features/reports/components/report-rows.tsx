import { MessageSquare } from 'lucide-react';
import { findDefectKind, findMeltVariable } from '#shared/domain/index.ts';
import type { ReportRow } from '#shared/reports/report-schemas.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { formatDate } from '#src/lib/format.ts';
import { StateBadge } from './state-badge.tsx';

/** Reports as a list of cards: one column on a phone, still readable at the desk. */
export function ReportRows({ rows, reportHref, studentHref }: { rows: readonly ReportRow[]; reportHref: (id: string) => string; studentHref?: (userId: string) => string }) {
  return (
    <ul className="flex flex-col gap-2" data-testid="report-rows">
      {rows.map((r) => (
        <li key={r.id} className="flex flex-col gap-1 rounded-md border border-line bg-surface-raised p-3">
          <div className="flex flex-wrap items-center gap-2">
            <StateBadge state={r.state} />
            <TextLink to={reportHref(r.id)} className="text-body font-semibold">
              {r.title}
            </TextLink>
          </div>
          <p className="text-caption text-ink-muted">
            {studentHref ? <TextLink to={studentHref(r.authorId)}>{r.authorName}</TextLink> : r.authorName} ·{' '}
            {r.submittedAt ? `submitted ${formatDate(r.submittedAt)}` : `started ${formatDate(r.createdAt)}`}
            {r.defectKinds.length > 0 ? ` · ${r.defectKinds.map((k) => findDefectKind(k)?.name.toLowerCase() ?? k).join(', ')}` : ''}
            {r.topCause ? ` · top cause: ${findMeltVariable(r.topCause)?.name.toLowerCase() ?? r.topCause}` : ''}
            <span className="ml-2 inline-flex items-center gap-1">
              <MessageSquare aria-hidden className="size-3.5" /> {r.commentCount} {r.commentCount === 1 ? 'comment' : 'comments'}
            </span>
          </p>
        </li>
      ))}
    </ul>
  );
}
