import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Card } from '../../../components/ui/card';
import type { EngineView, VesselView } from '../../../../shared/vessels/vessel-view';
import { VESSEL_TYPE_WORDS } from '../../../../shared/vessels/vessel-words';
import { EngineDetails } from './engine-details';

export function vesselFacts(vessel: VesselView): string {
  const length = vessel.lengthM !== null ? `${vessel.lengthM} m` : null;
  return [VESSEL_TYPE_WORDS[vessel.type], length, vessel.homePort].filter(Boolean).join(' · ');
}

/**
 * A vessel and its engines. `showSkippers` is for workshop staff, who look after many boats; their
 * card also leads to the vessel's page.
 */
export function VesselCard({
  vessel,
  showSkippers = false,
  engineExtra,
}: {
  vessel: VesselView;
  showSkippers?: boolean;
  /** Shown under each engine (the skipper's home puts the engine's run there). */
  engineExtra?: (engine: EngineView) => ReactNode;
}) {
  const title = showSkippers ? (
    <Link to={`/vessels/${vessel.id}`} className="underline underline-offset-4">
      {vessel.name}
    </Link>
  ) : (
    vessel.name
  );
  return (
    <Card title={title}>
      <p className="text-muted">{vesselFacts(vessel)}</p>
      <p className="mt-1">
        <span className="text-muted">HIN </span>
        <span className="figures break-all">{vessel.hin}</span>
      </p>
      {showSkippers && (
        <p className="mt-1">
          <span className="text-muted">Skippers </span>
          {vessel.skippers.length
            ? vessel.skippers.map((s) => s.name).join(', ')
            : 'none linked yet'}
        </p>
      )}
      {vessel.engines.length === 0 ? (
        <p className="mt-3 text-muted">No engines recorded for this vessel yet.</p>
      ) : (
        <ul className="mt-3 grid gap-3 md:grid-cols-2" aria-label={`Engines of ${vessel.name}`}>
          {vessel.engines.map((engine) => (
            <li key={engine.id}>
              <EngineDetails engine={engine} />
              {engineExtra?.(engine)}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
