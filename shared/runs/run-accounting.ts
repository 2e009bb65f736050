import type { ResolvedPhase } from '../programs/resolve-band';
import { orderEvents } from './event-order';
import { PhaseTally, type PhaseAccount, type Verdict } from './phase-tally';
import type { Reading, RunEvent } from './run-event.schema';
import { withoutVoided } from './voids';
import { walkTimeline, type TimelineEnd, type TimelineOptions } from './timeline';

// How time is attributed to phases is set out at the top of timeline.ts; how a voided entry
// drops out, at the top of voids.ts; how a phase sent back to be run again counts, at the top
// of phase-tally.ts.

export type { PhaseAccount, Verdict } from './phase-tally';

export interface RunAccount {
  verdict: Verdict;
  phases: PhaseAccount[];
  /** Required time done across all phases, each phase capped at its requirement. */
  overallProgress: number;
  /** Wall time inside sessions. */
  sessionMs: number;
  /** Time on readings naming a phase the program does not have. */
  unassignedMs: number;
}

export interface AccountingOptions extends TimelineOptions {
  /** Only this engine's events count; twin engines share a device log. */
  engineId?: string;
}

export function runVerdict(phases: readonly PhaseAccount[]): Verdict {
  if (phases.some((p) => p.verdict === 'breached')) return 'breached';
  return phases.every((p) => p.verdict === 'complete') ? 'complete' : 'incomplete';
}

/** Accounts events already in (at, id) order, voided entries left out; also returns how the timeline ended. */
export function accountOrdered(
  all: readonly RunEvent[],
  phases: readonly ResolvedPhase[],
  options: TimelineOptions = {},
): { account: RunAccount; end: TimelineEnd } {
  const ordered = withoutVoided(all);
  const tallies = new Map(phases.map((p) => [p.id, new PhaseTally(p)]));
  let unassignedMs = 0;
  // Readings of one phase come in long runs, so remember the last lookup.
  let lastPhaseId: string | null = null;
  let lastTally: PhaseTally | undefined;
  const end = walkTimeline(ordered, options, (reading: Reading, toMs: number) => {
    if (reading.phaseId !== lastPhaseId) {
      lastPhaseId = reading.phaseId;
      lastTally = tallies.get(reading.phaseId);
    }
    if (lastTally === undefined) unassignedMs += toMs - reading.at;
    else lastTally.add(reading.at, toMs, reading.rpm, reading.throttle);
  });
  const accounts = phases.map((p) => tallies.get(p.id)!.finish());
  const required = phases.reduce((sum, p) => sum + p.requiredMs, 0);
  const done = accounts.reduce((sum, a) => sum + Math.min(a.timeInBandMs, a.requiredMs), 0);
  const account: RunAccount = {
    verdict: runVerdict(accounts),
    phases: accounts,
    overallProgress: required > 0 ? done / required : 0,
    sessionMs: end.sessions.reduce((sum, s) => sum + (s.toMs - s.fromMs), 0),
    unassignedMs,
  };
  return { account, end };
}

/** One engine's run accounted from its stored events, in any order, copies and all. */
export function accountRun(
  events: readonly RunEvent[],
  phases: readonly ResolvedPhase[],
  options: AccountingOptions = {},
): RunAccount {
  return accountOrdered(orderEvents(events, options.engineId), phases, options).account;
}
