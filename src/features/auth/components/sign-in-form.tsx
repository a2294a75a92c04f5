import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { signInInputSchema, type SignInInput } from '#shared/auth/auth-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PasswordField } from '#src/components/ui/password-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { formatWait } from '#src/lib/format.ts';
import { useSignIn } from '../api/use-sign-in.ts';
import { MfaCodeStep } from './mfa-code-step.tsx';

function signInProblem(error: unknown, fallback: string | null): string | null {
  if (isApiError(error, 'invalid-credentials')) {
    return 'That e-mail and password do not match an account. Check both and try again.';
  }
  if (isApiError(error, 'rate-limited')) {
    const wait = error.retryAfterSeconds ? formatWait(error.retryAfterSeconds) : 'a few minutes';
    return `Too many sign-in attempts. Wait ${wait}, then try again.`;
  }
  return fallback;
}

/**
 * E-mail and password, then (for an account with two-step sign-in) the code.
 * On success the session query holds the user; the page moves on.
 */
export function SignInForm({ defaultEmail = '' }: { defaultEmail?: string }) {
  const signIn = useSignIn();
  const [problem, setProblem] = useState<string | null>(null);
  const [codeStep, setCodeStep] = useState(false);
  const form = useForm<SignInInput>({
    resolver: zodResolver(signInInputSchema),
    defaultValues: { email: defaultEmail, password: '' },
  });
  const { errors } = form.formState;

  if (codeStep) {
    return (
      <MfaCodeStep
        onRestart={() => {
          form.setValue('password', '');
          setCodeStep(false);
        }}
      />
    );
  }

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    signIn.mutate(values, {
      onSuccess: (outcome) => setCodeStep(outcome.kind === 'mfa-required'),
      onError: (error) => setProblem(signInProblem(error, applyServerErrors(error, form.setError, ['email', 'password']))),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {problem ? (
        <Notice tone="danger" role="alert" title="Not signed in">
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
        error={errors.email?.message}
        {...form.register('email')}
      />
      <PasswordField label="Password" autoComplete="current-password" error={errors.password?.message} {...form.register('password')} />
      <Button type="submit" variant="primary" pending={signIn.isPending} pendingLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
