import type { EntityManager } from 'typeorm';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import { nativeStatement } from '../../lib/native-sql.js';
import { insertRunEventsSql, runEventRow, type StoredEventFacts } from '../runs/run-event-row.js';

const INSERT_SQL = insertRunEventsSql(1, true);
const EXISTS_SQL = 'SELECT 1 FROM "run_event" WHERE "id" = ?';

/**
 * Event rows written inside TypeORM's own transaction through prepared statements
 * (lib/native-sql.ts). Sync writes thousands of rows a minute; one prepared single-row statement
 * per row runs at the speed of SQLite itself (bench/sync.bench.ts).
 */
export function eventStore(manager: EntityManager) {
  const insert = nativeStatement(manager, INSERT_SQL);
  const exists = nativeStatement(manager, EXISTS_SQL);
  return {
    exists: (id: string): boolean => exists.get(id) !== undefined,
    /** True when the row is new; false when a row with this id was already there. */
    insert: (event: RunEvent, facts: StoredEventFacts): boolean =>
      insert.run(...runEventRow(event, facts)).changes === 1,
  };
}
