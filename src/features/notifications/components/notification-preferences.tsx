import { useQuery } from '@tanstack/react-query';
import { EMAIL_MODES, type EmailMode } from '#shared/reports/notification-schemas.ts';
import { Card } from '#src/components/ui/card.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SegmentedControl } from '#src/components/ui/segmented-control.tsx';
import { notificationQueries, useUpdateNotificationPreferences } from '../api/notification-queries.ts';

const MODE_WORDS: Record<EmailMode, { label: string; description: string }> = {
  immediate: { label: 'Each one', description: 'A mail for each submitted report, comment, mention and resolution.' },
  daily: { label: 'Daily digest', description: 'One mail a day (07:00 UTC) gathering them.' },
  off: { label: 'Off', description: 'In the app only, under the bell.' },
};

/** The settings section for notification mail: immediate, a daily digest, or none. */
export function NotificationPreferences() {
  const prefs = useQuery(notificationQueries.preferences());
  const update = useUpdateNotificationPreferences();
  return (
    <Card title="Notifications by e-mail" description="The bell in the top bar always lists them; choose how the mail comes." id="notifications">
      {prefs.data ? (
        <SegmentedControl
          legend="E-mail"
          value={update.variables?.email ?? prefs.data.email}
          options={EMAIL_MODES.map((m) => ({ value: m, label: MODE_WORDS[m].label, description: MODE_WORDS[m].description }))}
          onChange={(email: EmailMode) => update.mutate({ email })}
        />
      ) : (
        <p className="text-body text-ink-muted">Loading…</p>
      )}
      {update.error ? (
        <Notice tone="danger" role="alert" title="Not saved">
          <p>{update.error.message}</p>
        </Notice>
      ) : null}
    </Card>
  );
}
