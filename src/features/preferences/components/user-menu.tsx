import { ChevronDown, LogOut, Settings } from 'lucide-react';
import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { paths } from '#src/config/paths.ts';
import { cn } from '#src/lib/cn.ts';
import { ThemePicker, UnitToggles, type ChangePreferences } from './preference-controls.tsx';

type UserMenuProps = {
  user: CurrentUser;
  onChange: ChangePreferences;
  onSignOut: () => void;
  signingOut?: boolean;
};

function initials(name: string) {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]?.toUpperCase())
    .join('');
}

/**
 * Top right: units, theme, settings and sign-out. A disclosure rather than a
 * menu widget, because it holds toggles; Escape or a tap outside closes it.
 */
export function UserMenu({ user, onChange, onSignOut, signingOut }: UserMenuProps) {
  const [open, setOpen] = useState(false);
  const panelId = useId();

  return (
    <div
      className="relative"
      onKeyDown={(event) => {
        if (event.key === 'Escape' && open) {
          setOpen(false);
          event.currentTarget.querySelector<HTMLButtonElement>('button[aria-controls]')?.focus();
        }
      }}
    >
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((o) => !o)}
        className="flex min-h-12 items-center gap-2 rounded-md px-2 text-body font-medium text-ink hover:bg-surface-sunken lg:min-h-10"
      >
        <span aria-hidden className="flex size-8 items-center justify-center rounded-full bg-ink text-caption font-semibold text-surface">
          {initials(user.displayName) || '?'}
        </span>
        <span className="sr-only md:not-sr-only">{user.displayName}</span>
        <span className="sr-only">, account and units</span>
        <ChevronDown aria-hidden className={cn('size-4 text-ink-muted', open && 'rotate-180')} />
      </button>

      {open ? (
        <>
          {/* A tap outside closes the panel. */}
          <div aria-hidden className="fixed inset-0 z-40" onClick={() => setOpen(false)} />
          <div
            id={panelId}
            role="region"
            aria-label="Account and units"
            className="fixed inset-x-2 top-16 z-50 flex flex-col gap-4 rounded-lg border border-line bg-surface-raised p-4 shadow-lg sm:absolute sm:inset-x-auto sm:top-full sm:right-0 sm:mt-2 sm:w-80"
          >
            <div>
              <p className="font-semibold text-ink">{user.displayName}</p>
              <p className="text-caption break-all text-ink-muted">{user.email}</p>
            </div>
            <UnitToggles user={user} onChange={onChange} compact />
            <ThemePicker user={user} onChange={onChange} />
            <div className="flex flex-col border-t border-line pt-3">
              <Link
                to={paths.settings.getHref()}
                onClick={() => setOpen(false)}
                className="flex min-h-12 items-center gap-3 rounded-md px-2 font-medium text-ink no-underline hover:bg-surface-sunken lg:min-h-10"
              >
                <Settings aria-hidden className="size-5 text-ink-muted" />
                Settings
              </Link>
              <button
                type="button"
                onClick={onSignOut}
                disabled={signingOut}
                className="flex min-h-12 items-center gap-3 rounded-md px-2 text-left font-medium text-ink hover:bg-surface-sunken disabled:opacity-60 lg:min-h-10"
              >
                <LogOut aria-hidden className="size-5 text-ink-muted" />
                {signingOut ? 'Signing out…' : 'Sign out'}
              </button>
            </div>
          </div>
        </>
      ) : null}
    </div>
  );
}
