import { ErrorPanel, type ErrorFallbackProps } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { isApiError } from '#src/lib/api-client.ts';

/** The fallback of a furnace's or a crucible's page: gone (or a bad link), or failed to load. */
export function EquipmentNotFound({ error, reset, workshopId, what }: ErrorFallbackProps & { workshopId: string; what: 'furnace' | 'crucible' }) {
  if (isApiError(error) && (error.status === 404 || error.status === 400)) {
    return (
      <>
        <PageHeader title={`No such ${what}`} />
        <Notice tone="info" title={`This ${what} is not in the workshop`}>
          <p>
            It may have been deleted. The workshop’s equipment is listed under <TextLink to={paths.equipment.getHref(workshopId)}>Equipment</TextLink>.
          </p>
        </Notice>
      </>
    );
  }
  return <ErrorPanel error={error} reset={reset} title={`The ${what} did not load`} />;
}
