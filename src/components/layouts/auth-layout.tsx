import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { BrandMark } from './app-shell.tsx';

/** The frame for signed-out pages: the name, one column, the form. */
export function AuthLayout({ title, description, children }: { title: string; description?: ReactNode; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col bg-surface text-ink">
      <header className="px-4 py-3 lg:px-8">
        <Link to={paths.home.getHref()} className="inline-flex min-h-12 items-center gap-2 text-lead font-semibold text-ink no-underline">
          <BrandMark />
          Pourscope
        </Link>
      </header>
      <main id="main" className="mx-auto flex w-full max-w-md flex-1 flex-col px-4 pt-6 pb-16">
        <h1 className="text-heading font-semibold">{title}</h1>
        {description ? <div className="mt-2 text-body text-ink-muted">{description}</div> : null}
        <div className="mt-6">{children}</div>
      </main>
    </div>
  );
}
