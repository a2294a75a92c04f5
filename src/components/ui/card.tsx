import type { HTMLAttributes, ReactNode } from 'react';
import { cn } from '#src/lib/cn.ts';

type CardProps = HTMLAttributes<HTMLElement> & {
  /** Renders a heading and makes the card a labelled region. */
  title?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  headingLevel?: 2 | 3;
};

export function Card({ title, description, actions, headingLevel = 2, className, children, ...rest }: CardProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <section className={cn('rounded-lg border border-line bg-surface-raised p-4 lg:p-5', className)} {...rest}>
      {title || actions ? (
        <header className="mb-4 flex flex-wrap items-start justify-between gap-3">
          <div className="flex flex-col gap-1">
            {title ? <Heading className="text-title font-semibold text-ink">{title}</Heading> : null}
            {description ? <p className="text-body text-ink-muted">{description}</p> : null}
          </div>
          {actions}
        </header>
      ) : null}
      {children}
    </section>
  );
}
