import { useUsers } from '../../features/team/api';
import { InviteForm } from '../../features/team/components/invite-form';
import { OutgoingMailList } from '../../features/team/components/outgoing-mail';
import { AccountHistory } from '../../features/team/components/account-history';
import { PendingInvites, PeopleList } from '../../features/team/components/team-lists';
import { useVessels } from '../../features/vessels/api';
import { ButtonLink } from '../../components/ui/button-link';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { useSessionUser } from '../shell/session';

export function TeamRoute() {
  const user = useSessionUser();
  if (user.role !== 'manager') {
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-3xl font-bold">Team</h1>
        <p>Only the workshop&rsquo;s managers can see and invite people.</p>
        <ButtonLink to="/" variant="secondary" className="self-start">
          Back to the start
        </ButtonLink>
      </div>
    );
  }
  return <ManagerTeam />;
}

function ManagerTeam() {
  const user = useSessionUser();
  const team = useUsers();
  const vessels = useVessels();
  const vesselOptions = (vessels.data ?? []).map(({ id, name }) => ({ id, name }));

  return (
    <div className="flex flex-col gap-6">
      <title>Team · Ringseat</title>
      <h1 className="text-3xl font-bold">Team</h1>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="flex min-w-0 flex-col gap-6">
          <section className="flex flex-col gap-3" aria-labelledby="people-heading">
            <h2 id="people-heading" className="text-xl font-bold">
              People
            </h2>
            {team.isPending && <Loading label="Loading people…" />}
            {team.isError && (
              <LoadError error={team.error} what="the team" onRetry={() => team.refetch()} />
            )}
            {team.data && <PeopleList users={team.data.users} selfId={user.id} />}
          </section>
          <section className="flex flex-col gap-3" aria-labelledby="invites-heading">
            <h2 id="invites-heading" className="text-xl font-bold">
              Pending invites
            </h2>
            {team.data && <PendingInvites invites={team.data.invites} />}
          </section>
          <section className="flex flex-col gap-3" aria-labelledby="mail-heading">
            <h2 id="mail-heading" className="text-xl font-bold">
              Outgoing e-mail
            </h2>
            <p className="text-muted">
              Invites, certificates, returns and service reminders. What the mail server did not
              take waits here and is tried again automatically.
            </p>
            <OutgoingMailList />
          </section>
          <section className="flex flex-col gap-3" aria-labelledby="history-heading">
            <h2 id="history-heading" className="text-xl font-bold">
              Account changes
            </h2>
            <AccountHistory />
          </section>
        </div>
        <Card title="Invite someone" className="self-start">
          <InviteForm vessels={vesselOptions} />
        </Card>
      </div>
    </div>
  );
}

export { TeamRoute as Component };
