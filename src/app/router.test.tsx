import { screen } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { json, stubApi } from '#src/testing/fetch-stub.ts';
import { buildSession, buildUser, buildWorkshop } from '#src/testing/data.ts';
import { renderApp } from '#src/testing/render.tsx';

describe('session gate', () => {
  test('when someone signed out opens a workshop page, then they sign in and land back on it', async () => {
    const workshop = buildWorkshop({ role: 'caster' });
    const signedIn = buildSession(buildUser(), 'csrf-after');
    stubApi({
      'GET /api/auth/me': buildSession(null, 'csrf-before'),
      'POST /api/auth/sign-in': () => json(signedIn),
      'GET /api/workshops': [workshop],
      [`GET /api/workshops/${workshop.id}/photos`]: { items: [], nextCursor: null },
      [`GET /api/workshops/${workshop.id}/members`]: [],
    });
    const { user, router } = renderApp(`/w/${workshop.id}/gallery`);

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent(`/w/${workshop.id}/gallery`)}`);

    await user.type(screen.getByLabelText('E-mail'), 'ada@example.test');
    await user.type(screen.getByLabelText('Password'), 'long enough secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Gallery' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe(`/w/${workshop.id}/gallery`);
  });

  test('when a signed-in user with no workshop opens the start page, then they are asked to create one', async () => {
    stubApi({ 'GET /api/auth/me': buildSession(buildUser()), 'GET /api/workshops': [] });
    renderApp('/');
    expect(await screen.findByRole('heading', { level: 1, name: 'Create your workshop' })).toBeInTheDocument();
  });
});
