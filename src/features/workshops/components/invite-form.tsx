import { zodResolver } from '@hookform/resolvers/zod';
import { UserPlus } from 'lucide-react';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { ROLE_LABELS, ROLES } from '#shared/auth/roles.ts';
import { invitationCreateSchema, type InvitationCreateInput } from '#shared/workshops/workshop-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { useCreateInvitation } from '../api/use-create-invitation.ts';

const ROLE_HINTS: Record<(typeof ROLES)[number], string> = {
  student: 'logs their own heats and asks about defects; mentors review their reports',
  caster: 'logs heats, sees the workshop’s heats and looks after equipment',
  mentor: 'reads every heat and reviews defect reports',
  admin: 'runs the workshop: members, invitations and everything else',
};

/** Invites someone by e-mail with a role. */
export function InviteForm({ workshopId }: { workshopId: string }) {
  const createInvitation = useCreateInvitation(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<InvitationCreateInput>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: { email: '', role: 'student' },
  });
  const { errors } = form.formState;
  const role = form.watch('role');

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    createInvitation.mutate(values, {
      onSuccess: (invitation) => {
        toast.success(`Invitation sent to ${invitation.email}.`);
        form.reset({ email: '', role: values.role });
      },
      onError: (error) => setProblem(applyServerErrors(error, form.setError, ['email', 'role'])),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {problem ? (
        <Notice tone="danger" role="alert" title="Invitation not sent">
          {problem}
        </Notice>
      ) : null}
      <div className="grid gap-4 md:grid-cols-[1fr_14rem]">
        <TextField
          label="E-mail"
          type="email"
          inputMode="email"
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          error={errors.email?.message}
          {...form.register('email')}
        />
        <SelectField label="Role" error={errors.role?.message} {...form.register('role')}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </SelectField>
      </div>
      <p className="text-caption text-ink-muted">
        {ROLE_LABELS[role]}: {ROLE_HINTS[role]}.
      </p>
      <Button type="submit" variant="primary" className="self-start" icon={<UserPlus aria-hidden className="size-4" />} pending={createInvitation.isPending} pendingLabel="Sending…">
        Send invitation
      </Button>
    </form>
  );
}
