import Dexie from 'dexie';
import { ReadingSchema, VOIDABLE_KINDS, type Reading } from '../../../shared/runs/run-event.schema';
import type { EventRecord, PhotoRecord, RingseatDb } from '../../lib/db';
import { addEvents, DeckInputError, type RunRef } from './device-events';

/* What the deck logs on a run: readings (with a photo), phase advances, rule alerts and voids. */

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

/** Refuses the whole entry, naming the field, when any engine's reading is not a valid reading. */
function checkReadings(entries: ReadingEntry[], nowMs: number): void {
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
}

/** One reading per engine (both engines of a twin, or one), with an optional photo, all or nothing. */
export async function logReadings(
  database: RingseatDb,
  entries: ReadingEntry[],
  nowMs: number,
  photo?: PhotoInput,
): Promise<EventRecord[]> {
  checkReadings(entries, nowMs);
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

/**
 * Takes back one of this run's readings or notes with a reason (the void rule in
 * shared/runs/voids.ts): a new entry naming the old one, which stays stored and shown.
 */
export async function voidEntry(
  database: RingseatDb,
  run: RunRef,
  entry: { targetId: string; reason: string },
  nowMs: number,
): Promise<EventRecord> {
  return database.transaction('rw', database.events, async () => {
    const target = await database.events.get(entry.targetId);
    if (!target || target.runId !== run.runId)
      throw new DeckInputError('targetId', 'The entry to void is not an entry of this run.');
    if (!(VOIDABLE_KINDS as readonly string[]).includes(target.kind))
      throw new DeckInputError('targetId', 'Only a reading or a note can be voided.');
    const voided = await database.events
      .where('runId')
      .equals(run.runId)
      .filter(
        (e) =>
          e.event.kind === 'void' && e.event.targetId === entry.targetId && e.sync !== 'rejected',
      )
      .count();
    if (voided > 0) throw new DeckInputError('targetId', 'This entry is already voided.');
    const [record] = await addEvents(
      database,
      [{ runId: run.runId, event: { kind: 'void', engineId: run.engineId, ...entry } }],
      nowMs,
    );
    return record;
  });
}
