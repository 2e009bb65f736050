import type { Role } from '../../../shared/auth/auth.schema';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band';
import { orderEvents } from '../../../shared/runs/event-order';
import { liveTimerState, type LiveTimerState } from '../../../shared/runs/live-timer';
import { accountOrdered, type RunAccount } from '../../../shared/runs/run-accounting';
import type { Reading, RunEvent } from '../../../shared/runs/run-event.schema';
import { withoutVoided } from '../../../shared/runs/voids';
import type { RunRecord } from '../../lib/db';
import { activeAlerts, upcomingReminders, type DeckAlert, type DeckReminder } from './deck-alerts';
import { isLoggable, runPhases, sentBackIds } from './run-phases';

export type PhaseStatus = 'done' | 'current' | 'waiting-for-workshop' | 'to-come';

export interface PhaseRow {
  phase: ResolvedPhase;
  status: PhaseStatus;
  progress: number;
  /** After a return: 'again' for a phase sent back to be run again, 'stands' for the others. */
  rerun: 'again' | 'stands' | null;
}

/** Everything one engine's panel shows, derived from stored events and `now` only. */
export interface EngineSnapshot {
  run: RunRecord;
  engineId: string;
  phases: ResolvedPhase[];
  live: LiveTimerState;
  /** Every phase's account so far (voided entries left out), as the review will count it. */
  account: RunAccount;
  phase: ResolvedPhase | null;
  /** The phase to move on to; after a return, only a later phase that was sent back. */
  nextPhase: ResolvedPhase | null;
  /** The current phase has its time in band: the app proposes the next one. */
  phaseComplete: boolean;
  /** A workshop phase a skipper cannot log: shown as waiting. */
  waitingForWorkshop: boolean;
  rows: PhaseRow[];
  alerts: DeckAlert[];
  reminders: DeckReminder[];
  lastReading: Reading | null;
  /** Alert codes already logged for stretches that began at or before their log time. */
  loggedAlerts: Array<{ code: string; at: number }>;
}

function phaseRows(
  phases: ResolvedPhase[],
  progress: number[],
  currentIndex: number,
  sentBack: Set<string>,
): PhaseRow[] {
  return phases.map((phase, i) => {
    const done = progress[i] >= 1;
    let status: PhaseStatus = 'to-come';
    if (done) status = 'done';
    else if (i === currentIndex) status = 'current';
    else if (phase.performedBy === 'workshop') status = 'waiting-for-workshop';
    const rerun = sentBack.size === 0 ? null : sentBack.has(phase.id) ? 'again' : 'stands';
    return { phase, status, progress: progress[i], rerun };
  });
}

function lastOf<K extends RunEvent['kind']>(ordered: readonly RunEvent[], kind: K) {
  for (let i = ordered.length - 1; i >= 0; i--)
    if (ordered[i].kind === kind) return ordered[i] as Extract<RunEvent, { kind: K }>;
  return null;
}

/** The phase after `index`; after a return only the phases sent back are run, in program order. */
function phaseAfter(phases: ResolvedPhase[], index: number): ResolvedPhase | null {
  if (index < 0) return null;
  const sentBack = sentBackIds(phases);
  const later = phases.slice(index + 1);
  if (sentBack.size === 0) return later[0] ?? null;
  return later.find((p) => sentBack.has(p.id)) ?? null;
}

export function engineSnapshot(
  run: RunRecord,
  events: readonly RunEvent[],
  nowMs: number,
  role: Role,
): EngineSnapshot {
  const engineId = run.engine.id;
  const phases = runPhases(run);
  // What was voided is left out everywhere: the timer, the last reading, the reminders.
  const ordered = withoutVoided(orderEvents(events, engineId));
  const live = liveTimerState(ordered, phases, nowMs);
  const index = live.currentPhaseIndex;
  const phase = index >= 0 ? phases[index] : null;
  const { account } = accountOrdered(ordered, phases, { untilMs: live.nowMs });
  const phaseComplete = index >= 0 && account.phases[index].progressShare >= 1;
  return {
    run,
    engineId,
    phases,
    live,
    account,
    phase,
    nextPhase: phaseAfter(phases, index),
    phaseComplete,
    waitingForWorkshop: phase?.performedBy === 'workshop' && role === 'skipper' && !phaseComplete,
    rows: phaseRows(
      phases,
      account.phases.map((p) => p.progressShare),
      index,
      sentBackIds(phases),
    ),
    alerts: index >= 0 ? activeAlerts(account.phases[index].reasons, live.nowMs) : [],
    reminders: upcomingReminders(ordered, phase, live.nowMs),
    lastReading: lastOf(ordered, 'reading'),
    loggedAlerts: ordered.flatMap((e) => (e.kind === 'alert' ? [{ code: e.code, at: e.at }] : [])),
  };
}

/** Alerts not yet in the log: one alert event per broken-rule stretch. */
export const alertsToLog = (snapshot: EngineSnapshot): DeckAlert[] =>
  snapshot.alerts.filter(
    (alert) =>
      !snapshot.loggedAlerts.some(
        (logged) => logged.code === alert.code && logged.at >= alert.sinceMs,
      ),
  );

/**
 * Whether this user has something to do on deck with this engine: log the current phase, move
 * on to a next phase they run, or (every phase done) finish and submit.
 */
export function canWorkOn(snapshot: EngineSnapshot, role: Role): boolean {
  if (!isLoggable(snapshot.run) || snapshot.phase === null) return false;
  if (role !== 'skipper') return true;
  if (snapshot.waitingForWorkshop) return false;
  if (!snapshot.phaseComplete) return true;
  return snapshot.nextPhase === null || snapshot.nextPhase.performedBy !== 'workshop';
}
