import { useSuspenseQuery } from '@tanstack/react-query';
import { ChevronDown, Plus } from 'lucide-react';
import { useId } from 'react';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { ROLE_LABELS } from '#shared/auth/roles.ts';
import { paths, switchWorkshopPath } from '#src/config/paths.ts';
import { workshopQueries } from '../api/workshop-queries.ts';
import { rememberWorkshop } from '../lib/remembered-workshop.ts';

const NEW_WORKSHOP = '__new__';

/**
 * Which workshop you are working in. The choice lives in the URL (/w/:id/...)
 * so links and tabs keep it; the last one is remembered for the next visit.
 */
export function WorkshopSwitcher({ currentWorkshopId }: { currentWorkshopId?: string }) {
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const navigate = useNavigate();
  const location = useLocation();
  const id = useId();

  if (workshops.length === 0) {
    return (
      <Link to={paths.createWorkshop.getHref()} className="inline-flex min-h-12 items-center gap-2 rounded-md px-2 font-medium text-link underline">
        <Plus aria-hidden className="size-4" />
        Create a workshop
      </Link>
    );
  }

  return (
    <div className="flex max-w-xs items-center gap-2">
      <label htmlFor={id} className="sr-only text-caption text-ink-muted md:not-sr-only">
        Workshop
      </label>
      <select
        id={id}
        value={currentWorkshopId ?? ''}
        onChange={(event) => {
          const next = event.target.value;
          if (next === NEW_WORKSHOP) {
            void navigate(paths.createWorkshop.getHref());
            return;
          }
          rememberWorkshop(next);
          void navigate(switchWorkshopPath(location.pathname, next));
        }}
        className="min-h-12 w-full min-w-0 appearance-none truncate rounded-md border border-line-strong bg-surface-raised pr-9 pl-3 text-body font-medium text-ink lg:min-h-10"
      >
        {currentWorkshopId ? null : (
          <option value="" disabled>
            Choose a workshop
          </option>
        )}
        {workshops.map((workshop) => (
          <option key={workshop.id} value={workshop.id}>
            {workshop.name} ({ROLE_LABELS[workshop.role]})
          </option>
        ))}
        <option value={NEW_WORKSHOP}>New workshop…</option>
      </select>
      <ChevronDown aria-hidden className="pointer-events-none -ml-8 size-4 shrink-0 text-ink-muted" />
    </div>
  );
}
