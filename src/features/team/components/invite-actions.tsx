import { errorMessage } from '../../../lib/api-client';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { useResendInvite, useRevokeInvite, type TeamInvite } from '../api';
import { InviteLink } from './invite-link';

/** "Send again" makes a new link (the old one stops working); "Withdraw" ends the invite. */
export function InviteActions({ invite }: { invite: TeamInvite }) {
  const resend = useResendInvite();
  const revoke = useRevokeInvite();
  const failure = resend.error ?? revoke.error;
  return (
    <div className="mt-2 flex flex-col gap-2">
      {failure && <Alert title="Not changed">{errorMessage(failure)}</Alert>}
      <div className="flex flex-wrap gap-2">
        <Button
          variant="secondary"
          pending={resend.isPending}
          pendingLabel="Sending…"
          onClick={() => resend.mutate(invite.id)}
        >
          Send again
        </Button>
        {!invite.revokedAt && (
          <Button
            variant="quiet"
            pending={revoke.isPending}
            onClick={() => revoke.mutate(invite.id)}
          >
            Withdraw invite
          </Button>
        )}
      </div>
      {resend.data && <InviteLink sent={resend.data} />}
    </div>
  );
}
