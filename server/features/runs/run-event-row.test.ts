import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import { startTestServer, type TestServer } from '../../../tests/helpers/test-server.js';
import { nativeStatement } from '../../lib/native-sql.js';
import { RunEventRow } from './run-event.entity.js';
import { insertRunEventsSql, RUN_EVENT_COLUMNS, runEventRow } from './run-event-row.js';
import { countRunEvents, loadRunEvents } from './run-events.js';
import { Run } from './run.entity.js';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());

describe('the run_event codec', () => {
  it('names every column of the entity exactly once', () => {
    const columns = server.dataSource.getMetadata(RunEventRow).columns.map((c) => c.databaseName);
    expect([...RUN_EVENT_COLUMNS].sort()).toEqual([...columns].sort());
  });

  it('reads back exactly the events it wrote, readings from their columns and others from the body', async () => {
    const run = await server.dataSource.getRepository(Run).findOneByOrFail({ state: 'under-way' });
    const before = countRunEvents(server.dataSource, run.id);
    const at = Date.parse('2026-11-30T10:00:00Z');
    const events: RunEvent[] = [
      {
        kind: 'reading',
        id: randomUUID(),
        at,
        engineId: run.engineId,
        phaseId: 'p2',
        rpm: 2950,
        throttle: 'half',
      },
      {
        kind: 'note',
        id: randomUUID(),
        at: at + 1000,
        engineId: run.engineId,
        text: 'Tell-tale strong',
      },
    ];
    const facts = {
      runId: run.id,
      workshopId: run.workshopId,
      receivedAt: at + 5000,
      authorId: run.assignedById,
    };
    const insert = nativeStatement(server.dataSource, insertRunEventsSql(1, true));
    events.forEach((event, i) => insert.run(...runEventRow(event, { ...facts, seq: 900_000 + i })));
    // The same row again changes nothing (OR IGNORE): a resent event is not doubled.
    expect(insert.run(...runEventRow(events[0], { ...facts, seq: 900_002 })).changes).toBe(0);

    const loaded = (await loadRunEvents(server.dataSource, [run.id])).get(run.id)!;
    expect(countRunEvents(server.dataSource, run.id)).toBe(before + 2);
    expect(loaded.maxSeq).toBe(900_001);
    for (const event of events) expect(loaded.events).toContainEqual(event);
  });
});
