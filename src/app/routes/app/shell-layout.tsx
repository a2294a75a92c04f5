import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { Suspense } from 'react';
import { Outlet, useNavigate, useNavigation, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { toast } from 'sonner';
import { AppShell } from '#src/components/layouts/app-shell.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { PageSkeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { useSignOut } from '#src/features/auth/api/use-sign-out.ts';
import { useUpdatePreferences } from '#src/features/auth/api/use-update-preferences.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import type { ChangePreferences } from '#src/features/preferences/components/preference-controls.tsx';
import { NotificationBell } from '#src/features/notifications/components/notification-bell.tsx';
import { UserMenu } from '#src/features/preferences/components/user-menu.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { WorkshopSwitcher } from '#src/features/workshops/components/workshop-switcher.tsx';
import { pickWorkshop } from '#src/features/workshops/lib/remembered-workshop.ts';
import { buildNavItems } from '../../nav-items.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    await queryClient.ensureQueryData(workshopQueries.list());
    return null;
  };

/** Composes the shell: workshop switcher, user menu (units, theme, sign-out) and the navigation. */
export default function ShellLayout() {
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const { workshopId } = useParams();
  const navigate = useNavigate();
  const navigation = useNavigation();
  const updatePreferences = useUpdatePreferences();
  const signOut = useSignOut({ beforeReset: () => navigate(paths.signIn.getHref(), { replace: true }) });

  if (!user) return null;
  const workshop = workshopId ? (workshops.find((w) => w.id === workshopId) ?? null) : pickWorkshop(workshops);

  const changePreferences: ChangePreferences = (update, callbacks) =>
    updatePreferences.mutate(update, {
      onSuccess: callbacks?.onSuccess,
      onError: (error) => (callbacks?.onError ? callbacks.onError(error) : toast.error(`Not saved: ${errorMessage(error)}`)),
    });

  return (
    <AppShell
      navItems={buildNavItems(workshop, user)}
      topBarStart={<WorkshopSwitcher currentWorkshopId={workshop?.id} />}
      topBarEnd={
        <div className="flex items-center gap-1">
          <NotificationBell />
          <UserMenu
          user={user}
          onChange={changePreferences}
          signingOut={signOut.isPending}
          onSignOut={() => signOut.mutate(undefined, { onError: (error) => toast.error(`Not signed out: ${errorMessage(error)}`) })}
          />
        </div>
      }
    >
      {/* A thin bar while the next page loads; no spinner. */}
      <div aria-hidden className={navigation.state === 'loading' ? 'fixed inset-x-0 top-0 z-50 h-0.5 bg-accent motion-safe:animate-pulse' : 'hidden'} />
      <Suspense fallback={<PageSkeleton />}>
        <Outlet />
      </Suspense>
    </AppShell>
  );
}
