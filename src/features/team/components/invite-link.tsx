import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { formatDate } from '../../../lib/format';
import { roleLabel, type SentInvite } from '../api';

/** The link of a new invite, ready to copy (sending it by e-mail comes in a later version). */
export function InviteLink({ sent }: { sent: SentInvite }) {
  const id = useId();
  const [copied, setCopied] = useState(false);
  const href = new URL(sent.link, window.location.origin).href;

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(href);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  };

  return (
    <section
      aria-label="Invite created"
      className="rounded-md border-2 border-ink bg-paper p-3"
      role="status"
    >
      <p className="font-semibold">
        Invite created for {sent.invite.email} ({roleLabel[sent.invite.role]}), valid until{' '}
        {formatDate(sent.invite.expiresAt)}.
      </p>
      <p className="text-muted">
        Pass this link on; whoever opens it sets a password and joins the workshop.
      </p>
      <label htmlFor={id} className="mt-2 block font-semibold">
        Invite link
      </label>
      <div className="flex flex-col gap-2 sm:flex-row">
        <input
          id={id}
          readOnly
          value={href}
          className={`${controlClass} figures`}
          onFocus={(e) => e.currentTarget.select()}
        />
        <Button variant="secondary" onClick={copy}>
          {copied ? 'Copied' : 'Copy link'}
        </Button>
      </div>
    </section>
  );
}
