import type { ReactNode } from 'react';
import type { BoardService } from '../../../../shared/review/views';
import {
  FLAG_WORDS,
  RUN_STATE_WORDS,
  VERDICT_WORDS,
  type BoardFlagCode,
} from '../../../../shared/review/run-words';
import type { Verdict } from '../../../../shared/runs/phase-tally';
import type { RunState } from '../../../../shared/runs/run.schema';
import { Pill } from '../../../components/ui/pill';
import { formatDate } from '../../../lib/format';

/*
 * States and flags are words first; the pill's shape (solid, outlined, quiet) and a symbol say
 * the same again, so nothing depends on colour (glare, night mode, colour blindness).
 */

const STATE_TONE: Record<RunState, 'solid' | 'outline' | 'quiet'> = {
  submitted: 'solid',
  'under-way': 'outline',
  returned: 'outline',
  planned: 'quiet',
  'signed-off': 'quiet',
  cancelled: 'quiet',
};

const STATE_MARK: Record<RunState, string> = {
  submitted: '●',
  'under-way': '▶',
  returned: '↩',
  planned: '○',
  'signed-off': '✓',
  cancelled: '✕',
};

export function RunStatePill({ state }: { state: RunState }) {
  return (
    <Pill tone={STATE_TONE[state]}>
      <span aria-hidden="true">{STATE_MARK[state]}</span>
      {RUN_STATE_WORDS[state]}
    </Pill>
  );
}

const VERDICT_MARK: Record<Verdict, string> = { complete: '✓', incomplete: '…', breached: '▲' };

export function VerdictPill({ verdict }: { verdict: Verdict }) {
  return (
    <Pill tone={verdict === 'breached' ? 'solid' : verdict === 'complete' ? 'outline' : 'quiet'}>
      <span aria-hidden="true">{VERDICT_MARK[verdict]}</span>
      {VERDICT_WORDS[verdict]}
    </Pill>
  );
}

/** A clock face: the app's fonts have no clock symbol, so it is drawn. */
export const ClockMark = () => (
  <svg
    viewBox="0 0 16 16"
    width="14"
    height="14"
    aria-hidden="true"
    focusable="false"
    fill="none"
    stroke="currentColor"
    strokeWidth="2"
    strokeLinecap="round"
  >
    <circle cx="8" cy="8" r="6.5" />
    <path d="M8 4.5V8l2.5 1.5" />
  </svg>
);

const FLAG_MARK: Record<BoardFlagCode, ReactNode> = {
  breach: '▲',
  'clock-skew': <ClockMark />,
  'service-overdue': '⚑',
  'service-due-soon': '⚐',
};

export function FlagList({
  flags,
  breachCount,
}: {
  flags: readonly BoardFlagCode[];
  breachCount: number;
}) {
  if (flags.length === 0) return null;
  return (
    <ul className="flex flex-wrap gap-1" aria-label="Flags">
      {flags.map((flag) => (
        <li key={flag}>
          <Pill tone={flag === 'breach' || flag === 'service-overdue' ? 'solid' : 'outline'}>
            <span aria-hidden="true">{FLAG_MARK[flag]}</span>
            {flag === 'breach' && breachCount > 1
              ? `${breachCount} rules broken`
              : FLAG_WORDS[flag]}
          </Pill>
        </li>
      ))}
    </ul>
  );
}

/** A bar with its figure beside it: the figure is what is read, the bar what is glanced at. */
export function ProgressBar({ share, label }: { share: number; label: string }) {
  const percent = Math.round(Math.min(1, Math.max(0, share)) * 100);
  return (
    <div className="flex min-w-28 items-center gap-2">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-3 flex-1 overflow-hidden rounded-full border-2 border-ink bg-surface"
      >
        <div className="h-full bg-ink" style={{ width: `${percent}%` }} />
      </div>
      <span className="figures w-12 text-right">{percent}%</span>
    </div>
  );
}

/** "at 20.4 h or on 20 Dec 2026"; the state in words when it is near. */
export function FirstServiceText({ service }: { service: BoardService | null }) {
  if (!service) return <span className="text-muted">not recorded</span>;
  if (service.doneOn) return <span>Done on {formatDate(service.doneOn)}</span>;
  const hours =
    service.dueAtHours !== null ? (
      <span className="figures">{service.dueAtHours.toFixed(1)} h</span>
    ) : null;
  const date = service.dueOn ? formatDate(service.dueOn) : null;
  return (
    <span>
      {hours}
      {hours && date && ' or '}
      {date}
      {service.state !== 'not-due' && (
        <strong className="ml-1">({service.state === 'overdue' ? 'overdue' : 'due soon'})</strong>
      )}
      <span className="block text-sm text-muted figures">
        now {service.hoursNow.toFixed(1)} h{service.hoursSource === 'estimated' ? ' (est.)' : ''}
      </span>
    </span>
  );
}
