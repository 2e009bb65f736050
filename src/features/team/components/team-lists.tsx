import { Pill } from '../../../components/ui/pill';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format';
import { roleLabel, type TeamInvite, type TeamMember } from '../api';

export function PeopleTable({ users }: { users: TeamMember[] }) {
  return (
    <Table>
      <caption className="sr-only">People of the workshop</caption>
      <thead>
        <tr>
          <Th>Name and e-mail</Th>
          <Th>Role</Th>
          <Th className="hidden sm:table-cell">Since</Th>
        </tr>
      </thead>
      <tbody>
        {users.map((user) => (
          <tr key={user.id}>
            <Td>
              <p className="font-semibold">{user.name}</p>
              <p className="break-words text-muted">{user.email}</p>
            </Td>
            <Td>
              <Pill tone={user.role === 'skipper' ? 'quiet' : 'outline'}>
                {roleLabel[user.role]}
              </Pill>
            </Td>
            <Td className="hidden whitespace-nowrap sm:table-cell">{formatDate(user.createdAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}

/** Invites not yet accepted; expired ones stay listed so the manager can send a new one. */
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
    <ul className="flex flex-col gap-2">
      {pending.map((invite) => {
        const expired = new Date(invite.expiresAt) <= now;
        return (
          <li
            key={invite.id}
            className="flex flex-wrap items-center gap-2 rounded-md border-2 border-line bg-paper p-3"
          >
            <span className="font-semibold break-all">{invite.email}</span>
            <Pill tone="quiet">{roleLabel[invite.role]}</Pill>
            {expired ? (
              <Pill tone="solid">Expired</Pill>
            ) : (
              <span className="text-muted">valid until {formatDate(invite.expiresAt)}</span>
            )}
          </li>
        );
      })}
    </ul>
  );
}
