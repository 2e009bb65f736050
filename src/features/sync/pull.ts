import { PullResponseSchema, type PullResponse } from '../../../shared/sync/sync.schema';
import { api } from '../../lib/api-client';
import { db, type EventRecord } from '../../lib/db';

/**
 * Pulls every page of changes after the device's cursor. Each page is checked against the pull
 * answer's schema first: a malformed page throws before anything is stored, and the sync fails
 * (and retries) like any other failure.
 */
export async function pullAll(): Promise<void> {
  for (let round = 0; round < 1000; round++) {
    const cursor = ((await db.meta.get('pullCursor'))?.value as number | undefined) ?? 0;
    const answer = await api.get<unknown>(`/api/sync/pull?cursor=${cursor}`);
    const page = PullResponseSchema.parse(answer);
    const { needsFullPull } = await applyPull(page);
    if (needsFullPull) await db.meta.put({ key: 'pullCursor', value: 0 });
    if (!page.more && !needsFullPull) return;
  }
}

/**
 * Stores one page of changes. Events this device made are marked synced when they come back;
 * events made elsewhere (the other device on a twin, the workshop's dock phases) are added.
 * Returns true when a run is visible that this device lacks, so the next pull starts over.
 */
export async function applyPull(page: PullResponse): Promise<{ needsFullPull: boolean }> {
  return db.transaction('rw', [db.vessels, db.runs, db.events, db.meta], async () => {
    await db.vessels.clear();
    await db.vessels.bulkPut(page.vessels);
    await db.runs.bulkPut(page.runs);
    const visible = new Set(page.runIds);
    const stale = (await db.runs.toCollection().primaryKeys()).filter((id) => !visible.has(id));
    if (stale.length > 0) await db.runs.bulkDelete(stale);
    await storeEvents(page.events);
    await db.meta.put({ key: 'pullCursor', value: page.cursor });
    const local = new Set(await db.runs.toCollection().primaryKeys());
    return { needsFullPull: page.runIds.some((id) => !local.has(id)) };
  });
}

async function storeEvents(events: PullResponse['events']) {
  if (events.length === 0) return;
  const known = await db.events.bulkGet(events.map((e) => e.event.id));
  const added: EventRecord[] = [];
  const confirmed: string[] = [];
  events.forEach(({ runId, event }, i) => {
    if (known[i]) confirmed.push(event.id);
    else
      added.push({
        id: event.id,
        runId,
        engineId: event.engineId,
        at: event.at,
        kind: event.kind,
        event,
        origin: 'server',
        sync: 'synced',
        createdAt: Date.now(),
      });
  });
  await db.events.bulkAdd(added);
  for (const id of confirmed)
    await db.events.update(id, { sync: 'synced', rejectReason: undefined });
}
