import { zodResolver } from '@hookform/resolvers/zod';
import { ShieldCheck } from 'lucide-react';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { mfaConfirmInputSchema, mfaSetupInputSchema, totpCodeSchema, type MfaSetup } from '#shared/auth/mfa-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PasswordField } from '#src/components/ui/password-field.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { SETTINGS_SECTIONS } from '#src/config/settings-sections.ts';
import { isApiError } from '#src/lib/api-client.ts';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { formatWait } from '#src/lib/format.ts';
import { useDisableMfa } from '../api/use-disable-mfa.ts';
import { useEnableMfa } from '../api/use-enable-mfa.ts';
import { useReplaceRecoveryCodes } from '../api/use-replace-recovery-codes.ts';
import { useStartMfaSetup } from '../api/use-start-mfa-setup.ts';
import { RecoveryCodesList } from './recovery-codes-list.tsx';


/** The message for an error the forms here do not place next to a field. */
function problemOf(error: unknown, fallback: string | null): string | null {
  if (isApiError(error, 'rate-limited')) {
    const wait = error.retryAfterSeconds ? formatWait(error.retryAfterSeconds) : 'a few minutes';
    return `Too many wrong tries. Wait ${wait}, then try again.`;
  }
  return fallback;
}

/** The secret in groups of four, for typing into an app that cannot scan. */
function groupSecret(secret: string) {
  return secret.match(/.{1,4}/g)?.join(' ') ?? secret;
}

/**
 * Settings: turning two-step sign-in on (password, QR code, a code to
 * confirm, the recovery codes once), off, or making new recovery codes.
 */
export function TwoStepPanel({ user }: { user: CurrentUser }) {
  const [setup, setSetup] = useState<MfaSetup | null>(null);
  const [starting, setStarting] = useState(false);
  const [codes, setCodes] = useState<string[] | null>(null);
  const [change, setChange] = useState<'replace' | 'disable' | null>(null);

  let body;
  if (codes) {
    body = <RecoveryCodesList codes={codes} email={user.email} onDone={() => setCodes(null)} />;
  } else if (user.mfaEnabled) {
    body = (
      <div className="flex flex-col gap-4">
        <p className="flex items-center gap-2 font-semibold text-sound">
          <ShieldCheck aria-hidden className="size-5" />
          Two-step sign-in is on.
        </p>
        <p className="text-body">Signing in asks for your password and then the code from your authenticator app.</p>
        {change ? (
          <ConfirmWithCodeForm
            action={change}
            onCancel={() => setChange(null)}
            onDone={(newCodes) => {
              setChange(null);
              if (newCodes) setCodes(newCodes);
            }}
          />
        ) : (
          <div className="flex flex-wrap gap-3">
            <Button onClick={() => setChange('replace')}>Make new recovery codes</Button>
            <Button variant="danger" onClick={() => setChange('disable')}>
              Turn off two-step sign-in
            </Button>
          </div>
        )}
      </div>
    );
  } else if (setup) {
    body = <ConfirmSetup setup={setup} onEnabled={(newCodes) => { setSetup(null); setCodes(newCodes); }} onCancel={() => setSetup(null)} />;
  } else if (starting) {
    body = <StartSetupForm onStarted={(s) => { setStarting(false); setSetup(s); }} onCancel={() => setStarting(false)} />;
  } else {
    body = (
      <div className="flex flex-col gap-4">
        <p className="text-body">
          Two-step sign-in is off. With it on, a stolen or guessed password is not enough to get into your account. You need an
          authenticator app on your phone (any app that makes time-based 6-digit codes).
        </p>
        <Button variant="primary" className="self-start" onClick={() => setStarting(true)}>
          Set up two-step sign-in
        </Button>
      </div>
    );
  }

  return (
    <Card
      id={SETTINGS_SECTIONS.twoStep}
      title="Two-step sign-in"
      description="After your password, Pourscope asks for a code from your phone."
      className="scroll-mt-20"
    >
      {body}
    </Card>
  );
}

const passwordOnlySchema = mfaSetupInputSchema;

