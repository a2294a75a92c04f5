import { CircleCheck, CircleDashed, Eye, Send } from 'lucide-react';
import { REPORT_STATE_LABELS, type ReportState } from '#shared/reports/report-states.ts';
import { cn } from '#src/lib/cn.ts';

const LOOK: Record<ReportState, { icon: typeof Send; classes: string }> = {
  draft: { icon: CircleDashed, classes: 'border-line-strong text-ink' },
  submitted: { icon: Send, classes: 'border-info-line bg-info-bg text-info' },
  in_review: { icon: Eye, classes: 'border-caution-line bg-caution-bg text-caution' },
  resolved: { icon: CircleCheck, classes: 'border-sound-line bg-sound-bg text-sound' },
};

/** A report's state: icon and word, never colour alone. */
export function StateBadge({ state, className }: { state: ReportState; className?: string }) {
  const { icon: Icon, classes } = LOOK[state];
  return (
    <span className={cn('inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-caption font-semibold', classes, className)} data-testid="report-state">
      <Icon aria-hidden className="size-4" />
      {REPORT_STATE_LABELS[state]}
    </span>
  );
}
