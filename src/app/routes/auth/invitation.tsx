import { useNavigate, useParams } from 'react-router-dom';
import { toast } from 'sonner';
import { AuthLayout } from '#src/components/layouts/auth-layout.tsx';
import { paths } from '#src/config/paths.ts';
import { InvitationPanel } from '#src/features/auth/components/invitation-panel.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';

export default function InvitationPage() {
  const { token = '' } = useParams();
  const user = useCurrentUser();
  const navigate = useNavigate();
  return (
    <AuthLayout title="Join a workshop">
      <InvitationPanel
        token={token}
        user={user}
        onJoined={(workshopId) => {
          toast.success('You have joined the workshop.');
          void navigate(paths.heats.getHref(workshopId), { replace: true });
        }}
      />
    </AuthLayout>
  );
}
