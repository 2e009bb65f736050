import { useMemo } from 'react';
import type { Role } from '../../../../shared/auth/auth.schema';
import { DeckButtonLink } from './deck-link';
import type { RunRecord } from '../../../lib/db';
import {
  useAdvancePhase,
  useChangeOuting,
  useLogReading,
  useStartOuting,
  useVesselDeck,
  type VesselDeck,
} from '../device-records';
import { useNow, useWakeLock } from '../device';
import { engineSnapshot, type EngineSnapshot } from '../engine-snapshot';
import { capitalise } from '../format';
import type { PadEngine } from '../reading-entry';
import { signalSourceOf, type EngineSignal } from '../reading-input';
import { isLoggable } from '../run-phases';
import { useAlertSignals } from '../use-alert-signals';
import { EnginePanel } from './engine-panel';
import { OutingBar } from './outing-bar';
import { OutingStart, type StartChoice } from './outing-start';
import { ReadingPad } from './reading-pad';
import '../deck.css';

const engineLabel = (run: RunRecord) => capitalise(run.engine.position);
const refOf = (s: EngineSnapshot) => ({ runId: s.run.id, engineId: s.engineId });

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

function startChoice(snapshot: EngineSnapshot): StartChoice {
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

/** The run screen of one vessel, read from the device only. */
export function DeckScreen({ vesselId, role }: { vesselId: string; role: Role }) {
  const deck = useVesselDeck(vesselId);
  if (deck === undefined) return <p role="status">Opening the deck…</p>;
  if (deck === null) return <NotOnDevice />;
  return <VesselDeckView deck={deck} role={role} />;
}

/** Everything on screen is recomputed from stored events each second: nothing counts ticks. */
function useDeckState(deck: VesselDeck, role: Role) {
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

/** One panel per engine side by side, the reading pad, and the outing controls. */
function VesselDeckView({ deck, role }: { deck: VesselDeck; role: Role }) {
  const { now, snapshots, outing, inOuting, running, wakeLock, padEngines, last } = useDeckState(
    deck,
    role,
  );
  const start = useStartOuting();
  const change = useChangeOuting();
  const logReading = useLogReading();
  const advance = useAdvancePhase();
  const shown = outing ? inOuting : snapshots.filter((s) => isLoggable(s.run));
  const startOuting = (runIds: string[]) =>
    start.mutate({
      vesselId: deck.id,
      runs: snapshots.filter((s) => runIds.includes(s.run.id)).map(refOf),
    });
  return (
    <div className="flex flex-col gap-3">
      <title>{`${deck.name} on deck · Ringseat`}</title>
      <h1 className="text-2xl font-bold">
        {deck.name} <span className="font-normal text-muted">on deck</span>
      </h1>
      {!outing && snapshots.length > 0 && (
        <OutingStart
          choices={snapshots.map(startChoice)}
          pending={start.isPending}
          error={start.error?.message ?? null}
          onStart={startOuting}
        />
      )}
      {snapshots.length === 0 && (
        <p>
          No break-in run is assigned to this vessel&rsquo;s engines yet. The workshop assigns one.
        </p>
      )}
      <div className={shown.length > 1 ? 'grid grid-cols-2 gap-2 sm:gap-4' : 'grid gap-3'}>
        {shown.map((s) => (
          <EnginePanel
            key={s.run.id}
            snapshot={s}
            label={engineLabel(s.run)}
            role={role}
            advancing={advance.isPending}
            wide={shown.length === 1}
            onAdvance={(phaseId) => advance.mutate({ run: refOf(s), phaseId })}
          />
        ))}
      </div>
      {padEngines.length > 0 && (
        <ReadingPad
          key={padEngines.map((e) => `${e.engineId}:${e.phaseId}`).join()}
          engines={padEngines}
          lastRpm={last?.rpm ?? null}
          lastThrottle={last?.throttle ?? null}
          onLog={(entries, photo) => logReading.mutateAsync({ entries, photo })}
        />
      )}
      {running && padEngines.length === 0 && (
        <p>No engine in this outing can be logged by you right now.</p>
      )}
      {outing && (
        <OutingBar
          outing={outing}
          nowMs={now}
          wakeLock={wakeLock}
          pending={change.isPending}
          onChange={(c) =>
            change.mutate({ outingId: outing.id, runs: inOuting.map(refOf), change: c })
          }
        />
      )}
    </div>
  );
}

function NotOnDevice() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-bold">Not on this device</h1>
      <p>
        This vessel is not stored on this phone. Open Ringseat once with a connection so your
        vessels and runs are copied here.
      </p>
      <DeckButtonLink to="/deck" variant="secondary">
        Choose a vessel
      </DeckButtonLink>
    </div>
  );
}
