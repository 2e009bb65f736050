import type { VoidedMark } from '../../../shared/review/views.js';
import type { RunEvent, VoidEvent } from '../../../shared/runs/run-event.schema.js';
import { voidsByTarget } from '../../../shared/runs/voids.js';
import { nativeStatement, type NativeDb } from '../../lib/native-sql.js';

type Db = NativeDb;

const VOIDS_SQL = `SELECT e."body", e."authorId", u."name" FROM "run_event" e
  LEFT JOIN "user" u ON u."id" = e."authorId" WHERE e."runId" = ? AND e."kind" = 'void'`;

const ENTRY_SQL = 'SELECT "runId", "kind", "authorId", "engineId" FROM "run_event" WHERE "id" = ?';

/** Each voided entry of the run, by its id, with the reason and who voided it (the first void counts). */
export function voidMarks(db: Db, runId: string): Map<string, VoidedMark> {
  const rows = nativeStatement(db, VOIDS_SQL, { raw: true }).all(runId) as Array<
    [body: string, authorId: string, name: string | null]
  >;
  if (rows.length === 0) return new Map();
  const byName = new Map<string, string>();
  const voids = rows.map(([body, , name]) => {
    const event = JSON.parse(body) as VoidEvent;
    byName.set(event.id, name ?? 'someone no longer on the team');
    return event;
  });
  const marks = new Map<string, VoidedMark>();
  for (const [targetId, v] of voidsByTarget(voids as RunEvent[]))
    marks.set(targetId, { reason: v.reason, byName: byName.get(v.id)!, at: v.at });
  return marks;
}

/** A stored entry's run, kind, author and engine, to check a void against (null when not stored). */
export function storedEntry(
  db: Db,
  id: string,
): { runId: string; kind: string; authorId: string; engineId: string } | null {
  const row = nativeStatement(db, ENTRY_SQL).get(id) as
    { runId: string; kind: string; authorId: string; engineId: string } | undefined;
  return row ?? null;
}
