import { useMemo } from 'react';
import type { Role } from '../../../shared/auth/auth.schema';
import { positionWords } from '../../../shared/engines/engine-words';
import type { RunRecord } from '../../lib/db';
import type { StartChoice } from './components/outing-start';
import type { VesselDeck } from './device-records';
import { useNow, useWakeLock } from './device';
import { engineSnapshot, type EngineSnapshot } from './engine-snapshot';
import type { PadEngine } from './reading-entry';
import { signalSourceOf, type EngineSignal } from './reading-input';
import { isLoggable } from './run-phases';
import { useAlertSignals } from './use-alert-signals';

export const engineLabel = (run: RunRecord) => positionWords(run.engine.position);
export const refOf = (s: EngineSnapshot) => ({ runId: s.run.id, engineId: s.engineId });

function padEngine(deck: VesselDeck, snapshot: EngineSnapshot): PadEngine {
  const engine = deck.vessel?.engines.find((e) => e.id === snapshot.engineId) as
    EngineSignal | undefined;
  return {
    runId: snapshot.run.id,
    engineId: snapshot.engineId,
    label: engineLabel(snapshot.run),
    phaseId: snapshot.phase!.id,
    signal: signalSourceOf(engine),
    ratedRpmMax: snapshot.run.engine.ratedRpmMax,
  };
}

export function startChoice(snapshot: EngineSnapshot): StartChoice {
  const { run } = snapshot;
  const blocked = !isLoggable(run)
    ? `${run.state === 'submitted' ? 'submitted for review' : 'signed off'}, nothing more to run.`
    : snapshot.waitingForWorkshop
      ? `waiting for the workshop (${snapshot.phase?.name}).`
      : null;
  return {
    runId: run.id,
    engineId: run.engine.id,
    label: `${engineLabel(run)} · ${run.engine.maker} ${run.engine.model}`,
    blocked,
  };
}

/** Everything on screen is recomputed from stored events each second: nothing counts ticks. */
export function useDeckState(deck: VesselDeck, role: Role) {
  const now = useNow();
  const snapshots = useMemo(
    () => deck.runs.map((run) => engineSnapshot(run, deck.events[run.id] ?? [], now, role)),
    [deck, now, role],
  );
  const outing = deck.outing;
  const inOuting = snapshots.filter((s) => outing?.runIds.includes(s.run.id));
  const running = outing !== null && outing.pausedAt === null;
  const wakeLock = useWakeLock(running);
  useAlertSignals(inOuting, running);
  const padEngines = running
    ? inOuting
        .filter((s) => !s.waitingForWorkshop && s.phase !== null)
        .map((s) => padEngine(deck, s))
    : [];
  const last = inOuting.find((s) => s.engineId === padEngines[0]?.engineId)?.lastReading ?? null;
  return { now, snapshots, outing, inOuting, running, wakeLock, padEngines, last };
}
