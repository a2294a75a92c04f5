import { useSuspenseQuery } from '@tanstack/react-query';
import { CircleCheck, Clock, CircleSlash } from 'lucide-react';
import { ROLE_LABELS } from '#shared/auth/roles.ts';
import type { Invitation } from '#shared/workshops/workshop-schemas.ts';
import { formatDate } from '#src/lib/format.ts';
import { invitationQueries } from '../api/workshop-queries.ts';

function InvitationStatus({ invitation }: { invitation: Invitation }) {
  if (invitation.acceptedAt) {
    return (
      <span className="inline-flex items-center gap-1.5 text-sound">
        <CircleCheck aria-hidden className="size-4" />
        Accepted {formatDate(invitation.acceptedAt)}
      </span>
    );
  }
  if (Date.parse(invitation.expiresAt) < Date.now()) {
    return (
      <span className="inline-flex items-center gap-1.5 text-ink-muted">
        <CircleSlash aria-hidden className="size-4" />
        Expired {formatDate(invitation.expiresAt)}
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-1.5 text-ink">
      <Clock aria-hidden className="size-4" />
      Waiting, link works until {formatDate(invitation.expiresAt)}
    </span>
  );
}

/** Invitations sent from this workshop and what became of them. */
export function InvitationList({ workshopId }: { workshopId: string }) {
  const { data: invitations } = useSuspenseQuery(invitationQueries.list(workshopId));
  if (invitations.length === 0) {
    return <p className="text-body text-ink-muted">No invitations sent yet. Invite someone with the form above; they get an e-mail with a link to join.</p>;
  }
  return (
    <div className="-mx-4 overflow-x-auto px-4 lg:mx-0 lg:px-0">
      <table className="w-full min-w-[36rem] border-collapse text-left text-body">
        <caption className="sr-only">Invitations</caption>
        <thead>
          <tr className="border-b border-line text-caption text-ink-muted">
            <th scope="col" className="py-2 pr-4 font-medium">E-mail</th>
            <th scope="col" className="py-2 pr-4 font-medium">Role</th>
            <th scope="col" className="py-2 pr-4 font-medium">Status</th>
            <th scope="col" className="py-2 font-medium">Invited by</th>
          </tr>
        </thead>
        <tbody>
          {invitations.map((invitation) => (
            <tr key={invitation.id} className="border-b border-line">
              <td className="py-3 pr-4 break-all">{invitation.email}</td>
              <td className="py-3 pr-4">{ROLE_LABELS[invitation.role]}</td>
              <td className="py-3 pr-4 text-caption">
                <InvitationStatus invitation={invitation} />
              </td>
              <td className="py-3">{invitation.invitedBy}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
