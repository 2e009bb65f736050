import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { RunEvent } from '../../shared/runs/run-event.schema.js';
import { reserveChangeSeq } from '../lib/change-seq.js';
import { insertRunEventsSql, runEventRow } from '../features/runs/run-event-row.js';
import type { SimulatedEvent } from './simulate-outings.js';

/** A demo event as stored: device time, arrival time and author. */
export interface StoredEvent {
  runId: string;
  workshopId: string;
  event: RunEvent;
  receivedAt: number;
  authorId: string;
}

/** The workshop's tablet is online at the dock; a skipper's phone syncs back in harbour, a little after the outing. */
const SYNC_DELAY_MS = { workshop: 2_000, skipper: 12 * 60_000 };

export function storedEvents(
  simulated: SimulatedEvent[],
  run: { id: string; workshopId: string },
  authors: { workshop: string; skipper: string },
  skipperClockAheadMs: number,
): StoredEvent[] {
  return simulated.map(({ event, by, outingEnd }) => {
    const deviceEvent =
      by === 'skipper' && skipperClockAheadMs !== 0
        ? { ...event, at: event.at + skipperClockAheadMs }
        : event;
    return {
      runId: run.id,
      workshopId: run.workshopId,
      event: deviceEvent,
      receivedAt: outingEnd + SYNC_DELAY_MS[by],
      authorId: authors[by],
    };
  });
}

const ROWS_PER_INSERT = 200;

/** Inserts the events in arrival order, numbered as sync would have numbered them. */
export async function insertEvents(manager: EntityManager, events: StoredEvent[]): Promise<void> {
  if (events.length === 0) return;
  const ordered = [...events].sort(
    (a, b) => a.receivedAt - b.receivedAt || a.event.at - b.event.at,
  );
  let seq = await reserveChangeSeq(manager, ordered.length);
  for (let from = 0; from < ordered.length; from += ROWS_PER_INSERT) {
    const chunk = ordered.slice(from, from + ROWS_PER_INSERT);
    const params = chunk.flatMap(({ runId, workshopId, event, receivedAt, authorId }) =>
      runEventRow(event, { runId, workshopId, receivedAt, authorId, seq: seq++ }),
    );
    await manager.query(insertRunEventsSql(chunk.length), params);
  }
}

/** The device's "send to the workshop" change, kept as sync keeps it. */
export async function insertSubmission(
  manager: EntityManager,
  input: { runId: string; authorId: string; at: number; receivedAt: number },
): Promise<void> {
  await manager.query(
    'INSERT INTO "run_patch" ("id", "runId", "authorId", "at", "receivedAt", "body") VALUES (?, ?, ?, ?, ?, ?)',
    [
      randomUUID(),
      input.runId,
      input.authorId,
      input.at,
      input.receivedAt,
      JSON.stringify({ type: 'run-patch', submit: true }),
    ],
  );
}
