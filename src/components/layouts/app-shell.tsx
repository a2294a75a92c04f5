import { Ellipsis, X, type LucideIcon } from 'lucide-react';
import { useId, useState, type ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { cn } from '#src/lib/cn.ts';

export type NavItem = {
  id: string;
  label: string;
  href: string;
  icon: LucideIcon;
  /** "primary" items sit in the phone's bottom bar; "more" items in the More sheet. */
  placement: 'primary' | 'more';
};

type AppShellProps = {
  /** In display order: the rail shows them all, the phone splits them by placement. */
  navItems: readonly NavItem[];
  /** Left of the top bar, after the name: the workshop switcher. */
  topBarStart?: ReactNode;
  /** Right of the top bar: the user menu. */
  topBarEnd?: ReactNode;
  children: ReactNode;
};

const railLink = ({ isActive }: { isActive: boolean }) =>
  cn(
    'flex min-h-10 items-center gap-3 rounded-md px-3 text-body font-medium no-underline',
    isActive ? 'bg-surface-sunken font-semibold text-ink shadow-[inset_3px_0_0_var(--ps-ink)]' : 'text-ink-muted hover:bg-surface-sunken hover:text-ink',
  );

const barLink = ({ isActive }: { isActive: boolean }) =>
  cn(
    'flex min-h-16 flex-1 flex-col items-center justify-center gap-1 border-t-4 px-1 text-caption no-underline',
    // The current place gets a bar and bold type as well as the darker ink.
    isActive ? 'border-ink font-semibold text-ink' : 'border-transparent font-medium text-ink-muted',
  );

/**
 * The frame every signed-in page sits in. Phone: top bar and a bottom bar with
 * the four places casters go most, the rest in a More sheet. Desktop: the
 * same places in a left rail, in the same order.
 */
export function AppShell({ navItems, topBarStart, topBarEnd, children }: AppShellProps) {
  const [moreOpen, setMoreOpen] = useState(false);
  const primary = navItems.filter((item) => item.placement === 'primary');
  const more = navItems.filter((item) => item.placement === 'more');

  return (
    <div className="min-h-dvh bg-surface text-ink">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-surface-raised focus:p-3"
      >
        Skip to content
      </a>

      <header className="sticky top-0 z-30 border-b border-line bg-surface-raised">
        <div className="flex min-h-14 items-center gap-3 px-3 lg:px-5">
          <Link to={paths.home.getHref()} className="flex min-h-12 items-center gap-2 font-semibold text-ink no-underline">
            <BrandMark />
            <span className="hidden text-lead sm:inline">Pourscope</span>
            <span className="sr-only sm:hidden">Pourscope</span>
          </Link>
          <div className="min-w-0 flex-1">{topBarStart}</div>
          <div className="shrink-0">{topBarEnd}</div>
        </div>
      </header>

      <div className="lg:flex">
        <nav aria-label="Main" className="hidden min-h-[calc(100dvh-3.5rem)] w-60 shrink-0 border-r border-line lg:block">
          <ul className="sticky top-14 flex flex-col gap-0.5 p-3">
            {navItems.map((item) => (
              <li key={item.id}>
                <NavLink to={item.href} className={railLink}>
                  <item.icon aria-hidden className="size-5 shrink-0" />
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>

        <main id="main" tabIndex={-1} className="min-w-0 flex-1 px-4 pt-5 pb-28 outline-none lg:px-8 lg:pt-8 lg:pb-12">
          {children}
        </main>
      </div>

      <nav aria-label="Main" className="fixed inset-x-0 bottom-0 z-30 border-t border-line bg-surface-raised pb-[env(safe-area-inset-bottom)] lg:hidden">
        <ul className="flex">
          {primary.map((item) => (
            <li key={item.id} className="flex flex-1">
              <NavLink to={item.href} className={barLink}>
                <item.icon aria-hidden className="size-6" />
                {item.label}
              </NavLink>
            </li>
          ))}
          {more.length > 0 ? (
            <li className="flex flex-1">
              <button
                type="button"
                className={barLink({ isActive: moreOpen })}
                aria-haspopup="dialog"
                aria-expanded={moreOpen}
                onClick={() => setMoreOpen(true)}
              >
                <Ellipsis aria-hidden className="size-6" />
                More
              </button>
            </li>
          ) : null}
        </ul>
      </nav>

      {moreOpen ? <MoreSheet items={more} onClose={() => setMoreOpen(false)} /> : null}
    </div>
  );
}

function MoreSheet({ items, onClose }: { items: readonly NavItem[]; onClose: () => void }) {
  const titleId = useId();
  return (
    <dialog
      // Mounted only while open; opening as a modal gives focus trapping, Escape and the backdrop.
      ref={(dialog) => {
        if (dialog && !dialog.open) {
          if (typeof dialog.showModal === 'function') dialog.showModal();
          else dialog.setAttribute('open', '');
        }
      }}
      aria-labelledby={titleId}
      onClose={onClose}
      onClick={(event) => {
        // A tap on the backdrop lands on the dialog element itself.
        if (event.target === event.currentTarget) onClose();
      }}
      className="fixed inset-x-0 top-auto bottom-0 m-0 w-full max-w-none rounded-t-lg border-t border-line bg-surface-raised p-0 text-ink lg:hidden"
    >
      <div className="flex items-center justify-between border-b border-line px-4 py-2">
        <h2 id={titleId} className="text-title font-semibold">
          More
        </h2>
        <button type="button" onClick={onClose} className="flex min-h-12 min-w-12 items-center justify-center gap-2 rounded-md px-3">
          <X aria-hidden className="size-5" />
          Close
        </button>
      </div>
      <ul className="flex flex-col p-2 pb-[calc(env(safe-area-inset-bottom)+0.5rem)]">
        {items.map((item) => (
          <li key={item.id}>
            <NavLink
              to={item.href}
              onClick={onClose}
              className={({ isActive }) =>
                cn('flex min-h-14 items-center gap-4 rounded-md px-3 text-lead font-medium no-underline', isActive ? 'bg-surface-sunken text-ink' : 'text-ink')
              }
            >
              <item.icon aria-hidden className="size-6 text-ink-muted" />
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </dialog>
  );
}

/** A crucible pouring: our mark. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg aria-hidden viewBox="0 0 32 32" className={cn('size-8', className)}>
      <rect width="32" height="32" rx="6" className="fill-ink" />
      <path d="M9 7h11l-2 6h-7z" className="fill-ember-400" />
      <path d="M14.5 13c0 4-3 6-3 9a4.5 4.5 0 0 0 9 0c0-3-3-5-3-9z" className="fill-ember-300" />
      <rect x="7" y="25" width="18" height="2" rx="1" className="fill-sand-300" />
    </svg>
  );
}
