import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { Button } from '#src/components/ui/button.tsx';
import { Card } from '#src/components/ui/card.tsx';
import { paths } from '#src/config/paths.ts';
import { useSignOut } from '../api/use-sign-out.ts';

/** Settings: ends every session of the account, this one too (a lost phone, a shared computer). */
export function SignOutEverywhere() {
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  const signOut = useSignOut({ everywhere: true, beforeReset: () => navigate(paths.signIn.getHref(), { replace: true }) });

  return (
    <Card
      title="Signed in somewhere else?"
      description="Lost a phone, or signed in on a computer you do not trust? Sign out everywhere at once."
    >
      {confirming ? (
        <div className="flex flex-col gap-3">
          <p className="text-body">This signs you out on every device, this one too. You then sign in again here.</p>
          <div className="flex flex-wrap gap-3">
            <Button
              variant="danger"
              pending={signOut.isPending}
              pendingLabel="Signing out…"
              onClick={() => signOut.mutate(undefined, { onError: () => toast.error('Not signed out. Try again.') })}
            >
              Yes, sign out everywhere
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <Button onClick={() => setConfirming(true)}>Sign out everywhere</Button>
      )}
    </Card>
  );
}
