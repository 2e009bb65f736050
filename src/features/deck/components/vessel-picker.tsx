import { Card } from '../../../components/ui/card';
import { DeckButtonLink } from './deck-link';
import { Pill } from '../../../components/ui/pill';
import { useDeckVessels, type DeckVessel } from '../device-records';
import { capitalise } from '../format';

const STATE_WORDS = {
  planned: 'Planned',
  'under-way': 'Under way',
  submitted: 'Submitted',
  'signed-off': 'Signed off',
  returned: 'Returned',
  cancelled: 'Cancelled',
} as const;

/** The vessels stored on this device, each with its engines' runs, to pick one for the deck. */
export function VesselPicker() {
  const vessels = useDeckVessels();
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
          <VesselEntry vessel={vessel} />
        </li>
      ))}
    </ul>
  );
}

function VesselEntry({ vessel }: { vessel: DeckVessel }) {
  const engines = vessel.vessel?.engines ?? [];
  const withoutRun = engines.filter((e) => !vessel.runs.some((r) => r.engine.id === e.id));
  return (
    <Card title={vessel.name}>
      {vessel.outing && (
        <Pill tone="solid" className="mb-2">
          {vessel.outing.pausedAt === null ? '▶ Outing under way' : '❚❚ Outing paused'}
        </Pill>
      )}
      <ul className="flex flex-col gap-2">
        {vessel.runs.map((run) => (
          <li key={run.id} className="rounded-md border-2 border-line bg-paper p-2">
            <p className="font-bold">
              {capitalise(run.engine.position)} · {run.engine.maker} {run.engine.model}
            </p>
            <p className="text-sm">
              {run.programName} · {run.phaseCount} phases
            </p>
            <Pill tone={run.state === 'under-way' ? 'outline' : 'quiet'} className="mt-1">
              {STATE_WORDS[run.state]}
            </Pill>
          </li>
        ))}
        {withoutRun.map((engine) => (
          <li key={engine.id} className="text-muted">
            {capitalise(engine.position)} · {engine.maker} {engine.model}: no break-in run yet
          </li>
        ))}
      </ul>
      <DeckButtonLink
        to={`/deck/${vessel.id}`}
        className="mt-3 w-full"
        aria-label={`Go on deck with ${vessel.name}`}
      >
        On deck
      </DeckButtonLink>
    </Card>
  );
}
