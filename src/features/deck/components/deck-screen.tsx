import type { Role } from '../../../../shared/auth/auth.schema';
import { DeckButtonLink } from './deck-link';
import {
  useAdvancePhase,
  useChangeOuting,
  useLogReading,
  useStartOuting,
  useVesselDeck,
  type VesselDeck,
} from '../device-records';
import { deckEntries } from '../deck-entries';
import type { EngineSnapshot } from '../engine-snapshot';
import { isLoggable } from '../run-phases';
import { engineLabel, refOf, startChoice, useDeckState } from '../use-deck-state';
import { EnginePanel } from './engine-panel';
import { FinishSection, SubmissionNotices, submittable } from './finish-section';
import { OutingBar } from './outing-bar';
import { OutingStart } from './outing-start';
import { ReadingPad } from './reading-pad';
import '../deck.css';

interface DeckScreenProps {
  vesselId: string;
  role: Role;
  /** Something went into the outbox that the workshop waits for (a submit): send it soon. */
  onSubmitted?: () => void;
}

/** The run screen of one vessel, read from the device only. */
export function DeckScreen({ vesselId, role, onSubmitted }: DeckScreenProps) {
  const deck = useVesselDeck(vesselId);
  if (deck === undefined) return <p role="status">Opening the deck…</p>;
  if (deck === null) return <NotOnDevice />;
  return <VesselDeckView deck={deck} role={role} onSubmitted={onSubmitted} />;
}

/** One panel per engine side by side, the reading pad, and the outing controls. */
function VesselDeckView({
  deck,
  role,
  onSubmitted,
}: {
  deck: VesselDeck;
  role: Role;
  onSubmitted?: () => void;
}) {
  const { now, snapshots, outing, inOuting, running, wakeLock, padEngines, last } = useDeckState(
    deck,
    role,
  );
  const change = useChangeOuting();
  const shown = outing ? inOuting : snapshots.filter((s) => isLoggable(s.run));
  return (
    <div className="flex flex-col gap-3">
      <title>{`${deck.name} on deck · Ringseat`}</title>
      <h1 className="text-2xl font-bold">
        {deck.name} <span className="font-normal text-muted">on deck</span>
      </h1>
      <SubmissionNotices deck={deck} />
      {!outing && snapshots.length > 0 && <StartSection deck={deck} snapshots={snapshots} />}
      {snapshots.length === 0 && (
        <p>
          No break-in run is assigned to this vessel&rsquo;s engines yet. The workshop assigns one.
        </p>
      )}
      <EngineGrid deck={deck} shown={shown} role={role} />
      <PadSection padEngines={padEngines} last={last} running={running} />
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
      {!outing && (
        <FinishSection
          deck={deck}
          engines={submittable(deck, snapshots)}
          onSubmitted={onSubmitted}
        />
      )}
    </div>
  );
}

/** The reading pad for the engines that can be logged now, or why none can. */
function PadSection({
  padEngines,
  last,
  running,
}: Pick<ReturnType<typeof useDeckState>, 'padEngines' | 'last' | 'running'>) {
  const logReading = useLogReading();
  if (padEngines.length === 0)
    return running ? <p>No engine in this outing can be logged by you right now.</p> : null;
  return (
    <ReadingPad
      key={padEngines.map((e) => `${e.engineId}:${e.phaseId}`).join()}
      engines={padEngines}
      lastRpm={last?.rpm ?? null}
      lastThrottle={last?.throttle ?? null}
      onLog={(entries, photo) => logReading.mutateAsync({ entries, photo })}
    />
  );
}

/** Before an outing: the engines that can go out, the cautions, and the start. */
function StartSection({ deck, snapshots }: { deck: VesselDeck; snapshots: EngineSnapshot[] }) {
  const start = useStartOuting();
  return (
    <OutingStart
      choices={snapshots.map(startChoice)}
      pending={start.isPending}
      error={start.error?.message ?? null}
      onStart={(runIds) =>
        start.mutate({
          vesselId: deck.id,
          runs: snapshots.filter((s) => runIds.includes(s.run.id)).map(refOf),
        })
      }
    />
  );
}

/** The engines side by side (two columns for a twin), each able to move to its next phase. */
function EngineGrid({
  deck,
  shown,
  role,
}: {
  deck: VesselDeck;
  shown: EngineSnapshot[];
  role: Role;
}) {
  const advance = useAdvancePhase();
  return (
    <div className={shown.length > 1 ? 'grid grid-cols-2 gap-2 sm:gap-4' : 'grid gap-3'}>
      {shown.map((s) => (
        <EnginePanel
          key={s.run.id}
          snapshot={s}
          label={engineLabel(s.run)}
          role={role}
          advancing={advance.isPending}
          entries={deckEntries(
            deck.events[s.run.id] ?? [],
            s.engineId,
            deck.own,
            deck.refusedVoids,
          )}
          wide={shown.length === 1}
          onAdvance={(phaseId) => advance.mutate({ run: refOf(s), phaseId })}
        />
      ))}
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
