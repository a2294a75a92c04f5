import { isRouteErrorResponse, Link, useRevalidator, useRouteError } from 'react-router-dom';
import { RotateCcw } from 'lucide-react';
import { paths } from '#src/config/paths.ts';
import { Button, buttonClasses } from '#src/components/ui/button.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { isMfaRequired, MfaRequiredNotice } from '#src/components/ui/mfa-required-notice.tsx';
import { Notice } from '#src/components/ui/notice.tsx';

/** A route's errorElement: a 404 says so plainly; anything else offers to try again. */
export function RouteError() {
  const error = useRouteError();
  const revalidator = useRevalidator();

  if (isRouteErrorResponse(error) && error.status === 404) {
    return (
      <div className="mx-auto max-w-prose p-6">
        <Notice tone="info" title={typeof error.data === 'string' && error.data ? error.data : 'This page does not exist'}>
          <p>The link may be old, or the page belongs to a workshop you are not a member of.</p>
          <Link to={paths.home.getHref()} className={buttonClasses('secondary', 'md', 'mt-3')}>
            Go to your workshop
          </Link>
        </Notice>
      </div>
    );
  }

  if (isMfaRequired(error)) {
    return (
      <div className="mx-auto max-w-prose p-6">
        <MfaRequiredNotice />
      </div>
    );
  }

  return (
    <div className="mx-auto max-w-prose p-6">
      <Notice tone="danger" title="This page did not load" role="alert">
        <p>{errorMessage(error)}</p>
        <div className="mt-3 flex flex-wrap gap-3">
          <Button icon={<RotateCcw aria-hidden className="size-4" />} pending={revalidator.state === 'loading'} pendingLabel="Trying again…" onClick={() => void revalidator.revalidate()}>
            Try again
          </Button>
          <Link to={paths.home.getHref()} className={buttonClasses('quiet')}>
            Go to the start page
          </Link>
        </div>
      </Notice>
    </div>
  );
}
