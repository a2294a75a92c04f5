import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { displayNameSchema, passwordSchema, PASSWORD_MIN_LENGTH, tokenSchema, type CurrentUser } from '#shared/auth/auth-schemas.ts';
import { ROLE_LABELS } from '#shared/auth/roles.ts';
import type { InvitationPreview } from '#shared/workshops/workshop-schemas.ts';
import { Button, ButtonLink } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PasswordField } from '#src/components/ui/password-field.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { paths } from '#src/config/paths.ts';
import { isApiError } from '#src/lib/api-client.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { invitationPreviewQueries } from '../api/invitation-queries.ts';
import { useAcceptInvitation } from '../api/use-accept-invitation.ts';

const newAccountSchema = z.object({ displayName: displayNameSchema, password: passwordSchema });
type NewAccount = z.infer<typeof newAccountSchema>;

type InvitationPanelProps = {
  token: string;
  user: CurrentUser | null;
  onJoined: (workshopId: string) => void;
};

function Gone() {
  return (
    <Notice tone="info" title="This invitation has been used or has expired">
      <p>Ask the workshop's admin to send you a new one.</p>
    </Notice>
  );
}

/** The invitation link: who invites you to what, then the one step that fits your situation. */
export function InvitationPanel({ token, user, onJoined }: InvitationPanelProps) {
  const tokenValid = tokenSchema.safeParse(token).success;
  const preview = useQuery({ ...invitationPreviewQueries.detail(token), enabled: tokenValid });

  if (!tokenValid) return <Gone />;
  if (preview.isPending) return <SkeletonGroup label="Loading the invitation" lines={4} />;
  if (preview.isError) {
    if (isApiError(preview.error, 'invitation-invalid') || isApiError(preview.error, 'not-found')) return <Gone />;
    return (
      <Notice tone="danger" role="alert" title="The invitation did not load">
        <p>{preview.error.message}</p>
        <Button className="mt-3" onClick={() => void preview.refetch()}>
          Try again
        </Button>
      </Notice>
    );
  }

  const invitation = preview.data;
  return (
    <div className="flex flex-col gap-5">
      <Card>
        <p className="text-lead">
          You are invited to join <strong>{invitation.workshopName}</strong> as {invitation.role === 'admin' ? 'an' : 'a'} <strong>{ROLE_LABELS[invitation.role].toLowerCase()}</strong>.
        </p>
        <p className="mt-2 text-body text-ink-muted">The invitation was sent to {invitation.email}.</p>
      </Card>
      {user ? (
        <JoinAsYourself token={token} user={user} invitation={invitation} onJoined={onJoined} />
      ) : invitation.accountExists ? (
        <div className="flex flex-col gap-3">
          <p>There is already an account for {invitation.email}. Sign in with it, and you come back here to join.</p>
          <ButtonLink variant="primary" to={paths.signIn.getHref(paths.invitation.getHref(token))}>
            Sign in to accept
          </ButtonLink>
        </div>
      ) : (
        <NewAccountForm token={token} onJoined={onJoined} />
      )}
    </div>
  );
}

function JoinAsYourself({ token, user, invitation, onJoined }: { token: string; user: CurrentUser; invitation: InvitationPreview; onJoined: (id: string) => void }) {
  const accept = useAcceptInvitation(token);
  const otherAccount = user.email.toLowerCase() !== invitation.email.toLowerCase();
  return (
    <div className="flex flex-col gap-4">
      <p>
        You are signed in as {user.displayName} ({user.email}).
      </p>
      {otherAccount ? (
        <Notice tone="caution" title="This invitation was sent to another address">
          <p>You can still join with the account you are signed in with, or sign out and use the invited address.</p>
        </Notice>
      ) : null}
      {accept.isError ? (
        <Notice tone="danger" role="alert" title="Not joined">
          {isApiError(accept.error, 'invitation-invalid') ? 'This invitation has been used or has expired.' : accept.error.message}
        </Notice>
      ) : null}
      <Button variant="primary" pending={accept.isPending} pendingLabel="Joining…" onClick={() => accept.mutate({}, { onSuccess: (r) => onJoined(r.workshopId) })}>
        Join {invitation.workshopName}
      </Button>
    </div>
  );
}

function NewAccountForm({ token, onJoined }: { token: string; onJoined: (id: string) => void }) {
  const accept = useAcceptInvitation(token);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<NewAccount>({ resolver: zodResolver(newAccountSchema), defaultValues: { displayName: '', password: '' } });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    accept.mutate(values, {
      onSuccess: (result) => onJoined(result.workshopId),
      onError: (error) =>
        setProblem(
          isApiError(error, 'invitation-invalid')
            ? 'This invitation has been used or has expired.'
            : applyServerErrors(error, form.setError, ['displayName', 'password']),
        ),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      <h2 className="text-title font-semibold">Create your account</h2>
      {problem ? (
        <Notice tone="danger" role="alert" title="Not joined">
          {problem}
        </Notice>
      ) : null}
      <TextField label="Your name" autoComplete="name" error={errors.displayName?.message} {...form.register('displayName')} />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" variant="primary" pending={accept.isPending} pendingLabel="Joining…">
        Create account and join
      </Button>
    </form>
  );
}
