import type { ReactNode } from 'react';
import { cn } from '#src/lib/cn.ts';

type FigureProps = {
  label: string;
  /** The figure with its unit, or null while it cannot be worked out. */
  value: string | null;
  /** What to do to get the figure, shown instead of a bare dash. */
  missing?: string;
  /** Temperatures read in the hot accent (AAA on both themes). */
  heat?: boolean;
  children?: ReactNode;
};

/**
 * One computed figure beside its inputs: a label, the number in tabular
 * numerals with its unit, and a line of explanation. Use inside a <dl>.
 */
export function Figure({ label, value, missing = 'not known yet', heat, children }: FigureProps) {
  return (
    <div className="flex flex-col gap-0.5 rounded-md bg-surface-sunken px-3 py-2">
      <dt className="text-caption font-medium text-ink-muted">{label}</dt>
      <dd className="flex flex-col gap-0.5">
        {value === null ? (
          <span className="text-body text-ink-muted">{missing}</span>
        ) : (
          <span className={cn('figures text-lead font-semibold', heat ? 'text-heat' : 'text-ink')}>{value}</span>
        )}
        {children ? <span className="text-caption text-ink">{children}</span> : null}
      </dd>
    </div>
  );
}

/** A grid of figures, one column on a phone. */
export function Figures({ label, children, className }: { label: string; children: ReactNode; className?: string }) {
  return (
    <dl aria-label={label} className={cn('grid gap-2 sm:grid-cols-2', className)}>
      {children}
    </dl>
  );
}
