import Dexie, { type Table } from 'dexie';
import type { SessionUser } from '../../shared/auth/auth.schema';
import type { RunEvent } from '../../shared/runs/run-event.schema';
import type { RunDetail } from '../../shared/runs/run-view';
import type { RunPatchItem } from '../../shared/sync/sync.schema';
import type { VesselView } from '../../shared/vessels/vessel-view';

/*
 * The one on-device database. Copies from the server (vessels, runs with their frozen programs,
 * events logged elsewhere) and everything made on this device (events, run changes, photos).
 * A record made here starts with sync 'pending'; the outbox is every pending record, and the
 * sync engine (features/sync) marks it 'synced' or 'rejected' from the server's answer.
 */

export type SyncState = 'pending' | 'synced' | 'rejected';

/** A run as the device keeps it: the server's view with its frozen program and resolved bands. */
export type RunRecord = RunDetail;

export interface EventRecord {
  id: string;
  runId: string;
  engineId: string;
  /** Device time of the event, epoch ms (copied from `event.at` for the index). */
  at: number;
  kind: RunEvent['kind'];
  event: RunEvent;
  /** 'device': made here; 'server': pulled (logged on another device or by the workshop). */
  origin: 'device' | 'server';
  sync: SyncState;
  rejectReason?: string;
  createdAt: number;
}

export interface RunPatchRecord {
  id: string;
  runId: string;
  item: RunPatchItem;
  sync: SyncState;
  rejectReason?: string;
  createdAt: number;
}

export interface PhotoRecord {
  id: string;
  runId: string;
  /** The reading the photo belongs to, when there is one. */
  eventId?: string;
  blob: Blob;
  mimeType: string;
  width: number;
  height: number;
  caption?: string;
  sync: SyncState;
  rejectReason?: string;
  createdAt: number;
}

/**
 * An outing on this device: one or more engines of one vessel run together from start to end.
 * Device-only (never synced): the engine time itself lives in the session-start/stop events.
 * It remembers which engines went out, whether the outing is paused, and that the cautions were
 * read, so a reload or a killed app comes back to the same screen.
 */
export interface OutingRecord {
  id: string;
  vesselId: string;
  /** The runs (one per engine) taking part. */
  runIds: string[];
  startedAt: number;
  pausedAt: number | null;
  endedAt: number | null;
  /** When the skipper confirmed the cautions for this outing; they are shown once per outing. */
  cautionsReadAt: number | null;
  createdAt: number;
}

export interface MetaRecord {
  key: 'me' | 'deviceId' | 'pullCursor' | 'lastSyncAt' | 'lastSyncError' | string;
  value: unknown;
}

export class RingseatDb extends Dexie {
  vessels!: Table<VesselView, string>;
  runs!: Table<RunRecord, string>;
  events!: Table<EventRecord, string>;
  runPatches!: Table<RunPatchRecord, string>;
  photos!: Table<PhotoRecord, string>;
  meta!: Table<MetaRecord, string>;
  outings!: Table<OutingRecord, string>;

  constructor(name = 'ringseat') {
    super(name);
    this.version(1).stores({
      vessels: 'id',
      runs: 'id, engine.id, vessel.id, state',
      events: 'id, runId, [runId+at], sync',
      runPatches: 'id, runId, sync, createdAt',
      photos: 'id, runId, sync',
      meta: 'key',
    });
    // Version 2 adds outings; every version-1 table keeps its shape.
    this.version(2).stores({ outings: 'id, vesselId, startedAt' });
  }
}

export const db = new RingseatDb();

/** The signed-in user as last confirmed by the server; lets the app open offline. */
export async function cachedUser(database: RingseatDb = db): Promise<SessionUser | null> {
  return ((await database.meta.get('me'))?.value as SessionUser | undefined) ?? null;
}

/**
 * Records the user the server just confirmed. When someone else signs in on this device, the
 * previous user's copies and unsent records go first: nobody sees, or sends, another person's log.
 */
export async function rememberUser(user: SessionUser, database: RingseatDb = db): Promise<void> {
  const owner =
    (await cachedUser(database))?.id ??
    ((await database.meta.get('outboxOwner'))?.value as string | undefined);
  if (owner !== undefined && owner !== user.id)
    await clearUserData(database, { keepOutbox: false });
  await database.transaction('rw', database.meta, async () => {
    await database.meta.delete('outboxOwner');
    await database.meta.put({ key: 'me', value: user });
  });
}

/**
 * Signed out, or the server said the session is gone: forget the user's copies. By default what
 * was logged here and not yet sent stays (with its outings), so a session that expired at sea
 * loses nothing: it goes out when the same person signs in again.
 */
export async function clearUserData(
  database: RingseatDb = db,
  { keepOutbox = true } = {},
): Promise<void> {
  const tables = [
    database.vessels,
    database.runs,
    database.events,
    database.runPatches,
    database.photos,
    database.meta,
    database.outings,
  ];
  await database.transaction('rw', tables, async () => {
    const owner = (await cachedUser(database))?.id;
    await Promise.all([database.vessels.clear(), database.runs.clear()]);
    const outbox = [database.events, database.runPatches, database.photos] as const;
    if (keepOutbox) {
      for (const table of outbox)
        await (table as Table<{ sync: SyncState }, string>)
          .where('sync')
          .notEqual('pending')
          .delete();
    } else {
      await Promise.all([...outbox.map((table) => table.clear()), database.outings.clear()]);
    }
    const keys = await database.meta.toCollection().primaryKeys();
    // The device id names this device, not its user: it stays.
    await database.meta.bulkDelete(
      keys.filter((key) => key !== 'deviceId' && !(keepOutbox && key === 'outboxOwner')),
    );
    const counts = keepOutbox
      ? await Promise.all(
          outbox.map((table) =>
            (table as Table<{ sync: SyncState }, string>).where('sync').equals('pending').count(),
          ),
        )
      : [];
    if (owner !== undefined && counts.some((n) => n > 0))
      await database.meta.put({ key: 'outboxOwner', value: owner });
  });
}
