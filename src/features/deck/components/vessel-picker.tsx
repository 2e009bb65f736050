import { Card } from '../../../components/ui/card';
import { DeckButtonLink } from './deck-link';
import { Pill } from '../../../components/ui/pill';
import type { Role } from '../../../../shared/auth/auth.schema';
import { useDeckVessels, type DeckVessel } from '../device-records';
import {
  ENGINE_STATE_WORDS,
  pickerEngines,
  type EngineRunState,
  type PickerEngine,
} from '../picker-state';
import { useNow } from '../device';
import { RunPageLink } from './run-page-link';
import { positionWords } from '../../../../shared/engines/engine-words';

const STATE_TONE: Record<EngineRunState, 'solid' | 'outline' | 'quiet'> = {
  'workshop-waiting': 'quiet',
  'workshop-yours': 'solid',
  'with-skipper': 'outline',
  submitted: 'quiet',
  returned: 'solid',
  'signed-off': 'quiet',
};

/** The vessels stored on this device, each with its engines' runs, to pick one for the deck. */
export function VesselPicker({ role }: { role: Role }) {
  const vessels = useDeckVessels();
  // States follow the clock only loosely (a phase running out): once a minute is plenty.
  const now = useNow(60_000);
  if (vessels === undefined) return <p role="status">Opening the logbook on this device…</p>;
  if (vessels.length === 0) {
    return (
      <p className="text-lg">
        Nothing is stored on this device yet. Open Ringseat once with a connection: your vessels,
        engines and break-in runs are copied here so the deck works at sea with no signal.
      </p>
    );
  }
  return (
    <ul className="flex flex-col gap-4" aria-label="Vessels on this device">
      {vessels.map((vessel) => (
        <li key={vessel.id}>
          <VesselEntry vessel={vessel} role={role} now={now} />
        </li>
      ))}
    </ul>
  );
}

function VesselEntry({ vessel, role, now }: { vessel: DeckVessel; role: Role; now: number }) {
  const engines = vessel.vessel?.engines ?? [];
  const states = pickerEngines(vessel, role, now);
  // An outing under way needs the deck to end it, whatever else there is to do.
  const onDeck = vessel.outing !== null || states.some((s) => s.workable);
  const withoutRun = engines.filter((e) => !vessel.runs.some((r) => r.engine.id === e.id));
  return (
    <Card title={vessel.name}>
      {vessel.outing && (
        <Pill tone="solid" className="mb-2">
          {vessel.outing.pausedAt === null ? '▶ Outing under way' : '❚❚ Outing paused'}
        </Pill>
      )}
      <ul className="flex flex-col gap-2">
        {states.map((engine) => (
          <RunRow key={engine.run.id} engine={engine} />
        ))}
        {withoutRun.map((engine) => (
          <li key={engine.id} className="text-muted">
            {positionWords(engine.position)} · {engine.maker} {engine.model}:{' '}
            {ENGINE_STATE_WORDS['no-run']}
          </li>
        ))}
      </ul>
      {onDeck ? (
        <DeckButtonLink
          to={`/deck/${vessel.id}`}
          className="mt-3 w-full"
          aria-label={`Go on deck with ${vessel.name}`}
        >
          On deck
        </DeckButtonLink>
      ) : (
        <p className="mt-3 text-sm">Nothing on this vessel for you to log right now.</p>
      )}
    </Card>
  );
}

/** One engine's run: which engine, its program, where it stands in words, and its page. */
function RunRow({ engine: { run, state } }: { engine: PickerEngine }) {
  return (
    <li className="rounded-md border-2 border-line bg-paper p-2">
      <p className="font-bold">
        {positionWords(run.engine.position)} · {run.engine.maker} {run.engine.model}
      </p>
      <p className="text-sm">
        {run.programName} · {run.phaseCount} phases
      </p>
      <div className="flex flex-wrap items-center gap-x-3">
        <Pill tone={STATE_TONE[state]}>{ENGINE_STATE_WORDS[state]}</Pill>
        <RunPageLink run={run} />
      </div>
    </li>
  );
}
