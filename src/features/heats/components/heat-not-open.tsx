import { ErrorPanel, type ErrorFallbackProps } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { isApiError } from '#src/lib/api-client.ts';

/**
 * The fallback of a heat's pages. Another member's heat answers exactly like
 * a missing one (404), so the words cover both without saying which.
 */
export function HeatNotOpen({ error, reset, workshopId }: ErrorFallbackProps & { workshopId: string }) {
  if (isApiError(error) && (error.status === 404 || error.status === 400)) {
    return (
      <>
        <PageHeader title="Heat not found" />
        <Notice tone="info" title="This heat is not open to you, or no longer exists">
          <p>
            Casters and students see their own heats; mentors see their students’ heats. The ones you can see are in the{' '}
            <TextLink to={paths.heats.getHref(workshopId)}>heat log</TextLink>.
          </p>
        </Notice>
      </>
    );
  }
  return <ErrorPanel error={error} reset={reset} title="The heat did not load" />;
}
