import { useQuery } from '@tanstack/react-query';
import { Mail, RotateCcw } from 'lucide-react';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDateTime } from '#src/lib/format.ts';
import { devMailQueries } from '../api/mail-queries.ts';
import { LinkifiedText } from './linkified-text.tsx';

/** The local mail fake's inbox: what the server would have sent, newest first. */
export function MailOutbox() {
  const outbox = useQuery(devMailQueries.list());

  if (outbox.isPending) return <SkeletonGroup label="Loading the mail outbox" lines={6} />;
  if (outbox.isError) {
    if (isApiError(outbox.error) && outbox.error.status === 404) {
      return (
        <Notice tone="info" title="No mail outbox on this server">
          <p>The outbox exists only on development and test servers. Here, mail goes out to real addresses.</p>
        </Notice>
      );
    }
    return (
      <Notice tone="danger" role="alert" title="The outbox did not load">
        <p>{outbox.error.message}</p>
        <Button className="mt-3" onClick={() => void outbox.refetch()}>
          Try again
        </Button>
      </Notice>
    );
  }

  const messages = [...outbox.data].sort((a, b) => Date.parse(b.date) - Date.parse(a.date));
  return (
    <div className="flex flex-col gap-4">
      <div>
        <Button icon={<RotateCcw aria-hidden className="size-4" />} pending={outbox.isFetching} pendingLabel="Checking…" onClick={() => void outbox.refetch()}>
          Check for new mail
        </Button>
      </div>
      {messages.length === 0 ? (
        <EmptyState icon={Mail} title="No mail yet">
          <p>Invitations, password-reset links and sign-up messages appear here instead of going to a real inbox.</p>
        </EmptyState>
      ) : (
        <ol className="flex flex-col gap-4">
          {messages.map((message) => (
            <li key={message.id}>
              <Card title={message.subject || '(no subject)'} headingLevel={2}>
                <dl className="mb-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-caption">
                  <dt className="text-ink-muted">To</dt>
                  <dd className="break-all">{message.to.join(', ')}</dd>
                  <dt className="text-ink-muted">From</dt>
                  <dd className="break-all">{message.from}</dd>
                  <dt className="text-ink-muted">Date</dt>
                  <dd className="tabular">{formatDateTime(message.date)}</dd>
                </dl>
                <pre className="rounded-md bg-surface-sunken p-3 font-sans text-body whitespace-pre-wrap text-ink">
                  <LinkifiedText text={message.text} />
                </pre>
                {message.html ? <p className="mt-2 text-caption text-ink-muted">This message also has an HTML part; the text part is shown.</p> : null}
              </Card>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
