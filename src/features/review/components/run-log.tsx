import { useState } from 'react';
import { AUDIT_ACTION_WORDS } from '../../../../shared/review/audit-words';
import type { LoggedEvent, ReviewPhase, RunReviewView } from '../../../../shared/review/views';
import { Button } from '../../../components/ui/button';
import { formatMoment } from '../format';

const SHOWN = 40;

function eventWords(
  event: LoggedEvent,
  phaseName: (id: string) => string,
): { mark: string; text: string } {
  switch (event.kind) {
    case 'session-start':
      return { mark: '▶', text: 'Outing started' };
    case 'session-stop':
      return { mark: '■', text: 'Outing ended' };
    case 'phase-advance':
      return { mark: '→', text: `Moved on to “${phaseName(event.phaseId)}”` };
    case 'alert':
      return { mark: '▲', text: `Alert on the device: ${event.message}` };
    case 'note':
      return { mark: '✎', text: event.text };
  }
}

function EventItem({
  event,
  phaseName,
}: {
  event: LoggedEvent;
  phaseName: (id: string) => string;
}) {
  const { mark, text } = eventWords(event, phaseName);
  return (
    <li className="flex gap-3 py-2">
      <span className="figures w-40 shrink-0 text-sm text-muted">{formatMoment(event.at)}</span>
      <span aria-hidden="true" className="w-4 font-bold">
        {mark}
      </span>
      <span
        className={event.kind === 'note' || event.kind === 'alert' ? 'font-semibold' : undefined}
      >
        {text}
      </span>
    </li>
  );
}

/** Notes, alerts, outings and phase changes as they happened (device time). */
export function EventList({
  events,
  total,
  phases,
}: {
  events: LoggedEvent[];
  total: number;
  phases: ReviewPhase[];
}) {
  const [all, setAll] = useState(false);
  const name = (id: string) => phases.find((p) => p.id === id)?.name ?? id;
  const list = all ? events : events.slice(-SHOWN);
  if (events.length === 0) return <p className="text-muted">Nothing logged yet.</p>;
  return (
    <div className="flex flex-col gap-2">
      {total > events.length && (
        <p className="text-sm text-muted">
          The newest {events.length} of {total} entries.
        </p>
      )}
      {!all && events.length > SHOWN && (
        <Button variant="quiet" className="self-start" onClick={() => setAll(true)}>
          Show all {events.length} entries
        </Button>
      )}
      <ol className="flex flex-col divide-y divide-line">
        {list.map((event) => (
          <EventItem key={event.id} event={event} phaseName={name} />
        ))}
      </ol>
    </div>
  );
}

/** Who did what to the run, and when (workshop only). */
export function AuditTrail({ trail }: { trail: RunReviewView['trail'] }) {
  if (trail.length === 0) return <p className="text-muted">Nothing recorded yet.</p>;
  return (
    <ol className="flex flex-col divide-y divide-line" aria-label="Audit trail">
      {trail.map((entry, i) => (
        <li key={i} className="flex flex-col gap-0.5 py-2 sm:flex-row sm:gap-3">
          <span className="figures w-44 shrink-0 text-sm text-muted">{formatMoment(entry.at)}</span>
          <span>
            <strong>{AUDIT_ACTION_WORDS[entry.action] ?? entry.action}</strong> by {entry.actorName}
            {entry.detail && <span className="text-muted"> — {entry.detail}</span>}
          </span>
        </li>
      ))}
    </ol>
  );
}
