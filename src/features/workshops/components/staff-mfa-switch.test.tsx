import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser, buildWorkshop } from '#src/testing/data.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { StaffMfaSwitch } from './staff-mfa-switch.tsx';

const workshop = buildWorkshop({ role: 'admin', requireMfaForStaff: false });

function setup(adminHasMfa: boolean, routes: Parameters<typeof stubApi>[0] = {}) {
  const api = stubApi({ 'GET /api/workshops': [workshop], ...routes });
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser({ mfaEnabled: adminHasMfa }), 'csrf-members'));
  return { api, ...renderWithProviders(<StaffMfaSwitch workshop={workshop} adminHasMfa={adminHasMfa} />, { queryClient }) };
}

describe('StaffMfaSwitch', () => {
  test('when the admin has no two-step sign-in, then the switch is off limits and points to the settings', () => {
    setup(false);

    expect(screen.getByRole('checkbox', { name: 'Require two-step sign-in for mentors and admins' })).toBeDisabled();
    expect(screen.getByRole('link', { name: 'set it up in Settings' })).toHaveAttribute('href', '/settings#two-step');
  });

  test('when the admin has it and turns the switch on, then the workshop is updated', async () => {
    const { user, api } = setup(true, {
      [`PATCH /api/workshops/${workshop.id}`]: () => json({ ...workshop, requireMfaForStaff: true }),
    });
    const box = screen.getByRole('checkbox', { name: 'Require two-step sign-in for mentors and admins' });

    await user.click(box);

    await expect.poll(() => api.to('PATCH', `/api/workshops/${workshop.id}`).length).toBe(1);
    expect(api.to('PATCH', `/api/workshops/${workshop.id}`)[0]?.body).toEqual({ requireMfaForStaff: true });
  });

  test('when the server refuses, then its message is shown', async () => {
    const { user } = setup(true, {
      [`PATCH /api/workshops/${workshop.id}`]: () => apiError(409, 'mfa-needed-first', 'Turn on two-step sign-in for your own account first.'),
    });

    await user.click(screen.getByRole('checkbox', { name: 'Require two-step sign-in for mentors and admins' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Turn on two-step sign-in for your own account first.');
  });
});
