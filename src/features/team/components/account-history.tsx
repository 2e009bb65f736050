import { LoadError, Loading } from '../../../components/ui/status-message';
import { formatDateTime } from '../../../lib/format';
import { useTeamHistory } from '../api';

const actionWord: Record<string, string> = {
  'invite-sent': 'Invite sent',
  'invite-resent': 'Invite sent again',
  'invite-revoked': 'Invite withdrawn',
  'invite-accepted': 'Invite accepted',
  'password-changed': 'Password changed',
  'password-reset-requested': 'Reset link e-mailed',
  'password-reset': 'Password reset',
  'signed-out-everywhere': 'Signed out everywhere',
  'role-changed': 'Role changed',
  'account-deactivated': 'Deactivated',
  'account-reactivated': 'Reactivated',
  'mail-sent': 'E-mail sent',
  'mail-failed': 'E-mail not sent',
};

/** Who changed what about whose account, newest first: the team's part of the audit trail. */
export function AccountHistory() {
  const history = useTeamHistory();
  if (history.isPending) return <Loading label="Loading the history…" />;
  if (history.isError)
    return <LoadError error={history.error} what="the history" onRetry={() => history.refetch()} />;
  if (history.data.changes.length === 0)
    return <p className="text-muted">No changes to accounts yet.</p>;
  return (
    <ol aria-label="Account changes" className="flex flex-col gap-2">
      {history.data.changes.map((change) => (
        <li key={change.id} className="border-l-4 border-line pl-3">
          <p>
            <span className="font-semibold">{actionWord[change.action] ?? change.action}</span>
            <span className="text-muted">
              {' '}
              · {formatDateTime(change.at)} · by {change.actorName}
            </span>
          </p>
          <p className="break-words">{change.detail}</p>
        </li>
      ))}
    </ol>
  );
}
