import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from '#src/app/provider.tsx';
import { createAppRoutes } from '#src/app/router.tsx';
import { bindCsrfToSession } from '#src/features/auth/api/bind-csrf.ts';

/** A fresh cache per test; no retries, so a failing request fails at once. */
export function createTestQueryClient() {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  bindCsrfToSession(queryClient);
  return queryClient;
}

/** Renders one component inside the app's providers and a router. */
export function renderWithProviders(ui: ReactNode, { queryClient = createTestQueryClient(), path = '/' } = {}) {
  const router = createMemoryRouter([{ path: '*', element: ui }], { initialEntries: [path] });
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, queryClient, router, user: userEvent.setup() };
}

/** Renders the whole app (real routes, loaders and lazy pages) at `path`. */
export function renderApp(path: string, { queryClient = createTestQueryClient() } = {}) {
  const router = createMemoryRouter(createAppRoutes(queryClient), { initialEntries: [path] });
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, queryClient, router, user: userEvent.setup() };
}
