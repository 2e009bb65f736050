import type { RunEvent } from '../../../shared/runs/run-event.schema';
import type { VesselView } from '../../../shared/vessels/vessel-view';
import { db, type EventRecord, type OutingRecord, type RunRecord } from '../../lib/db';
import { activeOuting } from './outing-store';
import { runPerEngine } from './picker-state';
import { latestSubmissions, shownHere, type LocalSubmission } from './submission';

/*
 * What the deck reads from the device database (device-records.ts wraps these in live queries).
 * Runs come as this device shows them: a submit still in the outbox shows the run as submitted
 * (submission.ts). A void the server refused is left out of the events, so the entry it named
 * counts again, and its reason is kept to show beside that entry.
 */

export interface RunEvents {
  /** Each run's events, as stored (any order; the core orders them). */
  events: Record<string, RunEvent[]>;
  /** Ids of the events made on this device (by the signed-in user: see rememberUser). */
  own: Set<string>;
  /** Voids the server refused, by the id of the entry they named, with the server's reason. */
  refusedVoids: Map<string, string>;
  /** The newest submit made on this device, per run. */
  submissions: Map<string, LocalSubmission>;
}

export interface DeckVessel extends RunEvents {
  id: string;
  name: string;
  vessel: VesselView | null;
  runs: RunRecord[];
  outing: OutingRecord | null;
}

export type VesselDeck = DeckVessel;

function sortEvents(runs: RunRecord[], records: EventRecord[]) {
  const events: Record<string, RunEvent[]> = Object.fromEntries(runs.map((r) => [r.id, []]));
  const own = new Set<string>();
  const refusedVoids = new Map<string, string>();
  for (const record of records) {
    const { event } = record;
    if (event.kind === 'void' && record.sync === 'rejected') {
      refusedVoids.set(event.targetId, record.rejectReason ?? 'Refused by the server.');
      continue;
    }
    events[record.runId]?.push(event);
    if (record.origin === 'device') own.add(record.id);
  }
  return { events, own, refusedVoids };
}

/** The runs' events and this device's submits, and the runs as shown here. */
async function loadRunEvents(stored: RunRecord[]): Promise<RunEvents & { runs: RunRecord[] }> {
  const ids = stored.map((r) => r.id);
  const [records, patches] = await Promise.all([
    db.events.where('runId').anyOf(ids).toArray(),
    db.runPatches.where('runId').anyOf(ids).toArray(),
  ]);
  const submissions = latestSubmissions(patches);
  const runs = stored.map((run) => shownHere(run, submissions.get(run.id)));
  return { runs, submissions, ...sortEvents(runs, records) };
}

/** Every vessel on this device with the run that matters now on each engine (picker-state.ts). */
export async function loadDeckVessels(): Promise<DeckVessel[]> {
  const [vessels, stored, outings] = await Promise.all([
    db.vessels.toArray(),
    db.runs.toArray(),
    db.outings.toArray(),
  ]);
  const { runs, ...runEvents } = await loadRunEvents(stored);
  const byId = new Map<string, DeckVessel>(
    vessels.map((v) => [
      v.id,
      { id: v.id, name: v.name, vessel: v, runs: [], outing: null, ...runEvents },
    ]),
  );
  for (const run of runs) {
    // A run can arrive before its vessel: it still shows, under the name it carries.
    if (!byId.has(run.vessel.id))
      byId.set(run.vessel.id, {
        id: run.vessel.id,
        name: run.vessel.name,
        vessel: null,
        runs: [],
        outing: null,
        ...runEvents,
      });
    byId.get(run.vessel.id)!.runs.push(run);
  }
  for (const outing of outings)
    if (outing.endedAt === null && byId.has(outing.vesselId))
      byId.get(outing.vesselId)!.outing = outing;
  for (const vessel of byId.values()) vessel.runs = runPerEngine(vessel.runs);
  return [...byId.values()].sort((a, b) => a.name.localeCompare(b.name));
}

export async function loadVesselDeck(vesselId: string): Promise<VesselDeck | null> {
  const [vessel, stored, outing] = await Promise.all([
    db.vessels.get(vesselId),
    db.runs.where('vessel.id').equals(vesselId).toArray(),
    activeOuting(db, vesselId),
  ]);
  if (!vessel && stored.length === 0) return null;
  const { runs, ...runEvents } = await loadRunEvents(stored);
  const order = (r: RunRecord) => vessel?.engines.findIndex((e) => e.id === r.engine.id) ?? 0;
  runs.sort((a, b) => order(a) - order(b));
  return {
    id: vesselId,
    name: vessel?.name ?? runs[0].vessel.name,
    vessel: vessel ?? null,
    runs,
    outing,
    ...runEvents,
  };
}
