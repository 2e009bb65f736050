import { useLiveQuery } from 'dexie-react-hooks';
import type { RunEvent } from '../../../shared/runs/run-event.schema';
import { db, type OutingRecord, type RunRecord } from '../../lib/db';
import { useDeviceWrite } from './use-device-write';
import type { VesselView } from '../../../shared/vessels/vessel-view';
import {
  advancePhase,
  logAlert,
  logReadings,
  type PhotoInput,
  type ReadingEntry,
} from './deck-store';
import type { RunRef } from './device-events';
import { activeOuting, changeOuting, startOuting } from './outing-store';

/*
 * The deck reads and writes the device database only, so it works with no network at all.
 * Reads are Dexie live queries (the screen follows every write, including the sync engine's);
 * writes go straight to the device and never wait for a connection.
 */

export interface DeckVessel {
  id: string;
  name: string;
  vessel: VesselView | null;
  runs: RunRecord[];
  outing: OutingRecord | null;
}

async function loadDeckVessels(): Promise<DeckVessel[]> {
  const [vessels, runs, outings] = await Promise.all([
    db.vessels.toArray(),
    db.runs.toArray(),
    db.outings.toArray(),
  ]);
  const byId = new Map<string, DeckVessel>(
    vessels.map((v) => [v.id, { id: v.id, name: v.name, vessel: v, runs: [], outing: null }]),
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
      });
    byId.get(run.vessel.id)!.runs.push(run);
  }
  for (const outing of outings)
    if (outing.endedAt === null && byId.has(outing.vesselId))
      byId.get(outing.vesselId)!.outing = outing;
  return [...byId.values()].sort((a, b) => a.name.localeCompare(b.name));
}

/** Every vessel on this device with its runs; undefined while the database opens. */
export const useDeckVessels = () => useLiveQuery(loadDeckVessels, []);

export interface VesselDeck extends DeckVessel {
  /** Each run's events, as stored (any order; the core orders them). */
  events: Record<string, RunEvent[]>;
}

async function loadVesselDeck(vesselId: string): Promise<VesselDeck | null> {
  const [vessel, runs, outing] = await Promise.all([
    db.vessels.get(vesselId),
    db.runs.where('vessel.id').equals(vesselId).toArray(),
    activeOuting(db, vesselId),
  ]);
  if (!vessel && runs.length === 0) return null;
  const records = await db.events
    .where('runId')
    .anyOf(runs.map((r) => r.id))
    .toArray();
  const events: Record<string, RunEvent[]> = Object.fromEntries(runs.map((r) => [r.id, []]));
  for (const record of records) events[record.runId].push(record.event);
  const order = (r: RunRecord) => vessel?.engines.findIndex((e) => e.id === r.engine.id) ?? 0;
  runs.sort((a, b) => order(a) - order(b));
  return {
    id: vesselId,
    name: vessel?.name ?? runs[0].vessel.name,
    vessel: vessel ?? null,
    runs,
    outing,
    events,
  };
}

/** One vessel's deck: its runs, their events and the outing under way; null when unknown here. */
export const useVesselDeck = (vesselId: string) =>
  useLiveQuery(() => loadVesselDeck(vesselId), [vesselId]);

export const useStartOuting = () =>
  useDeviceWrite(({ vesselId, runs }: { vesselId: string; runs: RunRef[] }) =>
    startOuting(db, vesselId, runs, Date.now()),
  );

export const useChangeOuting = () =>
  useDeviceWrite(
    ({
      outingId,
      runs,
      change,
    }: {
      outingId: string;
      runs: RunRef[];
      change: 'pause' | 'resume' | 'end';
    }) => changeOuting(db, outingId, runs, change, Date.now()),
  );

export const useLogReading = () =>
  useDeviceWrite(({ entries, photo }: { entries: ReadingEntry[]; photo?: PhotoInput }) =>
    logReadings(db, entries, Date.now(), photo),
  );

export const useAdvancePhase = () =>
  useDeviceWrite(({ run, phaseId }: { run: RunRef; phaseId: string }) =>
    advancePhase(db, run, phaseId, Date.now()),
  );

export const useLogAlert = () =>
  useDeviceWrite(
    ({
      run,
      alert,
    }: {
      run: RunRef;
      alert: { code: string; message: string; phaseId?: string; sinceMs: number };
    }) => logAlert(db, run, alert, Date.now()),
  );
