import { screen, within } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import type { Role } from '#shared/auth/roles.ts';
import { sessionQueries } from '#src/features/auth/api/session-queries.ts';
import { apiError, json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser, buildWorkshop } from '#src/testing/data.ts';
import { renderApp } from '#src/testing/render.tsx';

// The heats page is the first lazy page these tests open; its code (the
// table, the filters) takes longer than findBy's default second to load cold.
const HEATS_PAGE_WAIT = { timeout: 5000 };

function signedInAs(role: Role, extraRoutes: Parameters<typeof stubApi>[0] = {}) {
  const workshop = buildWorkshop({ role });
  const user = buildUser({ memberships: [{ workshopId: workshop.id, workshopName: workshop.name, role }] });
  const api = stubApi({
    'GET /api/auth/me': buildSession(user, 'csrf-shell'),
    'GET /api/workshops': [workshop],
    // The heats page these tests land on reads the log and its filter choices.
    [`GET /api/workshops/${workshop.id}/heats`]: { items: [], nextCursor: null },
    [`GET /api/workshops/${workshop.id}/members`]: [],
    [`GET /api/workshops/${workshop.id}/furnaces`]: [],
    [`GET /api/workshops/${workshop.id}/crucibles`]: [],
    ...extraRoutes,
  });
  return { workshop, user, api };
}

describe('app shell navigation', () => {
  test.each(['student', 'caster', 'mentor'] as const)('when a %s opens the heats page, then there is no Members link', async (role) => {
    const { workshop } = signedInAs(role);
    renderApp(`/w/${workshop.id}/heats`);

    expect(await screen.findByRole('heading', { level: 1, name: 'Heats' }, HEATS_PAGE_WAIT)).toBeInTheDocument();
    expect(screen.getAllByRole('link', { name: 'Gallery' }).length).toBeGreaterThan(0);
    expect(screen.queryByRole('link', { name: 'Members' })).not.toBeInTheDocument();
  });

  test('when an admin opens the More sheet, then Members is there with the other places', async () => {
    const { workshop } = signedInAs('admin');
    const { user } = renderApp(`/w/${workshop.id}/heats`);
    await screen.findByRole('heading', { level: 1, name: 'Heats' }, HEATS_PAGE_WAIT);

    await user.click(screen.getByRole('button', { name: 'More' }));

    const sheet = screen.getByRole('dialog', { name: 'More' });
    for (const name of ['Equipment', 'Calculators', 'Insights', 'Heat treatment', 'Safety', 'Settings', 'Members']) {
      expect(within(sheet).getByRole('link', { name })).toBeInTheDocument();
    }
    expect(within(sheet).getByRole('link', { name: 'Members' })).toHaveAttribute('href', `/w/${workshop.id}/members`);
  });

  test('when the workshop in the URL is not one of yours, then it says so', async () => {
    signedInAs('admin');
    renderApp('/w/00000000-0000-4000-8000-ffffffffffff/heats');
    expect(await screen.findByText('This workshop is not in your list')).toBeInTheDocument();
  });
});

describe('unit toggles in the user menu', () => {
  test('when °F is chosen, then it shows at once and is saved with the CSRF token', async () => {
    const { workshop, user: me, api } = signedInAs('caster', {
      'PATCH /api/auth/me': ({ body }) => json({ ...buildUser({ id: 'x' }), ...(body as object), id: me.id, memberships: me.memberships }),
    });
    const { user } = renderApp(`/w/${workshop.id}/heats`);
    await screen.findByRole('heading', { level: 1, name: 'Heats' }, HEATS_PAGE_WAIT);

    await user.click(screen.getByRole('button', { name: /account and units/ }));
    const panel = screen.getByRole('region', { name: 'Account and units' });
    await user.click(within(panel).getByRole('radio', { name: /°F/ }));

    expect(within(panel).getByRole('radio', { name: /°F/ })).toBeChecked();
    await expect.poll(() => api.to('PATCH', '/api/auth/me').length).toBe(1);
    const [patch] = api.to('PATCH', '/api/auth/me');
    expect(patch?.body).toEqual({ temperatureUnit: 'F' });
    expect(patch?.headers.get('x-csrf-token')).toBe('csrf-shell');
  });

  test('when the server refuses the change, then the toggle goes back and says why', async () => {
    const { workshop } = signedInAs('caster', {
      'PATCH /api/auth/me': () => apiError(500, 'internal', 'The server could not save that'),
    });
    const { user } = renderApp(`/w/${workshop.id}/heats`);
    await screen.findByRole('heading', { level: 1, name: 'Heats' }, HEATS_PAGE_WAIT);

    await user.click(screen.getByRole('button', { name: /account and units/ }));
    const panel = screen.getByRole('region', { name: 'Account and units' });
    await user.click(within(panel).getByRole('radio', { name: /oz/ }));

    expect(await screen.findByText(/Not saved: The server could not save that/)).toBeInTheDocument();
    expect(within(panel).getByRole('radio', { name: /^g/ })).toBeChecked();
  });
});

describe('signing out', () => {
  test('when the user signs out, then they land on sign-in with no way back into the old page', async () => {
    const workshop = buildWorkshop({ role: 'caster' });
    let session = buildSession(buildUser(), 'csrf-shell');
    const api = stubApi({
      'GET /api/auth/me': () => json(session),
      'GET /api/workshops': [workshop],
      [`GET /api/workshops/${workshop.id}/heats`]: { items: [], nextCursor: null },
      [`GET /api/workshops/${workshop.id}/members`]: [],
      [`GET /api/workshops/${workshop.id}/furnaces`]: [],
      [`GET /api/workshops/${workshop.id}/crucibles`]: [],
      'POST /api/auth/sign-out': () => {
        session = buildSession(null, 'csrf-signed-out');
        return new Response(null, { status: 204 });
      },
    });
    const { user, router, queryClient } = renderApp(`/w/${workshop.id}/heats`);
    await screen.findByRole('heading', { level: 1, name: 'Heats' }, HEATS_PAGE_WAIT);

    await user.click(screen.getByRole('button', { name: /account and units/ }));
    await user.click(screen.getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    expect(api.to('POST', '/api/auth/sign-out')[0]?.headers.get('x-csrf-token')).toBe('csrf-shell');
    await expect.poll(() => queryClient.getQueryData(sessionQueries.me().queryKey)).toEqual(buildSession(null, 'csrf-signed-out'));
  });
});
