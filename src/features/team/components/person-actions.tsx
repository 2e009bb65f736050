import { useId, useState } from 'react';
import { ROLES, type Role } from '../../../../shared/auth/auth.schema';
import { errorMessage } from '../../../lib/api-client';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { roleLabel, useChangeRole, useSetActive, type TeamMember } from '../api';

const roleMeaning: Record<Role, string> = {
  skipper: 'sees and runs only the boats linked to them',
  technician: 'sees every record, reviews and signs off runs',
  manager: 'as a technician, and manages the team',
};

/** A manager's changes to one person: the role, and whether they may sign in at all. */
export function PersonActions({ person }: { person: TeamMember }) {
  return (
    <div className="flex flex-col gap-3 pt-2">
      {person.archivedAt === null && <RoleChoice person={person} />}
      <ActiveSwitch person={person} />
    </div>
  );
}

function RoleChoice({ person }: { person: TeamMember }) {
  const id = useId();
  const [role, setRole] = useState<Role>(person.role);
  const changeRole = useChangeRole();
  return (
    <div className="flex flex-col gap-1">
      {changeRole.isError && <Alert title="Not changed">{errorMessage(changeRole.error)}</Alert>}
      <label htmlFor={id} className="font-semibold">
        Role of {person.name}
      </label>
      <div className="flex flex-wrap gap-2">
        <select
          id={id}
          className={`${controlClass} w-auto`}
          value={role}
          onChange={(e) => setRole(e.target.value as Role)}
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {roleLabel[r]}
            </option>
          ))}
        </select>
        <Button
          variant="secondary"
          disabled={role === person.role}
          pending={changeRole.isPending}
          onClick={() => changeRole.mutate({ id: person.id, role })}
        >
          Save role
        </Button>
      </div>
      <p className="text-sm text-muted">
        A {roleLabel[role].toLowerCase()} {roleMeaning[role]}.
      </p>
    </div>
  );
}

/** Deactivate (asked once, since every session ends) or reactivate. */
function ActiveSwitch({ person }: { person: TeamMember }) {
  const [asking, setAsking] = useState(false);
  const setActive = useSetActive();
  const failure = setActive.isError && (
    <Alert title="Not changed">{errorMessage(setActive.error)}</Alert>
  );
  if (person.archivedAt !== null)
    return (
      <>
        {failure}
        <Button
          variant="secondary"
          className="self-start"
          pending={setActive.isPending}
          onClick={() => setActive.mutate({ id: person.id, active: true })}
        >
          Reactivate {person.name}
        </Button>
      </>
    );
  if (!asking)
    return (
      <Button variant="secondary" className="self-start" onClick={() => setAsking(true)}>
        Deactivate…
      </Button>
    );
  return (
    <div className="flex flex-col gap-2 rounded-md border-2 border-ink p-3">
      {failure}
      <p>
        {person.name} is signed out on every device at once and cannot sign in until a manager
        reactivates the account. Their records stay.
      </p>
      <div className="flex flex-wrap gap-2">
        <Button
          pending={setActive.isPending}
          onClick={() => setActive.mutate({ id: person.id, active: false })}
        >
          Deactivate {person.name}
        </Button>
        <Button variant="secondary" onClick={() => setAsking(false)}>
          Keep active
        </Button>
      </div>
    </div>
  );
}
