import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { PASSWORD_MIN_LENGTH, passwordSchema, tokenSchema } from '#shared/auth/auth-schemas.ts';
import { z } from 'zod';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PasswordField } from '#src/components/ui/password-field.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { isApiError } from '#src/lib/api-client.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { useConfirmPasswordReset } from '../api/use-confirm-password-reset.ts';

const newPasswordSchema = z.object({ password: passwordSchema });
type NewPassword = z.infer<typeof newPasswordSchema>;

function LinkProblem({ title }: { title: string }) {
  return (
    <Notice tone="danger" role="alert" title={title}>
      <p>
        Reset links work once and for a limited time. <TextLink to={paths.forgotPassword.getHref()}>Ask for a new link</TextLink>.
      </p>
    </Notice>
  );
}

/** Chooses a new password with the token from the e-mailed link. */
export function PasswordResetConfirmForm({ token, onDone }: { token: string | null; onDone: () => void }) {
  const confirm = useConfirmPasswordReset();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<NewPassword>({ resolver: zodResolver(newPasswordSchema), defaultValues: { password: '' } });

  const validToken = tokenSchema.safeParse(token ?? '');
  if (!validToken.success) return <LinkProblem title="This link is not complete" />;
  if (isApiError(confirm.error, 'token-invalid')) return <LinkProblem title="This link has been used or has expired" />;

  const onSubmit = form.handleSubmit(({ password }) => {
    setProblem(null);
    confirm.mutate(
      { token: validToken.data, password },
      { onSuccess: onDone, onError: (error) => setProblem(applyServerErrors(error, form.setError, ['password'])) },
    );
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {problem ? (
        <Notice tone="danger" role="alert" title="Password not changed">
          {problem}
        </Notice>
      ) : null}
      <PasswordField
        label="New password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={form.formState.errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" variant="primary" pending={confirm.isPending} pendingLabel="Saving…">
        Save the new password
      </Button>
    </form>
  );
}
