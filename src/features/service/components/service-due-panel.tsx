import type { ReactNode } from 'react';
import type { FirstServiceView } from '../../../../shared/review/first-service';
import type { EngineServiceView } from '../../../../shared/service/service-views';
import { Pill } from '../../../components/ui/pill';
import { formatDate, formatHours } from '../../../lib/format';
import { firstServiceCalendarUrl } from '../api';

const STATE_WORDS = { 'not-due': 'Not due yet', 'due-soon': 'Due soon', overdue: 'Overdue' };
const STATE_MARK = { 'not-due': '○', 'due-soon': '◐', overdue: '▲' };

/** The state as a word and a shape, never colour alone. */
export function ServiceStatePill({ status }: { status: Pick<FirstServiceView, 'state'> }) {
  return (
    <Pill
      tone={
        status.state === 'overdue' ? 'solid' : status.state === 'due-soon' ? 'outline' : 'quiet'
      }
    >
      <span aria-hidden="true">{STATE_MARK[status.state]}</span>
      {STATE_WORDS[status.state]}
    </Pill>
  );
}

/** "at 22.0 h or on 27 Dec 2026": the limits that count. */
export function dueWords(due: { dueAtHours: number | null; dueOn: string | null }): string {
  const parts = [
    due.dueAtHours === null ? null : `at ${formatHours(due.dueAtHours)} h on the hour meter`,
    due.dueOn === null ? null : `on ${formatDate(due.dueOn)}`,
  ].filter(Boolean);
  return parts.length === 2 ? `${parts.join(' or ')}, whichever comes first` : parts.join('');
}

function Workings({ lines }: { lines: string[] }) {
  return (
    <details className="rounded-md border-2 border-line p-3" open>
      <summary className="min-h-touch cursor-pointer font-semibold">
        How this was worked out
      </summary>
      <ol className="mt-2 flex list-decimal flex-col gap-1 pl-5">
        {lines.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ol>
    </details>
  );
}

function DoneSummary({ view }: { view: EngineServiceView }) {
  const done = view.firstServiceDone!;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-lg">
        <strong>First service done</strong> on {formatDate(done.date)} at{' '}
        <span className="figures">{formatHours(done.hourMeter)} h</span>, by {done.doneBy}.
      </p>
      {done.notes && <p className="whitespace-pre-line">{done.notes}</p>}
      <p className="text-sm text-muted">
        Recorded by {done.recordedBy.name} on {formatDate(done.recordedAt)}.
      </p>
      {view.nextService && (
        <p className="flex flex-wrap items-center gap-2">
          <span>Next service {dueWords(view.nextService)}.</span>
          <ServiceStatePill status={view.nextService} />
        </p>
      )}
    </div>
  );
}

function DueSummary({ view }: { view: EngineServiceView }) {
  const due = view.firstService;
  if (!due) return <p>{view.reason}</p>;
  return (
    <div className="flex flex-col gap-2">
      <p className="flex flex-wrap items-center gap-2 text-lg">
        <span>Due {dueWords(due)}.</span>
        <ServiceStatePill status={due} />
      </p>
      {due.dueOn && (
        <a
          href={firstServiceCalendarUrl(view.engine.id)}
          download
          className="flex min-h-touch items-center self-start underline underline-offset-4"
        >
          Add the first service to a calendar (.ics file)
        </a>
      )}
      {view.reminder && (
        <p className="text-sm text-muted">
          Reminder e-mailed on {formatDate(view.reminder.sentAt)}
          {view.reminder.recipients.length > 0 && ` to ${view.reminder.recipients.join(', ')}`}.
        </p>
      )}
    </div>
  );
}

/** The first service of an engine: due (with its working) or done, then what comes next. */
export function ServiceDuePanel({
  view,
  children,
}: {
  view: EngineServiceView;
  children?: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-4">
      {view.firstServiceDone ? <DoneSummary view={view} /> : <DueSummary view={view} />}
      <Workings lines={view.workings} />
      {children}
    </div>
  );
}
