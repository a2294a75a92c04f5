import type { QueryClient } from '@tanstack/react-query';
import { Outlet, type LoaderFunctionArgs } from 'react-router-dom';
import { SessionGate } from '#src/features/auth/components/session-gate.tsx';
import { requireUser } from '#src/features/auth/lib/require-session.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    return null;
  };

/** Everything below needs a signed-in user; others go to sign-in and come back. */
export default function ProtectedLayout() {
  return (
    <SessionGate>
      <Outlet />
    </SessionGate>
  );
}
