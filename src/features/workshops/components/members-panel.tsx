import { Card } from '#src/components/ui/card.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { InvitationList } from './invitation-list.tsx';
import { InviteForm } from './invite-form.tsx';
import { MemberTable } from './member-table.tsx';

/** Everything an admin does with people: the member table, an invitation, the invitations sent. */
export function MembersPanel({ workshopId, currentUserId }: { workshopId: string; currentUserId: string }) {
  return (
    <div className="flex flex-col gap-6">
      <Card title="Members" description="Roles decide what each member can do here. A student's mentors review the student's defect reports.">
        <QueryBoundary loading={<SkeletonGroup label="Loading members" lines={5} />}>
          <MemberTable workshopId={workshopId} currentUserId={currentUserId} />
        </QueryBoundary>
      </Card>
      <Card title="Invite someone">
        <InviteForm workshopId={workshopId} />
      </Card>
      <Card title="Invitations">
        <QueryBoundary loading={<SkeletonGroup label="Loading invitations" lines={3} />}>
          <InvitationList workshopId={workshopId} />
        </QueryBoundary>
      </Card>
    </div>
  );
}
