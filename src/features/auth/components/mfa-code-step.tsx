import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { recoveryCodeSchema, totpCodeSchema } from '#shared/auth/mfa-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { formatWait } from '#src/lib/format.ts';
import { useCompleteMfaSignIn } from '../api/use-complete-mfa-sign-in.ts';

const codeFormSchema = z.object({ code: totpCodeSchema });
const recoveryFormSchema = z.object({ code: recoveryCodeSchema });
type CodeValues = { code: string };

// Few enough that the person should make a new set soon.
const LOW_RECOVERY_CODES = 3;

type MfaCodeStepProps = {
  /** Back to e-mail and password, after the 5 minutes for the code ran out. */
  onRestart: () => void;
};

/**
 * The second step of signing in to an account with two-step sign-in: the
 * 6-digit code from the authenticator app, or one of the recovery codes.
 */
export function MfaCodeStep({ onRestart }: MfaCodeStepProps) {
  const [withRecoveryCode, setWithRecoveryCode] = useState(false);
  return withRecoveryCode ? (
    <CodeForm key="recovery" mode="recovery" onRestart={onRestart} onSwitch={() => setWithRecoveryCode(false)} />
  ) : (
    <CodeForm key="app" mode="app" onRestart={onRestart} onSwitch={() => setWithRecoveryCode(true)} />
  );
}

function CodeForm({ mode, onRestart, onSwitch }: { mode: 'app' | 'recovery'; onRestart: () => void; onSwitch: () => void }) {
  const complete = useCompleteMfaSignIn();
  const [problem, setProblem] = useState<string | null>(null);
  const [expired, setExpired] = useState(false);
  const form = useForm<CodeValues, unknown, CodeValues>({
    resolver: zodResolver(mode === 'app' ? codeFormSchema : recoveryFormSchema),
    defaultValues: { code: '' },
  });
  const fromApp = mode === 'app';

  if (expired) {
    return (
      <Notice tone="info" role="alert" title="The time for the code ran out">
        <p>For your safety the code has to follow the password within 5 minutes. Sign in again to get a new chance.</p>
        <Button className="mt-3" variant="primary" onClick={onRestart}>
          Sign in again
        </Button>
      </Notice>
    );
  }

  const onSubmit = form.handleSubmit(({ code }) => {
    setProblem(null);
    complete.mutate(fromApp ? { code } : { recoveryCode: code }, {
      onSuccess: ({ recoveryCodesLeft }) => {
        if (recoveryCodesLeft !== undefined && recoveryCodesLeft <= LOW_RECOVERY_CODES) {
          toast.warning(
            `You have ${recoveryCodesLeft} recovery code${recoveryCodesLeft === 1 ? '' : 's'} left. Make a new set in Settings.`,
          );
        }
      },
      onError: (error) => {
        if (isApiError(error, 'mfa-expired')) return setExpired(true);
        if (isApiError(error, 'code-invalid')) {
          form.setError(
            'code',
            {
              type: 'server',
              message: fromApp
                ? 'That code did not work. Codes change every 30 seconds: type the newest one.'
                : 'That recovery code did not work, or it was used before.',
            },
            { shouldFocus: true },
          );
          return;
        }
        if (isApiError(error, 'rate-limited')) {
          const wait = error.retryAfterSeconds ? formatWait(error.retryAfterSeconds) : 'a few minutes';
          return setProblem(`Too many tries. Wait ${wait}, then sign in again.`);
        }
        setProblem(applyServerErrors(error, form.setError, ['code']));
      },
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Second step of signing in">
      <p className="text-body">
        {fromApp
          ? 'Your password was right. Now open the authenticator app on your phone and type the 6-digit code it shows for Pourscope.'
          : 'Type one of the recovery codes you stored when you set up two-step sign-in. Each one works once.'}
      </p>
      {problem ? (
        <Notice tone="danger" role="alert" title="Not signed in">
          {problem}
        </Notice>
      ) : null}
      {fromApp ? (
        <TextField
          label="6-digit code"
          inputMode="numeric"
          autoComplete="one-time-code"
          pattern="[0-9 ]*"
          autoFocus
          spellCheck={false}
          error={form.formState.errors.code?.message}
          {...form.register('code')}
        />
      ) : (
        <TextField
          label="Recovery code"
          autoComplete="off"
          autoCapitalize="none"
          autoFocus
          spellCheck={false}
          hint="Hyphens and spaces do not matter."
          error={form.formState.errors.code?.message}
          {...form.register('code')}
        />
      )}
      <Button type="submit" variant="primary" pending={complete.isPending} pendingLabel="Checking…">
        {fromApp ? 'Check the code and sign in' : 'Use this recovery code'}
      </Button>
      <button type="button" onClick={onSwitch} className="inline-flex min-h-12 items-center self-start font-medium text-link underline hover:no-underline lg:min-h-0">
        {fromApp ? 'No phone to hand? Use a recovery code instead' : 'Use the code from the app instead'}
      </button>
    </form>
  );
}
