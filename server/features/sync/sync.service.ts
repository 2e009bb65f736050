import { randomUUID } from 'node:crypto';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import {
  CLOCK_SKEW_FLAG_MS,
  type PushBatch,
  type PushItem,
  type PullResponse,
  type PushResult,
} from '../../../shared/sync/sync.schema.js';
import type { RunEvent, VoidEvent } from '../../../shared/runs/run-event.schema.js';
import type { Clock } from '../../lib/clock.js';
import { NotFoundError, ValidationError } from '../../lib/errors.js';
import type { VoidInput } from '../../../shared/review/review.schema.js';
import { visibleRunsWhere } from '../runs/run-access.js';
import { visibleVesselIds } from '../vessels/vessel-access.js';
import { Run } from '../runs/run.entity.js';
import { toRunDetail } from '../runs/runs.service.js';
import { Vessel } from '../vessels/vessel.entity.js';
import type { VesselsService } from '../vessels/vessels.service.js';
import { applyItems, type Applied } from './apply-items.js';
import { checkItems, namedRunIds, refuseUnseenRuns } from './check-items.js';
import { latestChangeSeq, reserveChangeSeq } from '../../lib/change-seq.js';

/**
 * A skipper's device holds all of their runs (they want to see verdicts and comments); a staff
 * device only the runs still being logged, which is what the workshop runs on deck. The
 * workshop reviews everything else online.
 */
const STAFF_DEVICE_STATES = ['planned', 'under-way', 'returned'] as const;

