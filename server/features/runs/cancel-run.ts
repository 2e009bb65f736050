import type { DataSource } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { RUN_STATE_WORDS } from '../../../shared/review/run-words.js';
import type { CancelRunInput } from '../../../shared/runs/run.schema.js';
import { reserveChangeSeq } from '../../lib/change-seq.js';
import { systemClock, type Clock } from '../../lib/clock.js';
import { ConflictError, NotFoundError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import { Run } from './run.entity.js';

/*
 * A program assigned to the wrong engine, or the wrong program, is taken back by cancelling the
 * run while it is still planned: nothing has been logged on it, so nothing is lost. The run stays
 * (state 'cancelled', the reason in its trail) and no longer counts as the engine's open run, so
 * another program can be assigned. Once logging has started a run is corrected by voids instead.
 */
export class RunCancellation {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock = systemClock,
  ) {}

  async cancel(user: SessionUser, runId: string, input: CancelRunInput): Promise<Run> {
    return this.dataSource.transaction(async (manager) => {
      const repo = manager.getRepository(Run);
      // Read inside the transaction: a device's first reading may have just moved it on.
      const run = await repo.findOne({ where: { id: runId, workshopId: user.workshopId } });
      if (!run) throw new NotFoundError('run', runId);
      if (run.state !== 'planned') {
        throw new ConflictError(
          `Only a planned run can be cancelled; this one is "${RUN_STATE_WORDS[run.state]}".`,
          [
            {
              field: 'state',
              message: `This run is "${RUN_STATE_WORDS[run.state]}", not "Planned"; it cannot be cancelled.`,
            },
          ],
        );
      }
      const seq = await reserveChangeSeq(manager);
      await repo.update({ id: run.id }, { state: 'cancelled', currentPhaseId: null, seq });
      await recordAudit(manager, {
        workshopId: user.workshopId,
        recordType: 'run',
        recordId: run.id,
        action: 'run-cancelled',
        actor: { id: user.id, name: user.name },
        at: this.clock.now(),
        detail: input.reason,
      });
      return repo.findOneOrFail({ where: { id: run.id } });
    });
  }
}
