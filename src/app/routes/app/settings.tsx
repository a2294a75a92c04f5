import { useSuspenseQuery } from '@tanstack/react-query';
import { useEffect } from 'react';
import { useLocation } from 'react-router-dom';
import { toast } from 'sonner';
import { Card } from '#src/components/ui/card.tsx';
import { errorMessage } from '#src/components/ui/error-boundary.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { useUpdatePreferences } from '#src/features/auth/api/use-update-preferences.ts';
import { ChangePasswordForm } from '#src/features/auth/components/change-password-form.tsx';
import { SignOutEverywhere } from '#src/features/auth/components/sign-out-everywhere.tsx';
import { TwoStepPanel } from '#src/features/auth/components/two-step-panel.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { NotificationPreferences } from '#src/features/notifications/components/notification-preferences.tsx';
import { PreferencesForm } from '#src/features/preferences/components/preferences-form.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { can } from '#shared/auth/permissions.ts';

export default function SettingsPage() {
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const updatePreferences = useUpdatePreferences();
  const { hash } = useLocation();
  // A link to a section (/settings#two-step, from a workshop that requires
  // it) lands on it; the browser does this only on a full page load.
  useEffect(() => {
    if (hash) document.getElementById(decodeURIComponent(hash.slice(1)))?.scrollIntoView?.({ block: 'start' });
  }, [hash]);
  if (!user) return null;

  const managed = workshops.filter((w) => can({ id: user.id, role: w.role }, 'manage', 'member'));

  return (
    <>
      <PageHeader title="Settings" description={`Signed in as ${user.email}.`} />
      <div className="flex max-w-3xl flex-col gap-6">
        <PreferencesForm
          user={user}
          saving={updatePreferences.isPending && updatePreferences.variables?.displayName !== undefined}
          onChange={(update, callbacks) =>
            updatePreferences.mutate(update, {
              onSuccess: callbacks?.onSuccess,
              onError: (error) => (callbacks?.onError ? callbacks.onError(error) : toast.error(`Not saved: ${errorMessage(error)}`)),
            })
          }
        />
        <NotificationPreferences />
        <TwoStepPanel user={user} />
        <ChangePasswordForm />
        <SignOutEverywhere />
        {managed.length > 0 ? (
          <Card title="Workshops you run" description="Members, their roles, mentors and invitations.">
            <ul className="flex flex-col gap-2">
              {managed.map((w) => (
                <li key={w.id}>
                  <TextLink to={paths.members.getHref(w.id)} className="inline-flex min-h-12 items-center lg:min-h-0">
                    Members of {w.name}
                  </TextLink>
                </li>
              ))}
              <li>
                <TextLink to={paths.devMail.getHref()} className="inline-flex min-h-12 items-center lg:min-h-0">
                  Mail outbox (development)
                </TextLink>
              </li>
            </ul>
          </Card>
        ) : null}
      </div>
    </>
  );
}
