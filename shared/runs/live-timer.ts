import type { RpmBand } from '../programs/phase-band.schema';
import type { ResolvedPhase } from '../programs/resolve-band';
import { orderEvents } from './event-order';
import { bandState } from './phase-rules';
import { withoutVoided } from './voids';
import { accountOrdered, type AccountingOptions } from './run-accounting';
import type { Reading, RunEvent } from './run-event.schema';
import type { TimelineEnd } from './timeline';

/*
 * The live timer is a pure function of the stored events and `now`: it never counts ticks, so
 * a reload, a killed app or a phone that slept shows the same figures as one left running.
 * An open session counts its last reading up to min(now, reading + maxHold).
 */

export type LiveState = 'in-band' | 'over' | 'under' | 'stopped' | 'paused';

export interface LiveTimerState {
  /** The `now` actually used: never earlier than the newest stored event. */
  nowMs: number;
  /** How far the device clock was behind the newest event (0 when it was not). */
  clockBehindMs: number;
  currentPhaseId: string | null;
  currentPhaseIndex: number;
  band: RpmBand | null;
  /** stopped: no session open; paused: session open but no reading holds right now. */
  state: LiveState;
  phaseDoneMs: number;
  phaseLeftMs: number;
  phaseProgress: number;
  overallProgress: number;
  /** Wall time since the open session started; 0 when stopped. */
  sessionElapsedMs: number;
  /** The reading in force, and when it stops counting unless a new one is logged. */
  heldReading: { reading: Reading; holdEndsMs: number } | null;
}

/** The latest moment the workshop sent phases back, and the first phase it sent back then. */
export function latestReturn(
  phases: readonly ResolvedPhase[],
): { atMs: number; index: number } | null {
  let found: { atMs: number; index: number } | null = null;
  phases.forEach((p, index) => {
    if (p.countsFromMs !== undefined && (found === null || p.countsFromMs > found.atMs))
      found = { atMs: p.countsFromMs, index };
  });
  return found;
}

/**
 * The phase the skipper is on: named by the newest phase-advance or reading that names a phase
 * of this program; the first phase before any. After a return, what was logged before it no
 * longer decides: the skipper starts again on the first phase sent back.
 */
function currentPhaseIndex(ordered: readonly RunEvent[], phases: readonly ResolvedPhase[]): number {
  const indexById = new Map(phases.map((p, i) => [p.id, i]));
  const returned = latestReturn(phases);
  for (let i = ordered.length - 1; i >= 0; i--) {
    const event = ordered[i];
    if (returned !== null && event.at < returned.atMs) break;
    if (event.kind !== 'reading' && event.kind !== 'phase-advance') continue;
    const index = indexById.get(event.phaseId);
    if (index !== undefined) return index;
  }
  if (returned !== null) return returned.index;
  return phases.length > 0 ? 0 : -1;
}

function liveState(
  timeline: TimelineEnd,
  phases: readonly ResolvedPhase[],
  nowMs: number,
): LiveState {
  if (timeline.openSessionFromMs === null) return 'stopped';
  const held = timeline.heldAtEnd;
  if (held === null || nowMs >= held.holdEndsMs) return 'paused';
  const phase = phases.find((p) => p.id === held.reading.phaseId);
  return phase === undefined ? 'paused' : bandState(held.reading.rpm, held.reading.throttle, phase);
}

export function liveTimerState(
  events: readonly RunEvent[],
  phases: readonly ResolvedPhase[],
  nowMs: number,
  options: Omit<AccountingOptions, 'untilMs'> = {},
): LiveTimerState {
  const ordered = withoutVoided(orderEvents(events, options.engineId));
  const newestMs = ordered.length > 0 ? ordered[ordered.length - 1].at : nowMs;
  // A clock set back must not make time run backwards or go negative: hold at the newest event.
  const now = Math.max(nowMs, newestMs);
  const { account, end: timeline } = accountOrdered(ordered, phases, {
    maxHoldMs: options.maxHoldMs,
    untilMs: now,
  });
  const index = currentPhaseIndex(ordered, phases);
  const phase = index >= 0 ? account.phases[index] : undefined;
  const state = liveState(timeline, phases, now);
  return {
    nowMs: now,
    clockBehindMs: now - nowMs,
    currentPhaseId: phase?.phaseId ?? null,
    currentPhaseIndex: index,
    band: index >= 0 ? phases[index].band : null,
    state,
    phaseDoneMs: phase?.timeInBandMs ?? 0,
    phaseLeftMs: phase === undefined ? 0 : Math.max(0, phase.requiredMs - phase.timeInBandMs),
    phaseProgress: phase?.progressShare ?? 0,
    overallProgress: account.overallProgress,
    sessionElapsedMs: timeline.openSessionFromMs === null ? 0 : now - timeline.openSessionFromMs,
    heldReading: state === 'stopped' || state === 'paused' ? null : timeline.heldAtEnd,
  };
}
