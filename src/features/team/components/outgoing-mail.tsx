import { format } from 'date-fns';
import type { OutgoingMailView } from '../../../../shared/mail/outgoing-mail';
import { Button } from '../../../components/ui/button';
import { Pill } from '../../../components/ui/pill';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { useOutgoingMail, useRetryMail } from '../api';

const when = (iso: string) => format(new Date(iso), 'd MMM yyyy, HH:mm');

const stateWords: Record<OutgoingMailView['state'], string> = {
  sent: 'Sent',
  waiting: 'Waiting',
  failed: 'Not sent',
};

function MailLine({ mail }: { mail: OutgoingMailView }) {
  const retry = useRetryMail();
  return (
    <li className="flex flex-col gap-1 rounded-md border-2 border-line bg-paper p-3">
      <div className="flex flex-wrap items-center gap-2">
        <Pill tone={mail.state === 'sent' ? 'quiet' : 'solid'}>{stateWords[mail.state]}</Pill>
        <span className="font-semibold break-words">{mail.subject}</span>
      </div>
      <p className="break-all text-muted">To {mail.recipients || 'nobody'}</p>
      <p className="text-sm text-muted">
        {mail.sentAt
          ? `Sent ${when(mail.sentAt)}`
          : `Written ${when(mail.createdAt)}${mail.attempts > 0 ? `, ${mail.attempts} tries` : ''}${
              mail.nextAttemptAt ? `; next try ${when(mail.nextAttemptAt)}` : ''
            }`}
      </p>
      {mail.lastError && <p className="text-sm">{mail.lastError}</p>}
      {mail.state !== 'sent' && mail.recipients && (
        <Button
          variant="secondary"
          className="self-start"
          pending={retry.isPending}
          pendingLabel="Trying…"
          onClick={() => retry.mutate(mail.id)}
        >
          Try again now
        </Button>
      )}
    </li>
  );
}

/** The workshop's outgoing e-mail, newest first, with what still waits at the top. */
export function OutgoingMailList() {
  const outgoing = useOutgoingMail();
  if (outgoing.isPending) return <Loading label="Loading outgoing e-mail…" />;
  if (outgoing.isError)
    return (
      <LoadError error={outgoing.error} what="outgoing e-mail" onRetry={() => outgoing.refetch()} />
    );
  const mail = [...outgoing.data.mail].sort(
    (a, b) => Number(a.state === 'sent') - Number(b.state === 'sent'),
  );
  if (mail.length === 0) return <p className="text-muted">No e-mail has gone out yet.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {mail.map((m) => (
        <MailLine key={m.id} mail={m} />
      ))}
    </ul>
  );
}