function StartSetupForm({ onStarted, onCancel }: { onStarted: (setup: MfaSetup) => void; onCancel: () => void }) {
  const start = useStartMfaSetup();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<z.infer<typeof passwordOnlySchema>>({ resolver: zodResolver(passwordOnlySchema), defaultValues: { password: '' } });

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    start.mutate(values, {
      onSuccess: onStarted,
      onError: (error) => {
        if (isApiError(error, 'password-incorrect')) {
          form.setError('password', { type: 'server', message: error.message }, { shouldFocus: true });
          return;
        }
        setProblem(problemOf(error, applyServerErrors(error, form.setError, ['password'])));
      },
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-4">
      <p className="text-body">First type your password again, so nobody else can do this from a computer you left signed in.</p>
      {problem ? (
        <Notice tone="danger" role="alert" title="Setup not started">
          {problem}
        </Notice>
      ) : null}
      <PasswordField label="Your password" autoComplete="current-password" error={form.formState.errors.password?.message} {...form.register('password')} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" pending={start.isPending} pendingLabel="Checking…">
          Continue
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

const enableFormSchema = z.object({ code: totpCodeSchema });

function ConfirmSetup({ setup, onEnabled, onCancel }: { setup: MfaSetup; onEnabled: (codes: string[]) => void; onCancel: () => void }) {
  const enable = useEnableMfa();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<{ code: string }, unknown, { code: string }>({ resolver: zodResolver(enableFormSchema), defaultValues: { code: '' } });

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    enable.mutate(values, {
      onSuccess: onEnabled,
      onError: (error) => {
        if (isApiError(error, 'code-invalid')) {
          form.setError('code', { type: 'server', message: error.message }, { shouldFocus: true });
          return;
        }
        setProblem(applyServerErrors(error, form.setError, ['code']));
      },
    });
  });

  return (
    <div className="flex flex-col gap-5">
      <ol className="flex list-decimal flex-col gap-2 pl-5 text-body">
        <li>Open the authenticator app on your phone and choose to add an account.</li>
        <li>Scan this QR code with it, or type the key below.</li>
        <li>Type the 6-digit code the app then shows for Pourscope.</li>
      </ol>
      <div className="flex flex-wrap items-start gap-5">
        {/* A white frame: a QR code needs light around it to scan, in the dark theme too. */}
        <img src={setup.qrDataUrl} alt="QR code to scan with your authenticator app" width={192} height={192} className="rounded-md bg-white p-2" />
        <div className="flex flex-col gap-1">
          <p className="text-caption text-ink-muted">Key for typing in by hand</p>
          <code aria-label="Key for typing in by hand" className="figures font-mono text-lead break-all text-ink">
            {groupSecret(setup.secret)}
          </code>
          <p className="text-caption text-ink-muted">Time-based, 6 digits, every 30 seconds.</p>
        </div>
      </div>
      {problem ? (
        <Notice tone="danger" role="alert" title="Not turned on">
          {problem}
        </Notice>
      ) : null}
      <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-4">
        <TextField
          label="6-digit code from the app"
          inputMode="numeric"
          autoComplete="one-time-code"
          pattern="[0-9 ]*"
          spellCheck={false}
          error={form.formState.errors.code?.message}
          {...form.register('code')}
        />
        <div className="flex flex-wrap gap-3">
          <Button type="submit" variant="primary" pending={enable.isPending} pendingLabel="Checking…">
            Turn on two-step sign-in
          </Button>
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </form>
    </div>
  );
}

type ConfirmValues = { password: string; code: string };

/** Password and a current code (or a recovery code), for turning off or for new recovery codes. */
function ConfirmWithCodeForm({
  action,
  onCancel,
  onDone,
}: {
  action: 'replace' | 'disable';
  onCancel: () => void;
  onDone: (codes: string[] | null) => void;
}) {
  const disable = useDisableMfa();
  const replace = useReplaceRecoveryCodes();
  const [problem, setProblem] = useState<string | null>(null);
  // raw: the form keeps what was typed; the server tells a code from a recovery code.
  const form = useForm<ConfirmValues>({
    resolver: zodResolver(mfaConfirmInputSchema, undefined, { raw: true }),
    defaultValues: { password: '', code: '' },
  });
  const pending = disable.isPending || replace.isPending;

  const onError = (error: unknown) => {
    if (isApiError(error, 'password-incorrect')) {
      form.setError('password', { type: 'server', message: error.message }, { shouldFocus: true });
      return;
    }
    if (isApiError(error, 'code-invalid')) {
      form.setError('code', { type: 'server', message: error.message }, { shouldFocus: true });
      return;
    }
    setProblem(problemOf(error, applyServerErrors(error, form.setError, ['password', 'code'])));
  };

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    if (action === 'disable') disable.mutate(values, { onSuccess: () => onDone(null), onError });
    else replace.mutate(values, { onSuccess: (codes) => onDone(codes), onError });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-md flex-col gap-4" aria-label={action === 'disable' ? 'Turn off two-step sign-in' : 'Make new recovery codes'}>
      <p className="text-body">
        {action === 'disable'
          ? 'Turning it off signs out your other devices. Your password alone will then open your account.'
          : 'New codes replace all the old ones, used or not.'}
      </p>
      {problem ? (
        <Notice tone="danger" role="alert" title="Nothing changed">
          {problem}
        </Notice>
      ) : null}
      <PasswordField label="Your password" autoComplete="current-password" error={form.formState.errors.password?.message} {...form.register('password')} />
      <TextField
        label="Code from the app, or a recovery code"
        autoComplete="one-time-code"
        autoCapitalize="none"
        spellCheck={false}
        error={form.formState.errors.code?.message}
        {...form.register('code')}
      />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant={action === 'disable' ? 'danger' : 'primary'} pending={pending} pendingLabel="Checking…">
          {action === 'disable' ? 'Turn off two-step sign-in' : 'Make new recovery codes'}
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
