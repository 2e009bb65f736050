import { useState } from 'react';
import { errorMessage } from '../../../lib/api-client';
import { clearUserData } from '../../../lib/db';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { useSignOutEverywhere } from '../account-api';

/**
 * Ends the account's sessions on every phone and computer, this one too: for a lost phone or a
 * shared computer. Asks once before it acts, since every device then needs the password again.
 */
export function SignOutEverywhere({ sessions, onDone }: { sessions: number; onDone: () => void }) {
  const signOut = useSignOutEverywhere();
  const [asking, setAsking] = useState(false);
  const others = Math.max(0, sessions - 1);
  const go = () =>
    signOut.mutate(undefined, {
      onSuccess: async () => {
        await clearUserData().catch(() => undefined);
        onDone();
      },
    });
  return (
    <div className="flex flex-col gap-3">
      <p>
        Signed in on this device
        {others > 0 ? ` and ${others} other${others === 1 ? '' : 's'}` : ' only'}. Lost a phone?
        Sign out everywhere, then sign in again here.
      </p>
      <p className="text-sm text-muted">
        Readings this device has not sent yet stay on it and go when you sign in again.
      </p>
      {signOut.isError && (
        <Alert title="Could not sign out everywhere">{errorMessage(signOut.error)}</Alert>
      )}
      {asking ? (
        <div className="flex flex-wrap gap-2">
          <Button pending={signOut.isPending} pendingLabel="Signing out…" onClick={go}>
            Yes, sign out on every device
          </Button>
          <Button variant="secondary" onClick={() => setAsking(false)}>
            Keep them signed in
          </Button>
        </div>
      ) : (
        <Button variant="secondary" className="self-start" onClick={() => setAsking(true)}>
          Sign out everywhere
        </Button>
      )}
    </div>
  );
}
