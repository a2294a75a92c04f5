import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { MailOutbox } from '#src/features/dev-mail/components/mail-outbox.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';

export default function DevMailPage() {
  const user = useCurrentUser();
  const isAdmin = user?.memberships.some((m) => m.role === 'admin') ?? false;
  return (
    <>
      <PageHeader
        title="Mail outbox (development)"
        description="On development and test servers, mail goes to a local stand-in instead of real inboxes. This is what it caught."
      />
      {isAdmin ? (
        <MailOutbox />
      ) : (
        <Notice tone="info" title="For workshop admins">
          <p>Only admins see the mail outbox.</p>
        </Notice>
      )}
    </>
  );
}
