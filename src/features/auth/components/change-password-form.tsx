import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH, passwordChangeSchema, type PasswordChangeInput } from '#shared/auth/auth-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PasswordField } from '#src/components/ui/password-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { formatWait } from '#src/lib/format.ts';
import { useChangePassword } from '../api/use-change-password.ts';

/**
 * Settings: a new password, with the current one typed again. The server
 * refuses commonly used passwords and names the field; that message lands
 * under "New password".
 */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<PasswordChangeInput>({
    resolver: zodResolver(passwordChangeSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    change.mutate(values, {
      onSuccess: () => form.reset(),
      onError: (error) => {
        if (isApiError(error, 'password-incorrect')) {
          form.setError('currentPassword', { type: 'server', message: error.message }, { shouldFocus: true });
          return;
        }
        if (isApiError(error, 'rate-limited')) {
          const wait = error.retryAfterSeconds ? formatWait(error.retryAfterSeconds) : 'a few minutes';
          setProblem(`Too many wrong tries. Wait ${wait}, then try again.`);
          return;
        }
        setProblem(applyServerErrors(error, form.setError, ['currentPassword', 'newPassword']));
      },
    });
  });

  return (
    <Card title="Change password" description="Every other device signed in to your account is signed out; this one stays signed in.">
      <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-4">
        {change.isSuccess ? (
          <Notice tone="sound" role="status" title="Password changed">
            <p>Use the new password from now on. Your other devices have been signed out.</p>
          </Notice>
        ) : null}
        {problem ? (
          <Notice tone="danger" role="alert" title="Password not changed">
            {problem}
          </Notice>
        ) : null}
        <PasswordField label="Current password" autoComplete="current-password" error={errors.currentPassword?.message} {...form.register('currentPassword')} />
        <PasswordField
          label="New password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters, and not one of the commonly used passwords. A few unrelated words work well.`}
          error={errors.newPassword?.message}
          {...form.register('newPassword')}
        />
        <Button type="submit" className="self-start" pending={change.isPending} pendingLabel="Saving…">
          Change password
        </Button>
      </form>
    </Card>
  );
}
