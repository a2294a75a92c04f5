import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildMember, buildSession, buildUser } from '#src/testing/data.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { createTestQueryClient, renderWithProviders } from '#src/testing/render.tsx';
import { MembersPanel } from './members-panel.tsx';

const workshopId = '00000000-0000-4000-8000-0000000000aa';
const base = `/api/workshops/${workshopId}`;

function setup(routes: Parameters<typeof stubApi>[0] = {}) {
  const admin = buildMember({ displayName: 'Ada Admin', email: 'ada@example.test', role: 'admin' });
  const mentor = buildMember({ displayName: 'Mo Mentor', email: 'mo@example.test', role: 'mentor' });
  const student = buildMember({ displayName: 'Sam Student', email: 'sam@example.test', role: 'student' });
  let members = [admin, mentor, student];
  const api = stubApi({
    [`GET ${base}/members`]: () => json(members),
    [`POST ${base}/members`]: ({ body }) => {
      const update = body as { userId: string };
      members = members.map((m) => (m.userId === update.userId ? { ...m, ...update } : m));
      return json(members.find((m) => m.userId === update.userId));
    },
    [`GET ${base}/invitations`]: [],
    ...routes,
  });
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionQueries.me().queryKey, buildSession(buildUser({ id: admin.userId }), 'csrf-members'));
  const view = renderWithProviders(<MembersPanel workshopId={workshopId} currentUserId={admin.userId} />, { queryClient });
  return { ...view, api, admin, mentor, student };
}

describe('MembersPanel', () => {
  test('when the admin assigns a mentor to a student, then the choice shows at once and is sent', async () => {
    const { user, api, mentor, student } = setup();
    await screen.findByRole('table', { name: 'Members of this workshop' });

    await user.click(screen.getByText('No mentor yet'));
    await user.click(screen.getByRole('checkbox', { name: 'Mo Mentor' }));

    await expect.poll(() => api.to('POST', `${base}/members`).length).toBe(1);
    await expect.poll(() => (screen.getByRole('checkbox', { name: 'Mo Mentor' }) as HTMLInputElement).checked).toBe(true);
    expect(screen.getByText('Mo Mentor', { selector: 'summary span' })).toBeInTheDocument();
    expect(api.to('POST', `${base}/members`)[0]?.body).toEqual({ userId: student.userId, mentorIds: [mentor.userId] });
  });

  test('when the admin looks at their own row, then they cannot change their role or remove themselves', async () => {
    setup();
    await screen.findByRole('table', { name: 'Members of this workshop' });
    const ownRow = screen.getByText('(you)').closest('tr');
    expect(ownRow).not.toBeNull();
    expect(within(ownRow as HTMLElement).queryByRole('combobox')).not.toBeInTheDocument();
    expect(within(ownRow as HTMLElement).getByText('Another admin can change your role.')).toBeInTheDocument();
    expect(within(ownRow as HTMLElement).queryByRole('button', { name: /Remove/ })).not.toBeInTheDocument();
  });

  test('when the server rejects an invitation field, then the message sits under that field', async () => {
    const { user } = setup({
      [`POST ${base}/invitations`]: () =>
        apiError(400, 'validation-failed', 'Check the form', { issues: [{ path: 'email', message: 'Already a member' }] }),
    });
    await screen.findByRole('table', { name: 'Members of this workshop' });

    await user.type(screen.getByRole('textbox', { name: 'E-mail' }), 'sam@example.test');
    await user.click(screen.getByRole('button', { name: 'Send invitation' }));

    expect(await screen.findByText('Already a member')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: 'E-mail' })).toHaveAccessibleDescription('Already a member');
  });
});
