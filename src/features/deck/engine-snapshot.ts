import type { Role } from '../../../shared/auth/auth.schema';
import type { ResolvedPhase } from '../../../shared/programs/resolve-band';
import { orderEvents } from '../../../shared/runs/event-order';
import { liveTimerState, type LiveTimerState } from '../../../shared/runs/live-timer';
import { accountOrdered } from '../../../shared/runs/run-accounting';
import type { Reading, RunEvent } from '../../../shared/runs/run-event.schema';
import type { RunRecord } from '../../lib/db';
import { activeAlerts, upcomingReminders, type DeckAlert, type DeckReminder } from './deck-alerts';
import { runPhases } from './run-phases';

export type PhaseStatus = 'done' | 'current' | 'waiting-for-workshop' | 'to-come';

export interface PhaseRow {
  phase: ResolvedPhase;
  status: PhaseStatus;
  progress: number;
}

/** Everything one engine's panel shows, derived from stored events and `now` only. */
export interface EngineSnapshot {
  run: RunRecord;
  engineId: string;
  phases: ResolvedPhase[];
  live: LiveTimerState;
  phase: ResolvedPhase | null;
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

function phaseRows(phases: ResolvedPhase[], progress: number[], currentIndex: number): PhaseRow[] {
  return phases.map((phase, i) => {
    const done = progress[i] >= 1;
    let status: PhaseStatus = 'to-come';
    if (done) status = 'done';
    else if (i === currentIndex) status = 'current';
    else if (phase.performedBy === 'workshop') status = 'waiting-for-workshop';
    return { phase, status, progress: progress[i] };
  });
}

function lastOf<K extends RunEvent['kind']>(ordered: readonly RunEvent[], kind: K) {
  for (let i = ordered.length - 1; i >= 0; i--)
    if (ordered[i].kind === kind) return ordered[i] as Extract<RunEvent, { kind: K }>;
  return null;
}

export function engineSnapshot(
  run: RunRecord,
  events: readonly RunEvent[],
  nowMs: number,
  role: Role,
): EngineSnapshot {
  const engineId = run.engine.id;
  const phases = runPhases(run);
  const ordered = orderEvents(events, engineId);
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
    phase,
    nextPhase: index >= 0 && index + 1 < phases.length ? phases[index + 1] : null,
    phaseComplete,
    waitingForWorkshop: phase?.performedBy === 'workshop' && role === 'skipper' && !phaseComplete,
    rows: phaseRows(
      phases,
      account.phases.map((p) => p.progressShare),
      index,
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
