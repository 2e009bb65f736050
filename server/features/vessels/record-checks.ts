import type { EntityManager } from 'typeorm';
import type { RunState } from '../../../shared/runs/run.schema.js';
import { ConflictError } from '../../lib/errors.js';

/*
 * What the vessels feature needs to know about records that build on it (runs, checklists),
 * without importing those features: features import one way (eslint.config.js), and runs and
 * checklists already import vessels. app.ts passes the functions those features export.
 */
export interface VesselRecordChecks {
  /** True when a break-in run on the vessel or the engine is not signed off yet. */
  hasOpenRun(
    manager: EntityManager,
    where: { vesselId: string } | { engineId: string },
  ): Promise<boolean>;
  /** Each engine's commissioning checklist, for the engines that have one. */
  checklistsOf(
    manager: EntityManager,
    engineIds: string[],
  ): Promise<Array<{ engineId: string; completedAt: Date | null }>>;
  /** Each engine's newest break-in run and its state (the deck's vessel picker shows it). */
  latestRunsOf(
    manager: EntityManager,
    engineIds: string[],
  ): Promise<Array<{ engineId: string; runId: string; state: RunState }>>;
}

/** A record with a break-in still open cannot be archived: the run would lose its place. */
export async function refuseOpenRuns(
  checks: VesselRecordChecks,
  manager: EntityManager,
  where: { vesselId: string } | { engineId: string },
  detail: string,
): Promise<void> {
  if (await checks.hasOpenRun(manager, where)) throw new ConflictError(detail);
}
