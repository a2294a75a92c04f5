import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { useCurrentUser } from '../hooks/use-current-user.ts';
import { TwoStepPanel } from './two-step-panel.tsx';

const SECRET = 'JBSWY3DPEHPK3PXPJBSWY3DPEHPK3PXQ';
const CODES = Array.from({ length: 10 }, (_, i) => `k7m2-9xqa-4bcd-efgh-jkmn-pq${String(i).padStart(2, '0')}`);

/** The panel as the settings page renders it: with the session's current user. */
function Panel() {
  const user = useCurrentUser();
  return user ? <TwoStepPanel user={user} /> : null;
}

function setup(routes: Parameters<typeof stubApi>[0], user: CurrentUser = buildUser()) {
  const api = stubApi(routes);
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(user, 'csrf-settings'));
  return { api, ...renderWithProviders(<Panel />, { queryClient }) };
}

describe('TwoStepPanel', () => {
  test('when set up, then it asks for the password, shows the QR code and the key in groups, and after the code shows the recovery codes once', async () => {
    // Arrange
    let enableTries = 0;
    const { user, api, queryClient } = setup({
      'POST /api/auth/mfa/setup': ({ body }) =>
        (body as { password: string }).password === 'my long passphrase'
          ? json({ secret: SECRET, otpauthUri: `otpauth://totp/Pourscope:ada?secret=${SECRET}`, qrDataUrl: 'data:image/svg+xml;base64,PHN2Zy8+' })
          : apiError(400, 'password-incorrect', 'That is not your current password'),
      'POST /api/auth/mfa/enable': () =>
        ++enableTries === 1 ? apiError(400, 'code-invalid', 'That code is not right.') : json({ recoveryCodes: CODES }),
    });

    // Act: the password, wrong then right.
    await user.click(screen.getByRole('button', { name: 'Set up two-step sign-in' }));
    await user.type(screen.getByLabelText('Your password'), 'wrong one');
    await user.click(screen.getByRole('button', { name: 'Continue' }));
    expect(await screen.findByText('That is not your current password')).toBeInTheDocument();
    await user.clear(screen.getByLabelText('Your password'));
    await user.type(screen.getByLabelText('Your password'), 'my long passphrase');
    await user.click(screen.getByRole('button', { name: 'Continue' }));

    // Assert: QR code and the key for typing in.
    const qr = await screen.findByRole('img', { name: 'QR code to scan with your authenticator app' });
    expect(qr).toHaveAttribute('src', 'data:image/svg+xml;base64,PHN2Zy8+');
    expect(screen.getByLabelText('Key for typing in by hand')).toHaveTextContent('JBSW Y3DP EHPK 3PXP JBSW Y3DP EHPK 3PXQ');
    const codeField = screen.getByLabelText('6-digit code from the app');
    expect(codeField).toHaveAttribute('inputmode', 'numeric');
    expect(codeField).toHaveAttribute('autocomplete', 'one-time-code');

    // Act: the code, wrong then right.
    await user.type(codeField, '000000');
    await user.click(screen.getByRole('button', { name: 'Turn on two-step sign-in' }));
    expect(await screen.findByText('That code is not right.')).toBeInTheDocument();
    await user.clear(screen.getByLabelText('6-digit code from the app'));
    await user.type(screen.getByLabelText('6-digit code from the app'), '123 456');
    await user.click(screen.getByRole('button', { name: 'Turn on two-step sign-in' }));

    // Assert: the codes, once, with a clear warning and ways to keep them.
    const list = await screen.findByRole('list', { name: 'Recovery codes' });
    expect(within(list).getAllByRole('listitem').map((li) => li.textContent)).toEqual(CODES);
    expect(screen.getByText('Store these recovery codes somewhere safe now')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Download as a text file' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Copy the codes' }));
    expect(await screen.findByText('Copied. Paste them somewhere safe.')).toBeInTheDocument();
    expect(await navigator.clipboard.readText()).toBe(CODES.join('\n'));
    expect(api.to('POST', '/api/auth/mfa/enable').map((r) => r.body)).toEqual([{ code: '000000' }, { code: '123456' }]);
    expect(api.to('POST', '/api/auth/mfa/enable')[0]?.headers.get('x-csrf-token')).toBe('csrf-settings');
    expect(queryClient.getQueryData(sessionQueries.me().queryKey)?.user?.mfaEnabled).toBe(true);

    await user.click(screen.getByRole('button', { name: 'I have stored them' }));
    expect(screen.queryByRole('list', { name: 'Recovery codes' })).not.toBeInTheDocument();
    expect(screen.getByText('Two-step sign-in is on.')).toBeInTheDocument();
  });

  test('when it is on and turned off, then the password and a code are sent as typed and the panel says it is off', async () => {
    const { user, api } = setup({ 'POST /api/auth/mfa/disable': () => new Response(null, { status: 204 }) }, buildUser({ mfaEnabled: true }));

    await user.click(screen.getByRole('button', { name: 'Turn off two-step sign-in' }));
    const form = screen.getByRole('form', { name: 'Turn off two-step sign-in' });
    await user.type(within(form).getByLabelText('Your password'), 'my long passphrase');
    await user.type(within(form).getByLabelText('Code from the app, or a recovery code'), '654321');
    await user.click(within(form).getByRole('button', { name: 'Turn off two-step sign-in' }));

    expect(await screen.findByRole('button', { name: 'Set up two-step sign-in' })).toBeInTheDocument();
    expect(api.to('POST', '/api/auth/mfa/disable')[0]?.body).toEqual({ password: 'my long passphrase', code: '654321' });
  });

  test('when new recovery codes are asked for with a wrong code, then the message sits under the code field', async () => {
    const { user } = setup(
      { 'POST /api/auth/mfa/recovery-codes': () => apiError(400, 'code-invalid', 'That code is not right, or was already used.') },
      buildUser({ mfaEnabled: true }),
    );

    await user.click(screen.getByRole('button', { name: 'Make new recovery codes' }));
    await user.type(screen.getByLabelText('Your password'), 'my long passphrase');
    await user.type(screen.getByLabelText('Code from the app, or a recovery code'), '111111');
    await user.click(screen.getByRole('button', { name: 'Make new recovery codes' }));

    expect(await screen.findByText('That code is not right, or was already used.')).toBeInTheDocument();
    expect(screen.getByLabelText('Code from the app, or a recovery code')).toHaveAccessibleDescription('That code is not right, or was already used.');
  });
});
