import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { invitationQueries, memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { MembersPanel } from '#src/features/workshops/components/members-panel.tsx';
import { StaffMfaSwitch } from '#src/features/workshops/components/staff-mfa-switch.tsx';

/** Starts both lists loading with the page; the panels show skeletons until they arrive. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const workshopId = params.workshopId ?? '';
    const user = await requireUser(queryClient, request);
    const workshops = await queryClient.ensureQueryData(workshopQueries.list());
    const workshop = workshops.find((w) => w.id === workshopId);
    if (workshop && can({ id: user.id, role: workshop.role }, 'manage', 'member')) {
      void queryClient.prefetchQuery(memberQueries.list(workshopId));
      void queryClient.prefetchQuery(invitationQueries.list(workshopId));
    }
    return null;
  };

export default function MembersPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;

  const mayManage = can({ id: user.id, role: workshop.role }, 'manage', 'member');
  return (
    <>
      <PageHeader title="Members" description={`Who works in ${workshop.name}, and what each may do.`} />
      {mayManage ? (
        <div className="flex flex-col gap-6">
          <MembersPanel workshopId={workshop.id} currentUserId={user.id} />
          <StaffMfaSwitch workshop={workshop} adminHasMfa={user.mfaEnabled} />
        </div>
      ) : (
        <Notice tone="info" title="Members are managed by the workshop's admins">
          <p>Ask an admin of {workshop.name} to change roles, assign mentors or invite someone.</p>
        </Notice>
      )}
    </>
  );
}
