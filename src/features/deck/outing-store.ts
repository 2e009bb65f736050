import type { OutingRecord, RingseatDb } from '../../lib/db';
import { addEvents, DeckInputError, type RunRef } from './device-events';

/* Outings on this device: which engines went out together, paused or ended (see OutingRecord). */

export async function activeOuting(
  database: RingseatDb,
  vesselId: string,
): Promise<OutingRecord | null> {
  const outings = await database.outings.where('vesselId').equals(vesselId).sortBy('startedAt');
  return outings.reverse().find((o) => o.endedAt === null) ?? null;
}

/** Starts an outing: one session-start per engine; the cautions were read just before. */
export async function startOuting(
  database: RingseatDb,
  vesselId: string,
  runs: RunRef[],
  nowMs: number,
): Promise<OutingRecord> {
  if (runs.length === 0)
    throw new DeckInputError('engines', 'Choose at least one engine for the outing.');
  return database.transaction('rw', database.outings, database.events, async () => {
    if (await activeOuting(database, vesselId))
      throw new DeckInputError('outing', 'An outing is already under way on this vessel.');
    const outing: OutingRecord = {
      id: crypto.randomUUID(),
      vesselId,
      runIds: runs.map((r) => r.runId),
      startedAt: nowMs,
      pausedAt: null,
      endedAt: null,
      cautionsReadAt: nowMs,
      createdAt: nowMs,
    };
    await database.outings.add(outing);
    await addEvents(
      database,
      runs.map((r) => ({ runId: r.runId, event: { kind: 'session-start', engineId: r.engineId } })),
      nowMs,
    );
    return outing;
  });
}

type OutingChange = 'pause' | 'resume' | 'end';

/** Pause and end stop every engine's session; resume starts them again. */
export async function changeOuting(
  database: RingseatDb,
  outingId: string,
  runs: RunRef[],
  change: OutingChange,
  nowMs: number,
): Promise<void> {
  await database.transaction('rw', database.outings, database.events, async () => {
    const outing = await database.outings.get(outingId);
    if (!outing || outing.endedAt !== null)
      throw new DeckInputError('outing', 'This outing has already ended.');
    const running = outing.pausedAt === null;
    if ((change === 'pause' && !running) || (change === 'resume' && running)) return;
    const kind = change === 'resume' ? 'session-start' : 'session-stop';
    if (change === 'resume' || running) {
      await addEvents(
        database,
        runs.map((r) => ({ runId: r.runId, event: { kind, engineId: r.engineId } })),
        nowMs,
      );
    }
    const update =
      change === 'pause'
        ? { pausedAt: nowMs }
        : change === 'resume'
          ? { pausedAt: null }
          : { endedAt: nowMs, pausedAt: null };
    await database.outings.update(outingId, update);
  });
}
