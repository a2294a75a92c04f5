import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { PASSWORD_MIN_LENGTH, signUpInputSchema } from '#shared/auth/auth-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PasswordField } from '#src/components/ui/password-field.tsx';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { TextField } from '#src/components/ui/text-field.tsx';
import { applyServerErrors } from '#src/lib/form-errors.ts';
import { useSignUp } from '../api/use-sign-up.ts';

type SignUpValues = z.input<typeof signUpInputSchema>;
const FIELDS = ['displayName', 'email', 'password', 'temperatureUnit', 'massUnit'] as const;

/** A new account. 201 signs in (the page moves on); 202 asks the person to check their e-mail. */
export function SignUpForm() {
  const signUp = useSignUp();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<SignUpValues, unknown, z.output<typeof signUpInputSchema>>({
    resolver: zodResolver(signUpInputSchema),
    defaultValues: { displayName: '', email: '', password: '', temperatureUnit: 'C', massUnit: 'g' },
  });
  const { errors } = form.formState;

  if (signUp.data?.kind === 'check-email') {
    return (
      <Notice tone="info" role="status" title="Check your e-mail">
        <p>
          If {form.getValues('email')} can be used for a new account, we have sent a message to it. Follow the message to carry on. If
          nothing arrives in a few minutes, look in the spam folder, or sign in if you already have an account.
        </p>
      </Notice>
    );
  }

  const onSubmit = form.handleSubmit((values) => {
    setProblem(null);
    signUp.mutate(values, { onError: (error) => setProblem(applyServerErrors(error, form.setError, FIELDS)) });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
      {problem ? (
        <Notice tone="danger" role="alert" title="Account not created">
          {problem}
        </Notice>
      ) : null}
      <TextField label="Your name" autoComplete="name" hint="Shown to the members of your workshops." error={errors.displayName?.message} {...form.register('displayName')} />
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
      <PasswordField
        label="Password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong password that is easy to type with gloves off.`}
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Controller
        control={form.control}
        name="temperatureUnit"
        render={({ field }) => (
          <SegmentedControl
            legend="Temperatures in"
            mono
            name={field.name}
            value={field.value ?? 'C'}
            onChange={field.onChange}
            options={[
              { value: 'C', label: '°C', description: 'degrees Celsius' },
              { value: 'F', label: '°F', description: 'degrees Fahrenheit' },
            ]}
          />
        )}
      />
      <Controller
        control={form.control}
        name="massUnit"
        render={({ field }) => (
          <SegmentedControl
            legend="Weights in"
            mono
            name={field.name}
            value={field.value ?? 'g'}
            onChange={field.onChange}
            options={[
              { value: 'g', label: 'g', description: 'grams and kilograms' },
              { value: 'oz', label: 'oz', description: 'ounces and pounds' },
            ]}
          />
        )}
      />
      <Button type="submit" variant="primary" pending={signUp.isPending} pendingLabel="Creating your account…">
        Create account
      </Button>
    </form>
  );
}
