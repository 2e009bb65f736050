import Dexie from 'dexie';
import { RunEventSchema, type RunEvent } from '../../../shared/runs/run-event.schema';
import type { EventRecord, RingseatDb } from '../../lib/db';

/*
 * Everything the deck writes to the device goes through here (outing-store.ts, deck-store.ts).
 * Each write is one Dexie transaction, so a reading for both engines of a twin, with its photo, is
 * stored whole or not at all. Every record gets a UUID made here, a created-at time and sync
 * 'pending' for the sync engine to send.
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
export async function addEvents(
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
