import Dexie, { type Table } from 'dexie';
import type { SessionUser } from '../../shared/auth/auth.schema';
import type { RpmBand } from '../../shared/programs/phase-band.schema';
import type { Program } from '../../shared/programs/program.schema';
import type { RunEvent } from '../../shared/runs/run-event.schema';
import type { RunState } from '../../shared/runs/run.schema';
import type { RunPatchItem } from '../../shared/sync/sync.schema';
import type { VesselSummary } from '../features/vessels/types';

/*
 * The one on-device database. Copies from the server (vessels, runs with their frozen programs,
 * events logged elsewhere) and everything made on this device (events, run changes, photos).
 * A record made here starts with sync 'pending'; the outbox is every pending record, and the
 * sync engine (lib/sync) marks it 'synced' or 'rejected' from the server's answer.
 */

export type SyncState = 'pending' | 'synced' | 'rejected';

export interface RunRecord {
  id: string;
  state: RunState;
  vessel: { id: string; name: string };
  engine: { id: string; position: string; maker: string; model: string; serialNumber: string; ratedRpmMin: number; ratedRpmMax: number };
  programId: string;
  programName: string;
  phaseCount: number;
  totalMinutes: number;
  program: Program;
  bands: Record<string, RpmBand>;
  currentPhaseId: string | null;
  notes: string;
  submittedAt: string | null;
  signedOffAt: string | null;
  createdAt: string;
  updatedAt: string;
  /** The workshop's latest review comment (returned runs), when there is one. */
  reviewComment?: string | null;
}

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

export interface MetaRecord {
  key: 'me' | 'deviceId' | 'pullCursor' | 'lastSyncAt' | 'lastSyncError' | string;
  value: unknown;
}

export class RingseatDb extends Dexie {
  vessels!: Table<VesselSummary, string>;
  runs!: Table<RunRecord, string>;
  events!: Table<EventRecord, string>;
  runPatches!: Table<RunPatchRecord, string>;
  photos!: Table<PhotoRecord, string>;
  meta!: Table<MetaRecord, string>;

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
  }
}

export const db = new RingseatDb();

/** The signed-in user as last confirmed by the server; lets the app open offline. */
export async function cachedUser(): Promise<SessionUser | null> {
  return ((await db.meta.get('me'))?.value as SessionUser | undefined) ?? null;
}
