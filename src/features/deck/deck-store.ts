import Dexie from 'dexie';
import {
  ReadingSchema,
  RunEventSchema,
  type Reading,
  type RunEvent,
} from '../../../shared/runs/run-event.schema';
import type { EventRecord, OutingRecord, PhotoRecord, RingseatDb } from '../../lib/db';

/*
 * Everything the deck writes to the device. Each write is one Dexie transaction, so a reading
 * for both engines of a twin, with its photo, is stored whole or not at all. Every record gets a
 * UUID made here, a created-at time and sync 'pending' for the sync engine to send.
 */

export class DeckInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'DeckInputError';
  }
}

/** Which engine a run belongs to: events carry both. */
export interface RunRef {
  runId: string;
  engineId: string;
}

type NewEvent = RunEvent extends infer E
  ? E extends RunEvent
    ? Omit<E, 'id' | 'at'>
    : never
  : never;

/** Device time for the next event of a run: never before (or at) the run's newest event. */
export async function nextEventAt(
  database: RingseatDb,
  runId: string,
  nowMs: number,
): Promise<number> {
  const newest = await database.events
    .where('[runId+at]')
    .between([runId, Dexie.minKey], [runId, Dexie.maxKey])
    .last();
  return newest === undefined ? nowMs : Math.max(nowMs, newest.at + 1);
}

function checked(event: RunEvent): RunEvent {
  const result = RunEventSchema.safeParse(event);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  throw new DeckInputError(String(issue.path[issue.path.length - 1] ?? 'event'), issue.message);
}

/** Adds events (already in one open transaction), each at its run's next event time. */
async function addEvents(
  database: RingseatDb,
  items: Array<{ runId: string; event: NewEvent }>,
  nowMs: number,
): Promise<EventRecord[]> {
  const records: EventRecord[] = [];
  for (const { runId, event } of items) {
    const at = await nextEventAt(database, runId, nowMs);
    const full = checked({ ...event, id: crypto.randomUUID(), at } as RunEvent);
    records.push({
      id: full.id,
      runId,
      engineId: full.engineId,
      at,
      kind: full.kind,
      event: full,
      origin: 'device',
      sync: 'pending',
      createdAt: nowMs,
    });
    await database.events.add(records[records.length - 1]);
  }
  return records;
}

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

export interface ReadingEntry extends RunRef {
  reading: Omit<Reading, 'id' | 'at' | 'kind' | 'engineId'>;
}

export interface PhotoInput {
  blob: Blob;
  mimeType: string;
  width: number;
  height: number;
  caption?: string;
}

/** One reading per engine (both engines of a twin, or one), with an optional photo, all or nothing. */
export async function logReadings(
  database: RingseatDb,
  entries: ReadingEntry[],
  nowMs: number,
  photo?: PhotoInput,
): Promise<EventRecord[]> {
  if (entries.length === 0)
    throw new DeckInputError('engines', 'Choose the engine the reading is for.');
  for (const entry of entries) {
    const result = ReadingSchema.safeParse({
      ...entry.reading,
      kind: 'reading',
      engineId: entry.engineId,
      id: crypto.randomUUID(),
      at: nowMs,
    });
    if (!result.success) {
      const issue = result.error.issues[0];
      throw new DeckInputError(String(issue.path[0] ?? 'reading'), issue.message);
    }
  }
  return database.transaction('rw', database.events, database.photos, async () => {
    const records = await addEvents(
      database,
      entries.map((e) => ({
        runId: e.runId,
        event: { ...e.reading, kind: 'reading', engineId: e.engineId },
      })),
      nowMs,
    );
    if (photo) {
      const record: PhotoRecord = {
        id: crypto.randomUUID(),
        runId: records[0].runId,
        eventId: records[0].id,
        ...photo,
        sync: 'pending',
        createdAt: nowMs,
      };
      await database.photos.add(record);
    }
    return records;
  });
}

/** The skipper (or technician) confirms the next phase; the run's current phase follows. */
export async function advancePhase(
  database: RingseatDb,
  run: RunRef,
  phaseId: string,
  nowMs: number,
): Promise<void> {
  await database.transaction('rw', database.events, database.runPatches, async () => {
    const [record] = await addEvents(
      database,
      [{ runId: run.runId, event: { kind: 'phase-advance', engineId: run.engineId, phaseId } }],
      nowMs,
    );
    const patchId = crypto.randomUUID();
    await database.runPatches.add({
      id: patchId,
      runId: run.runId,
      item: {
        type: 'run-patch',
        id: patchId,
        runId: run.runId,
        at: record.at,
        currentPhaseId: phaseId,
      },
      sync: 'pending',
      createdAt: nowMs,
    });
  });
}

/**
 * A rule alert raised on the device, kept in the run's log (it never counts as engine time).
 * One per broken-rule stretch: an alert of the same code logged since the stretch began is enough.
 * Returns false when it was already logged.
 */
export async function logAlert(
  database: RingseatDb,
  run: RunRef,
  alert: { code: string; message: string; phaseId?: string; sinceMs: number },
  nowMs: number,
): Promise<boolean> {
  return database.transaction('rw', database.events, async () => {
    const { sinceMs, ...fields } = alert;
    const logged = await database.events
      .where('[runId+at]')
      .between([run.runId, sinceMs], [run.runId, Dexie.maxKey])
      .filter((e) => e.event.kind === 'alert' && e.event.code === alert.code)
      .count();
    if (logged > 0) return false;
    await addEvents(
      database,
      [{ runId: run.runId, event: { kind: 'alert', engineId: run.engineId, ...fields } }],
      nowMs,
    );
    return true;
  });
}
