import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { SignInForm } from './sign-in-form.tsx';

function setup(routes: Parameters<typeof stubApi>[0]) {
  const api = stubApi({
    'POST /api/auth/sign-in': () => json({ mfaRequired: true, csrfToken: 'token-code-step' }),
    ...routes,
  });
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(null, 'token-before-sign-in'));
  return { api, ...renderWithProviders(<SignInForm />, { queryClient }) };
}

async function passPasswordStep(user: ReturnType<typeof setup>['user']) {
  await user.type(screen.getByLabelText('E-mail'), 'ada@example.test');
  await user.type(screen.getByLabelText('Password'), 'long enough secret');
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
  return screen.findByLabelText('6-digit code');
}

describe('SignInForm, code step', () => {
  test('when the account has two-step sign-in, then the code field asks for digits with one-time-code autofill, still signed out', async () => {
    const { user, queryClient } = setup({});

    const code = await passPasswordStep(user);

    expect(code).toHaveAttribute('inputmode', 'numeric');
    expect(code).toHaveAttribute('autocomplete', 'one-time-code');
    expect(queryClient.getQueryData(sessionQueries.me().queryKey)).toEqual({ user: null, csrfToken: 'token-code-step' });
    expect(screen.getByRole('button', { name: /Use a recovery code instead/ })).toBeInTheDocument();
  });

  test('when the code is wrong, then the message sits under the field; the right one signs in with the code step’s CSRF token', async () => {
    const signedIn = buildSession(buildUser({ mfaEnabled: true }), 'token-signed-in');
    let tries = 0;
    const { user, api, queryClient } = setup({
      'POST /api/auth/sign-in/mfa': () => (++tries === 1 ? apiError(401, 'code-invalid', 'Wrong code') : json(signedIn)),
    });
    const code = await passPasswordStep(user);

    await user.type(code, '111 111');
    await user.click(screen.getByRole('button', { name: 'Check the code and sign in' }));

    expect(await screen.findByText(/That code did not work/)).toBeInTheDocument();
    expect(screen.getByLabelText('6-digit code')).toHaveAccessibleDescription(/That code did not work/);

    await user.clear(screen.getByLabelText('6-digit code'));
    await user.type(screen.getByLabelText('6-digit code'), '246810');
    await user.click(screen.getByRole('button', { name: 'Check the code and sign in' }));

    await expect.poll(() => queryClient.getQueryData(sessionQueries.me().queryKey)?.csrfToken).toBe('token-signed-in');
    const sent = api.to('POST', '/api/auth/sign-in/mfa');
    expect(sent.map((r) => r.body)).toEqual([{ code: '111111' }, { code: '246810' }]);
    expect(sent[0]?.headers.get('x-csrf-token')).toBe('token-code-step');
  });

  test('when a code is malformed, then the form says so and sends nothing', async () => {
    const { user, api } = setup({});
    const code = await passPasswordStep(user);

    await user.type(code, '12ab');
    await user.click(screen.getByRole('button', { name: 'Check the code and sign in' }));

    expect(await screen.findByText('Enter the 6-digit code from your authenticator app')).toBeInTheDocument();
    expect(api.to('POST', '/api/auth/sign-in/mfa')).toHaveLength(0);
  });

  test('when the person uses a recovery code instead, then it is sent as recoveryCode', async () => {
    const { user, api } = setup({
      'POST /api/auth/sign-in/mfa': () => json({ ...buildSession(buildUser({ mfaEnabled: true }), 'token-signed-in'), recoveryCodesLeft: 7 }),
    });
    await passPasswordStep(user);

    await user.click(screen.getByRole('button', { name: /Use a recovery code instead/ }));
    await user.type(screen.getByLabelText('Recovery code'), 'abcd-efgh-jkmn-pqrs-tvwx-yz01');
    await user.click(screen.getByRole('button', { name: 'Use this recovery code' }));

    await expect.poll(() => api.to('POST', '/api/auth/sign-in/mfa').length).toBe(1);
    expect(api.to('POST', '/api/auth/sign-in/mfa')[0]?.body).toEqual({ recoveryCode: 'abcdefghjkmnpqrstvwxyz01' });
  });

  test('when the five minutes for the code ran out, then it says so and goes back to the password', async () => {
    const { user } = setup({ 'POST /api/auth/sign-in/mfa': () => apiError(401, 'mfa-expired', 'Sign in again') });
    const code = await passPasswordStep(user);

    await user.type(code, '246810');
    await user.click(screen.getByRole('button', { name: 'Check the code and sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The time for the code ran out');
    await user.click(screen.getByRole('button', { name: 'Sign in again' }));

    expect(screen.getByLabelText('E-mail')).toHaveValue('ada@example.test');
    expect(screen.getByLabelText('Password')).toHaveValue('');
  });
});
