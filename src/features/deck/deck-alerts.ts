import type { ResolvedPhase } from '../../../shared/programs/resolve-band';
import type { RunEvent } from '../../../shared/runs/run-event.schema';
import {
  bandState,
  OVER_BAND_GRACE_MS,
  type ReasonCode,
  type RunReason,
} from '../../../shared/runs/phase-rules';
import {
  SPEED_CHANGE_MIN_RPM,
  SteadyTracker,
  StretchTracker,
  type Stretch,
} from '../../../shared/runs/stretches';
import { buildTimeline } from '../../../shared/runs/timeline';
import { shortSpan } from './format';

/*
 * What the deck warns about, worked out by the computation core from the stored events:
 * an alert when a phase rule is being broken right now, a reminder shortly before it would be.
 */

export type AlertCode = Exclude<ReasonCode, 'short-of-time'>;
export type ReminderCode =
  'over-band-grace' | 'full-throttle-limit' | 'change-speed-soon' | 'idle-soon';

export interface DeckAlert {
  level: 'alert';
  code: AlertCode;
  title: string;
  /** The core's own words, also kept in the log. */
  message: string;
  /** Start of the stretch the alert is about: one alert is logged per stretch. */
  sinceMs: number;
}

export interface DeckReminder {
  level: 'reminder';
  code: ReminderCode;
  title: string;
  message: string;
  /** Time left before the rule is broken. */
  leftMs: number;
}

const ALERT_TITLES: Record<AlertCode, string> = {
  'over-band': 'Over the band: ease back',
  'full-throttle-too-long': 'Full throttle too long: ease back',
  'full-throttle-too-often': 'Full throttle used up for this hour',
  'no-speed-change': 'Change speed now',
  'idle-too-long': 'Idling too long',
};

/**
 * Rule breaches still going on at `nowMs` (their stretch reaches now), from the reasons the core
 * gives for the current phase when accounted up to `nowMs`.
 */
export function activeAlerts(reasons: readonly RunReason[], nowMs: number): DeckAlert[] {
  return reasons
    .filter(
      (r) => r.code !== 'short-of-time' && r.fromMs !== null && r.toMs !== null && r.toMs >= nowMs,
    )
    .map((r) => ({
      level: 'alert',
      code: r.code as AlertCode,
      title: ALERT_TITLES[r.code as AlertCode],
      message: r.message,
      sinceMs: r.fromMs as number,
    }));
}

/** The stretch still open at `nowMs`, if the tracker kept one. */
const openAt = (kept: readonly Stretch[], nowMs: number) => {
  const last = kept[kept.length - 1];
  return last !== undefined && last.toMs >= nowMs ? last.toMs - last.fromMs : null;
};

/** Current stretches of the phase (over the band, full throttle, one speed, idling) up to now. */
function currentStretches(ordered: readonly RunEvent[], phase: ResolvedPhase, nowMs: number) {
  const burstsAllowed = phase.rules.fullThrottleMaxSeconds !== undefined;
  const over = new StretchTracker(0);
  const full = new StretchTracker(0);
  const idle = new StretchTracker(0);
  const steady = new SteadyTracker(0);
  for (const s of buildTimeline(ordered, { untilMs: nowMs }).segments) {
    if (s.phaseId !== phase.id) continue;
    const isOver =
      bandState(s.rpm, s.throttle, phase) === 'over' && !(burstsAllowed && s.throttle === 'full');
    over.add(s.fromMs, s.toMs, isOver);
    full.add(s.fromMs, s.toMs, s.throttle === 'full');
    idle.add(s.fromMs, s.toMs, s.throttle === 'idle');
    steady.add(s.fromMs, s.toMs, s.rpm, s.throttle !== 'idle');
  }
  for (const tracker of [over, full, idle, steady]) tracker.close();
  return {
    overMs: openAt(over.kept, nowMs),
    fullMs: openAt(full.kept, nowMs),
    idleMs: openAt(idle.kept, nowMs),
    steadyMs: openAt(steady.kept, nowMs),
  };
}

/** Within `leadMs` of the limit (and not past it): the time left, else null. */
const soon = (heldMs: number | null, limitMs: number | undefined, leadMs: number) =>
  heldMs !== null && limitMs !== undefined && heldMs < limitMs && heldMs >= limitMs - leadMs
    ? limitMs - heldMs
    : null;

/**
 * Reminders before a rule is broken. How early they come is our own choice (a third of the
 * limit, at most 3 minutes for speed changes and 2 for idling); not a trade figure.
 */
export function upcomingReminders(
  ordered: readonly RunEvent[],
  phase: ResolvedPhase | null,
  nowMs: number,
): DeckReminder[] {
  if (phase === null) return [];
  const { overMs, fullMs, idleMs, steadyMs } = currentStretches(ordered, phase, nowMs);
  const { changeSpeedEveryMinutes, fullThrottleMaxSeconds, idleMaxMinutes } = phase.rules;
  const changeMs =
    changeSpeedEveryMinutes === undefined ? undefined : changeSpeedEveryMinutes * 60_000;
  const idleMaxMs = idleMaxMinutes === undefined ? undefined : idleMaxMinutes * 60_000;
  const fullMaxMs =
    fullThrottleMaxSeconds === undefined ? undefined : fullThrottleMaxSeconds * 1000;
  const reminders: DeckReminder[] = [];
  const add = (code: ReminderCode, title: string, message: string, leftMs: number | null) => {
    if (leftMs !== null)
      reminders.push({
        level: 'reminder',
        code,
        title,
        message: message.replace('{left}', shortSpan(leftMs)),
        leftMs,
      });
  };
  add(
    'over-band-grace',
    'Over the band',
    'Ease back within {left}, or it counts against this phase.',
    soon(overMs, OVER_BAND_GRACE_MS, OVER_BAND_GRACE_MS),
  );
  add(
    'full-throttle-limit',
    'Full throttle',
    'Ease back within {left}: bursts are short in this phase.',
    soon(fullMs, fullMaxMs, fullMaxMs ?? 0),
  );
  add(
    'change-speed-soon',
    'Vary your speed',
    `Change speed (${SPEED_CHANGE_MIN_RPM} rpm or more) within {left}.`,
    soon(steadyMs, changeMs, Math.min(3 * 60_000, (changeMs ?? 0) / 3)),
  );
  add(
    'idle-soon',
    'Idling',
    'Open up or stop the engine within {left}.',
    soon(idleMs, idleMaxMs, Math.min(2 * 60_000, (idleMaxMs ?? 0) / 3)),
  );
  return reminders;
}
