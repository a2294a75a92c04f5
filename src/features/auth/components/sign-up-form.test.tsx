import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { SignUpForm } from './sign-up-form.tsx';

function setup() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(null, 'csrf-sign-up'));
  return renderWithProviders(<SignUpForm />, { queryClient });
}

async function fill(user: ReturnType<typeof setup>['user']) {
  await user.type(screen.getByLabelText('Your name'), 'Ada Caster');
  await user.type(screen.getByLabelText('E-mail'), 'ada@example.test');
  await user.type(screen.getByLabelText('Password'), 'crucible tongs and sand');
  await user.click(screen.getByRole('radio', { name: /°F/ }));
  await user.click(screen.getByRole('button', { name: 'Create account' }));
}

describe('SignUpForm', () => {
  test('when the server answers 202, then it asks to check the e-mail without saying whether the address is taken', async () => {
    const api = stubApi({ 'POST /api/auth/sign-up': () => json({ status: 'check-email' }, { status: 202 }) });
    const { user } = setup();

    await fill(user);

    expect(await screen.findByText('Check your e-mail')).toBeInTheDocument();
    expect(api.to('POST', '/api/auth/sign-up')[0]?.body).toEqual({
      displayName: 'Ada Caster',
      email: 'ada@example.test',
      password: 'crucible tongs and sand',
      temperatureUnit: 'F',
      massUnit: 'g',
    });
  });

  test('when the server answers 201, then the new session and its CSRF token are kept', async () => {
    const signedIn = buildSession(buildUser({ temperatureUnit: 'F' }), 'csrf-new-account');
    stubApi({ 'POST /api/auth/sign-up': () => json(signedIn, { status: 201 }) });
    const { user, queryClient } = setup();

    await fill(user);

    await expect.poll(() => queryClient.getQueryData(sessionQueries.me().queryKey)).toEqual(signedIn);
  });
});
