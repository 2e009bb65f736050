import { resolveProgramPhases, type ResolvedPhase } from '../../../shared/programs/resolve-band';
import type { RunRecord } from '../../lib/db';

/**
 * The run's phases ready for the timer. The bands frozen into the run at assignment win over a
 * fresh resolution, so the deck shows exactly what the workshop assigned.
 */
export function runPhases(run: Pick<RunRecord, 'program' | 'bands' | 'engine'>): ResolvedPhase[] {
  return resolveProgramPhases(run.program, run.engine).map((phase) => ({
    ...phase,
    band: run.bands[phase.id] ?? phase.band,
  }));
}

/** Runs that can still be logged on deck: not yet submitted or signed off. */
export const isLoggable = (run: Pick<RunRecord, 'state'>) =>
  run.state === 'planned' || run.state === 'under-way' || run.state === 'returned';
