import type { LucideIcon } from 'lucide-react';
import type { ReactNode } from 'react';

type EmptyStateProps = {
  icon: LucideIcon;
  title: string;
  /** What this area will hold. */
  children: ReactNode;
  /** What to do first, in a sentence or a short list. */
  firstStep?: ReactNode;
  actions?: ReactNode;
};

/** An empty area that teaches: what belongs here and the first thing to do. */
export function EmptyState({ icon: Icon, title, children, firstStep, actions }: EmptyStateProps) {
  return (
    <section className="flex flex-col gap-4 rounded-lg border border-dashed border-line-strong bg-surface-raised p-5 lg:p-8">
      <Icon aria-hidden className="size-10 text-ink-muted" strokeWidth={1.5} />
      <h2 className="text-title font-semibold text-ink">{title}</h2>
      <div className="flex max-w-prose flex-col gap-3 text-body text-ink">{children}</div>
      {firstStep ? (
        <div className="max-w-prose rounded-md bg-surface-sunken p-4">
          <h3 className="mb-1 text-body font-semibold text-ink">First step</h3>
          <div className="text-body text-ink">{firstStep}</div>
        </div>
      ) : null}
      {actions ? <div className="flex flex-wrap gap-3">{actions}</div> : null}
    </section>
  );
}
