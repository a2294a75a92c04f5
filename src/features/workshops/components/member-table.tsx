import { useSuspenseQuery } from '@tanstack/react-query';
import { Trash2 } from 'lucide-react';
import { useState } from 'react';
import { toast } from 'sonner';
import { ROLE_LABELS, ROLES, type Role } from '#shared/auth/roles.ts';
import type { Member } from '#shared/workshops/workshop-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { formatDate } from '#src/lib/format.ts';
import { memberQueries } from '../api/workshop-queries.ts';
import { useRemoveMember } from '../api/use-remove-member.ts';
import { useUpdateMember } from '../api/use-update-member.ts';
import { MentorPicker } from './mentor-picker.tsx';

/** The workshop's members, with role, mentors for students, and removal. For admins. */
export function MemberTable({ workshopId, currentUserId }: { workshopId: string; currentUserId: string }) {
  const { data: members } = useSuspenseQuery(memberQueries.list(workshopId));
  const updateMember = useUpdateMember(workshopId);
  const removeMember = useRemoveMember(workshopId);
  const [confirmingId, setConfirmingId] = useState<string | null>(null);
  const mentors = members.filter((m) => m.role === 'mentor');

  const changeRole = (member: Member, role: Role) =>
    updateMember.mutate(
      { userId: member.userId, role },
      {
        onSuccess: () => toast.success(`${member.displayName} is now ${role === 'admin' ? 'an' : 'a'} ${ROLE_LABELS[role].toLowerCase()}.`),
        onError: (error) => toast.error(`Role not changed: ${errorMessage(error)}`),
      },
    );

  const changeMentors = (member: Member, mentorIds: string[]) =>
    updateMember.mutate(
      { userId: member.userId, mentorIds },
      { onError: (error) => toast.error(`Mentors not changed: ${errorMessage(error)}`) },
    );

  const remove = (member: Member) =>
    removeMember.mutate(member.userId, {
      onSuccess: () => {
        setConfirmingId(null);
        toast.success(`${member.displayName} has left the workshop.`);
      },
      onError: (error) => toast.error(`Not removed: ${errorMessage(error)}`),
    });

  if (members.length === 0) return <p className="text-body text-ink-muted">No members yet.</p>;

  return (
    <div className="-mx-4 overflow-x-auto px-4 lg:mx-0 lg:px-0">
      <table className="w-full min-w-[44rem] border-collapse text-left text-body">
        <caption className="sr-only">Members of this workshop</caption>
        <thead>
          <tr className="border-b border-line text-caption text-ink-muted">
            <th scope="col" className="py-2 pr-4 font-medium">Member</th>
            <th scope="col" className="w-40 py-2 pr-4 font-medium">Role</th>
            <th scope="col" className="w-64 py-2 pr-4 font-medium">Mentors</th>
            <th scope="col" className="py-2 pr-4 font-medium">Joined</th>
            <th scope="col" className="py-2 font-medium"><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {members.map((member) => {
            const isYou = member.userId === currentUserId;
            return (
              <tr key={member.userId} className="border-b border-line align-top">
                <td className="py-3 pr-4">
                  <div className="font-medium text-ink">
                    {member.displayName}
                    {isYou ? <span className="ml-2 text-caption text-ink-muted">(you)</span> : null}
                  </div>
                  <div className="text-caption break-all text-ink-muted">{member.email}</div>
                </td>
                <td className="py-3 pr-4">
                  {isYou ? (
                    <div className="flex flex-col gap-1">
                      <span className="font-medium">{ROLE_LABELS[member.role]}</span>
                      <span className="text-caption text-ink-muted">Another admin can change your role.</span>
                    </div>
                  ) : (
                    <SelectField
                      label={`Role of ${member.displayName}`}
                      hideLabel
                      value={member.role}
                      onChange={(event) => changeRole(member, event.target.value as Role)}
                    >
                      {ROLES.map((role) => (
                        <option key={role} value={role}>
                          {ROLE_LABELS[role]}
                        </option>
                      ))}
                    </SelectField>
                  )}
                </td>
                <td className="py-3 pr-4">
                  {member.role === 'student' ? (
                    <MentorPicker student={member} mentors={mentors} onChange={(ids) => changeMentors(member, ids)} />
                  ) : (
                    <span className="text-caption text-ink-muted">Only students have mentors</span>
                  )}
                </td>
                <td className="tabular py-3 pr-4 text-caption whitespace-nowrap text-ink-muted">{formatDate(member.joinedAt)}</td>
                <td className="py-3 text-right">
                  {isYou ? null : confirmingId === member.userId ? (
                    <div className="flex flex-col items-end gap-2" role="group" aria-label={`Remove ${member.displayName}?`}>
                      <span className="text-caption">Remove {member.displayName}?</span>
                      <div className="flex gap-2">
                        <Button size="sm" variant="danger" pending={removeMember.isPending} pendingLabel="Removing…" onClick={() => remove(member)}>
                          Yes, remove
                        </Button>
                        <Button size="sm" variant="quiet" onClick={() => setConfirmingId(null)}>
                          Keep
                        </Button>
                      </div>
                    </div>
                  ) : (
                    <Button size="sm" variant="quiet" icon={<Trash2 aria-hidden className="size-4" />} onClick={() => setConfirmingId(member.userId)}>
                      Remove<span className="sr-only"> {member.displayName}</span>
                    </Button>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
