import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { passwordResetRequestSchema, type PasswordResetRequest } from '#shared/auth/auth-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { useRequestPasswordReset } from '../api/use-request-password-reset.ts';

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export function PasswordResetRequestForm() {
  const requestReset = useRequestPasswordReset();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<PasswordResetRequest>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });

  if (requestReset.isSuccess) {
    return (
      <Notice tone="info" role="status" title="Check your e-mail">
        <p>
          If an account uses {requestReset.variables.email}, we have sent it a link to choose a new password. The link works once. If nothing
          arrives in a few minutes, look in the spam folder.
        </p>
      </Notice>
    );
  }

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    requestReset.mutate(values, { onError: (error) => setProblem(applyServerErrors(error, form.setError, ['email'])) });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {problem ? (
        <Notice tone="danger" role="alert" title="Link not sent">
          {problem}
        </Notice>
      ) : null}
      <TextField
        label="E-mail"
        type="email"
        inputMode="email"
        autoComplete="email"
        autoCapitalize="none"
        spellCheck={false}
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <Button type="submit" variant="primary" pending={requestReset.isPending} pendingLabel="Sending…">
        Send the reset link
      </Button>
    </form>
  );
}
