import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { SignInForm } from './sign-in-form.tsx';

function setup() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(null, 'token-before-sign-in'));
  return renderWithProviders(<SignInForm />, { queryClient });
}

async function fillAndSubmit(user: ReturnType<typeof setup>['user'], email = 'ada@example.test', password = 'long enough secret') {
  await user.type(screen.getByLabelText('E-mail'), email);
  if (password) await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  test('when the e-mail is malformed and the password empty, then it shows the shared schema’s messages next to the fields and sends nothing', async () => {
    const api = stubApi({});
    const { user } = setup();

    await fillAndSubmit(user, 'not-an-address', '');

    const email = screen.getByLabelText('E-mail');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('Enter a valid e-mail address');
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription('Enter your password');
    expect(api.requests).toHaveLength(0);
  });

  test('when it signs in, then the request carries the session’s CSRF token and the new session’s token is kept', async () => {
    const signedIn = buildSession(buildUser(), 'token-after-sign-in');
    const api = stubApi({ 'POST /api/auth/sign-in': () => json(signedIn) });
    const { user, queryClient } = setup();

    await fillAndSubmit(user, '  Ada@Example.TEST ');

    await expect.poll(() => queryClient.getQueryData(sessionQueries.me().queryKey)?.csrfToken).toBe('token-after-sign-in');
    const [request] = api.to('POST', '/api/auth/sign-in');
    expect(request?.headers.get('x-csrf-token')).toBe('token-before-sign-in');
    expect(request?.body).toEqual({ email: 'ada@example.test', password: 'long enough secret' });
  });

  test('when the server answers 429 with Retry-After, then it says how long to wait', async () => {
    stubApi({
      'POST /api/auth/sign-in': () => apiError(429, 'rate-limited', 'Too many attempts', {}, { 'retry-after': '120' }),
    });
    const { user } = setup();

    await fillAndSubmit(user);

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many sign-in attempts. Wait 2 minutes, then try again.');
  });

  test('when the credentials are wrong, then it says so without naming which one', async () => {
    stubApi({ 'POST /api/auth/sign-in': () => apiError(401, 'invalid-credentials', 'Wrong e-mail or password') });
    const { user } = setup();

    await fillAndSubmit(user);

    expect(await screen.findByRole('alert')).toHaveTextContent('That e-mail and password do not match an account.');
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeEnabled();
  });

  test('when the server rejects a field, then its message sits next to that field', async () => {
    stubApi({
      'POST /api/auth/sign-in': () =>
        apiError(400, 'validation-failed', 'Check the form', { issues: [{ path: 'email', message: 'This address cannot sign in here' }] }),
    });
    const { user } = setup();

    await fillAndSubmit(user);

    expect(await screen.findByText('This address cannot sign in here')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription('This address cannot sign in here');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
