import { OctagonAlert, TriangleAlert } from 'lucide-react';
import { useId, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { cn } from '#src/lib/cn.ts';

type CautionProps = {
  /** A short heading: what can hurt, in a few words. */
  heading: string;
  /** One or two sentences: what to do. */
  children: ReactNode;
  /** "danger" for a risk of serious injury; "caution" for the rest. */
  level?: 'caution' | 'danger';
  /** Section of the safety page to link to, or false on the safety page itself. */
  safetySection?: string | false;
  className?: string;
};

/**
 * The one caution used wherever the work can hurt someone: an icon, a word
 * for the level, a short heading, a sentence or two and a link to the safety
 * page. Calm, never hidden, never colour alone.
 */
export function Caution({ heading, children, level = 'caution', safetySection, className }: CautionProps) {
  const headingId = useId();
  const Icon = level === 'danger' ? OctagonAlert : TriangleAlert;
  const word = level === 'danger' ? 'Danger' : 'Caution';
  return (
    <div
      role="note"
      aria-labelledby={headingId}
      className={cn(
        'flex gap-3 rounded-md border-l-4 p-4',
        level === 'danger' ? 'border-danger-line bg-danger-bg' : 'border-caution-line bg-caution-bg',
        className,
      )}
    >
      <Icon aria-hidden className={cn('mt-0.5 size-6 shrink-0', level === 'danger' ? 'text-danger' : 'text-caution')} />
      <div className="flex flex-col gap-1">
        <p id={headingId} className="text-body font-semibold text-ink">
          <span className={cn('mr-2 text-caption font-bold tracking-wide uppercase', level === 'danger' ? 'text-danger' : 'text-caution')}>
            {word}
          </span>
          {heading}
        </p>
        <div className="text-body text-ink">{children}</div>
        {safetySection === false ? null : (
          <Link
            to={paths.safety.getHref(safetySection)}
            className="mt-1 inline-flex min-h-12 items-center self-start font-medium text-link underline lg:min-h-0"
          >
            Read more on the safety page
          </Link>
        )}
      </div>
    </div>
  );
}
