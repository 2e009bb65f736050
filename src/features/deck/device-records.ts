import { useLiveQuery } from 'dexie-react-hooks';
import { db } from '../../lib/db';
import { useDeviceWrite } from './use-device-write';
import {
  advancePhase,
  logAlert,
  logReadings,
  voidEntry,
  type PhotoInput,
  type ReadingEntry,
} from './deck-store';
import type { RunRef } from './device-events';
import { loadDeckVessels, loadVesselDeck } from './device-reads';
import { changeOuting, startOuting } from './outing-store';
import { submitRuns } from './submit-store';

export type { DeckVessel, VesselDeck } from './device-reads';

/*
 * The deck reads and writes the device database only, so it works with no network at all.
 * Reads are Dexie live queries (the screen follows every write, including the sync engine's);
 * writes go straight to the device and never wait for a connection.
 */

/** Every vessel on this device with its runs; undefined while the database opens. */
export const useDeckVessels = () => useLiveQuery(loadDeckVessels, []);

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

/** Submits the runs named, with the note to the workshop; waits in the outbox until sent. */
export const useSubmitRuns = () =>
  useDeviceWrite(({ runIds, submitNote }: { runIds: string[]; submitNote: string }) =>
    submitRuns(db, runIds, submitNote, Date.now()),
  );

export const useVoidEntry = () =>
  useDeviceWrite(({ run, targetId, reason }: { run: RunRef; targetId: string; reason: string }) =>
    voidEntry(db, run, { targetId, reason }, Date.now()),
  );
