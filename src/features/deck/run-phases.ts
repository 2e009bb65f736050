import { resolveProgramPhases, type ResolvedPhase } from '../../../shared/programs/resolve-band';
import { latestReturn } from '../../../shared/runs/live-timer';
import type { RunRecord } from '../../lib/db';

/**
 * The run's phases ready for the timer. The bands frozen into the run at assignment win over a
 * fresh resolution, so the deck shows exactly what the workshop assigned. A phase the workshop
 * sent back carries the moment it was sent back (the re-run rule in shared/runs/phase-tally.ts),
 * so the phone counts the same time as the review and the certificate.
 */
export function runPhases(
  run: Pick<RunRecord, 'program' | 'bands' | 'engine'> & Partial<Pick<RunRecord, 'rerunFrom'>>,
): ResolvedPhase[] {
  // A copy stored before returns existed has no rerunFrom: nothing was sent back then.
  const rerunFrom = run.rerunFrom ?? {};
  return resolveProgramPhases(run.program, run.engine).map((phase) => {
    const countsFromMs = rerunFrom[phase.id];
    return {
      ...phase,
      band: run.bands[phase.id] ?? phase.band,
      ...(countsFromMs !== undefined ? { countsFromMs } : {}),
    };
  });
}

/** Runs that can still be logged on deck: not yet submitted or signed off. */
export const isLoggable = (run: Pick<RunRecord, 'state'>) =>
  run.state === 'planned' || run.state === 'under-way' || run.state === 'returned';

/** The phases the workshop sent back at its latest return (one moment for all), by id. */
export function sentBackIds(phases: readonly ResolvedPhase[]): Set<string> {
  const latest = latestReturn(phases);
  if (latest === null) return new Set();
  return new Set(phases.filter((p) => p.countsFromMs === latest.atMs).map((p) => p.id));
}