export class SyncService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly vessels: VesselsService,
  ) {}

  /**
   * Everything visible that changed after `cursor`: events in change order (at most `limit`),
   * the runs that changed, and always the list of visible runs and vessels, so a device notices
   * a run it may no longer see or one newly shared with it.
   */
  async pull(user: SessionUser, cursor: number, limit: number): Promise<PullResponse> {
    const where = {
      ...(await visibleRunsWhere(this.dataSource, user)),
      ...(user.role === 'skipper' ? {} : { state: In([...STAFF_DEVICE_STATES]) }),
    };
    const visible = await this.dataSource
      .getRepository(Run)
      .find({ where, select: { id: true, seq: true } });
    const events = await this.changedEvents(
      user,
      visible.map((r) => r.id),
      cursor,
      limit,
    );
    const more = events.length === limit;
    const latest = await latestChangeSeq(this.dataSource);
    const nextCursor = more ? events[events.length - 1].seq : latest;
    const changedIds = visible
      .filter((r) => cursor === 0 || (r.seq > cursor && r.seq <= nextCursor))
      .map((r) => r.id);
    const runs = await this.runsWithEngines(changedIds);
    const names = await this.vesselNames(user.workshopId);
    return {
      cursor: nextCursor,
      more,
      runIds: visible.map((r) => r.id),
      runs: runs.map((run) => toRunDetail(run, names.get(run.vesselId) ?? '')),
      events: events.map(({ runId, receivedAt, body }) => ({
        runId,
        receivedAt,
        event: JSON.parse(body) as RunEvent,
      })),
      vessels: await this.vessels.listFor(user),
    };
  }

  private async runsWithEngines(ids: string[]): Promise<Run[]> {
    if (ids.length === 0) return [];
    return this.dataSource
      .getRepository(Run)
      .find({ where: { id: In(ids) }, relations: { engine: true } });
  }

  private async vesselNames(workshopId: string): Promise<Map<string, string>> {
    const vessels = await this.dataSource
      .getRepository(Vessel)
      .find({ where: { workshopId }, select: { id: true, name: true } });
    return new Map(vessels.map((v) => [v.id, v.name]));
  }

  private async changedEvents(user: SessionUser, runIds: string[], cursor: number, limit: number) {
    if (runIds.length === 0) return [];
    type Row = { runId: string; receivedAt: number; body: string; seq: number };
    // Staff devices carry the workshop's open runs; a subquery keeps the parameter list short.
    if (user.role !== 'skipper') {
      const states = STAFF_DEVICE_STATES.map(() => '?').join(', ');
      return this.dataSource.query<Row[]>(
        `SELECT "runId", "receivedAt", "body", "seq" FROM "run_event" WHERE "runId" IN (SELECT "id" FROM "run" WHERE "workshopId" = ? AND "state" IN (${states})) AND "seq" > ? ORDER BY "seq" LIMIT ?`,
        [user.workshopId, ...STAFF_DEVICE_STATES, cursor, limit],
      );
    }
    const marks = runIds.map(() => '?').join(', ');
    return this.dataSource.query<Row[]>(
      `SELECT "runId", "receivedAt", "body", "seq" FROM "run_event" WHERE "runId" IN (${marks}) AND "seq" > ? ORDER BY "seq" LIMIT ?`,
      [...runIds, cursor, limit],
    );
  }

  /**
   * Applies a batch in one transaction. An item naming a run the user may not see (another
   * skipper's, another workshop's, unlinked since, or none at all) is refused by name, with
   * the same words in each case so nothing is told about other people's runs; the rest of the
   * batch goes on, so a skipper unlinked from one boat keeps the readings of the others.
   */
  async push(
    user: SessionUser,
    batch: PushBatch,
  ): Promise<{ results: PushResult[]; serverTime: number }> {
    const parsed = await checkItems(batch.items);
    const runs = await this.visibleAmong(user, namedRunIds(parsed));
    const checked = refuseUnseenRuns(parsed, runs);
    const valid = checked.filter((c): c is { index: number; item: PushItem } => 'item' in c);
    const now = this.clock.now().getTime();
    const skewMs = batch.sentAt - now;
    const applied = await this.dataSource.transaction(async (manager) => {
      const result = await applyItems(manager, {
        user,
        runs,
        items: valid.map((c) => c.item),
        now,
      });
      await this.saveTouchedRuns(
        manager,
        result,
        Math.abs(skewMs) > CLOCK_SKEW_FLAG_MS ? skewMs : null,
      );
      return result;
    });
    const byIndex = new Map(valid.map((c, i) => [c.index, applied.results[i]]));
    return {
      results: checked.map((c) => ('rejected' in c ? c.rejected : byIndex.get(c.index)!)),
      serverTime: now,
    };
  }

  /**
   * A technician or manager takes back an entry from the review page: the same void a device
   * would send, made here with the server's clock, through the same checks and trail.
   */
  async voidEntry(user: SessionUser, runId: string, input: VoidInput): Promise<{ id: string }> {
    const run = (await this.loadVisibleRuns(user, [runId])).get(runId)!;
    const event: VoidEvent = {
      kind: 'void',
      id: randomUUID(),
      at: this.clock.now().getTime(),
      engineId: run.engineId,
      targetId: input.targetId,
      reason: input.reason,
    };
    const { results } = await this.push(user, {
      deviceId: randomUUID(),
      sentAt: event.at,
      items: [{ type: 'event', runId, event }],
    });
    const [result] = results;
    if (result.status === 'rejected') {
      const field = result.field === 'event.targetId' ? 'targetId' : (result.field ?? 'targetId');
      throw new ValidationError([{ field, message: result.reason! }], result.reason);
    }
    return { id: event.id };
  }

  private async loadVisibleRuns(user: SessionUser, runIds: string[]): Promise<Map<string, Run>> {
    const allowed = await this.visibleAmong(user, runIds);
    const missing = runIds.find((id) => !allowed.has(id));
    if (missing) throw new NotFoundError('run', missing);
    return allowed;
  }

  private async visibleAmong(user: SessionUser, runIds: string[]): Promise<Map<string, Run>> {
    const runs =
      runIds.length === 0
        ? []
        : await this.dataSource
            .getRepository(Run)
            .find({ where: { id: In(runIds), workshopId: user.workshopId } });
    const visible = await visibleVesselIds(this.dataSource.manager, user);
    return new Map(
      runs.filter((r) => visible === 'all' || visible.includes(r.vesselId)).map((r) => [r.id, r]),
    );
  }

  /** Touched runs get a new change number so other devices and the workshop pull the change. */
  private async saveTouchedRuns(manager: EntityManager, applied: Applied, skewMs: number | null) {
    for (const run of applied.touched) {
      if (skewMs !== null && Math.abs(skewMs) > Math.abs(run.clockSkewMs ?? 0))
        run.clockSkewMs = skewMs;
      run.seq = await reserveChangeSeq(manager);
      await manager.getRepository(Run).update(
        { id: run.id },
        {
          state: run.state,
          submittedAt: run.submittedAt,
          submitNote: run.submitNote,
          currentPhaseId: run.currentPhaseId,
          notes: run.notes,
          clockSkewMs: run.clockSkewMs,
          lastEventAt: run.lastEventAt,
          seq: run.seq,
        },
      );
    }
  }
}
