import { screen } from '@testing-library/react';
import { describe, expect, test, vi } from 'vitest';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser, testId } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { InvitationPanel } from './invitation-panel.tsx';

const token = 'a'.repeat(40);
const preview = { workshopName: 'Night class foundry', role: 'student', email: 'new@example.test', accountExists: false };

function setup(routes: Parameters<typeof stubApi>[0], signedIn = false) {
  const api = stubApi(routes);
  const queryClient = createTestQueryClient();
  const me = signedIn ? buildUser() : null;
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(me, 'csrf-invite'));
  const onJoined = vi.fn();
  const view = renderWithProviders(<InvitationPanel token={token} user={me} onJoined={onJoined} />, { queryClient });
  return { ...view, api, onJoined };
}

describe('InvitationPanel', () => {
  test('when the invitation was used, then it says so and asks for a new one', async () => {
    setup({ [`GET /api/invitations/${token}`]: () => apiError(404, 'invitation-invalid') });
    expect(await screen.findByText('This invitation has been used or has expired')).toBeInTheDocument();
  });

  test('when the invited address has an account and nobody is signed in, then it links to sign-in and back', async () => {
    setup({ [`GET /api/invitations/${token}`]: { ...preview, accountExists: true } });
    expect(await screen.findByRole('link', { name: 'Sign in to accept' })).toHaveAttribute(
      'href',
      `/sign-in?next=${encodeURIComponent(`/invitations/${token}`)}`,
    );
  });

  test('when someone new gives a name and password, then the account is made and they join', async () => {
    const workshopId = testId();
    const { user, api, onJoined, queryClient } = setup({
      [`GET /api/invitations/${token}`]: preview,
      [`POST /api/invitations/${token}/accept`]: () => json({ ...buildSession(buildUser(), 'csrf-joined'), workshopId }),
    });

    await user.type(await screen.findByLabelText('Your name'), 'Nia New');
    await user.type(screen.getByLabelText('Password'), 'a long passphrase');
    await user.click(screen.getByRole('button', { name: 'Create account and join' }));

    await expect.poll(() => onJoined.mock.calls.length).toBe(1);
    expect(onJoined).toHaveBeenCalledWith(workshopId);
    expect(api.to('POST', `/api/invitations/${token}/accept`)[0]?.headers.get('x-csrf-token')).toBe('csrf-invite');
    expect(queryClient.getQueryData(sessionQueries.me().queryKey)?.csrfToken).toBe('csrf-joined');
  });
});
