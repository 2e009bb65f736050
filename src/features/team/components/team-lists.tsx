import { Pill } from '../../../components/ui/pill';
import { formatDate } from '../../../lib/format';
import { roleLabel, type TeamInvite, type TeamMember } from '../api';
import { InviteActions } from './invite-actions';
import { PersonActions } from './person-actions';

const rowClass = 'rounded-md border-2 border-line bg-paper p-3';

/** The workshop's people; a manager opens "Manage" on anyone but themselves. */
export function PeopleList({ users, selfId }: { users: TeamMember[]; selfId: string }) {
  return (
    <ul aria-label="People of the workshop" className="flex flex-col gap-2">
      {users.map((user) => (
        <li key={user.id} className={rowClass}>
          <div className="flex flex-wrap items-center gap-2">
            <span className="font-semibold">{user.name}</span>
            <Pill tone={user.role === 'skipper' ? 'quiet' : 'outline'}>{roleLabel[user.role]}</Pill>
            {user.archivedAt && <Pill tone="solid">Deactivated</Pill>}
            {user.id === selfId && <span className="text-muted">(you)</span>}
          </div>
          <p className="break-words text-muted">
            {user.email} · since {formatDate(user.createdAt)}
          </p>
          {user.id !== selfId && (
            <details className="group">
              <summary className="inline-flex min-h-touch cursor-pointer items-center gap-2 font-semibold">
                <span aria-hidden="true" className="inline-block group-open:rotate-90">
                  ▸
                </span>
                Manage {user.name}
              </summary>
              <PersonActions person={user} />
            </details>
          )}
        </li>
      ))}
    </ul>
  );
}

/** Invites not yet accepted; expired and withdrawn ones stay listed so a new link can go out. */
export function PendingInvites({
  invites,
  now = new Date(),
}: {
  invites: TeamInvite[];
  now?: Date;
}) {
  const pending = invites.filter((invite) => invite.acceptedAt === null);
  if (pending.length === 0) return <p className="text-muted">No invites are waiting.</p>;
  return (
    <ul aria-label="Pending invites" className="flex flex-col gap-2">
      {pending.map((invite) => (
        <li key={invite.id} className={rowClass}>
          <div className="flex flex-wrap items-center gap-2">
            <span className="font-semibold break-all">{invite.email}</span>
            <Pill tone="quiet">{roleLabel[invite.role]}</Pill>
            <InviteState invite={invite} now={now} />
          </div>
          <InviteActions invite={invite} />
        </li>
      ))}
    </ul>
  );
}

function InviteState({ invite, now }: { invite: TeamInvite; now: Date }) {
  if (invite.revokedAt) return <Pill tone="solid">Withdrawn</Pill>;
  if (new Date(invite.expiresAt) <= now) return <Pill tone="solid">Expired</Pill>;
  return <span className="text-muted">valid until {formatDate(invite.expiresAt)}</span>;
}
