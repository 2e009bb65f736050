import { Link } from 'react-router-dom';
import { Table, Td, Th } from '../../../components/ui/table';
import type { VesselView } from '../../../../shared/vessels/vessel-view';
import { engineTitle, RatedRpm } from './engine-details';
import { vesselFacts } from './vessel-card';

/** The workshop's overview on wide screens: one row per vessel, its engines listed in the row. */
export function FleetTable({ vessels }: { vessels: VesselView[] }) {
  return (
    <Table>
      <caption className="sr-only">Vessels and engines of the workshop</caption>
      <thead>
        <tr>
          <Th>Vessel</Th>
          <Th>Skippers</Th>
          <Th>Engines</Th>
          <Th>Serial</Th>
          <Th>Rated full throttle</Th>
        </tr>
      </thead>
      <tbody>
        {vessels.map((vessel) => (
          <tr key={vessel.id}>
            <Td>
              <Link to={`/vessels/${vessel.id}`} className="font-bold underline underline-offset-4">
                {vessel.name}
              </Link>
              <p className="text-sm text-muted">{vesselFacts(vessel)}</p>
              <p className="figures text-sm">{vessel.hin}</p>
            </Td>
            <Td>
              {vessel.skippers.map((s) => s.name).join(', ') || (
                <span className="text-muted">none yet</span>
              )}
            </Td>
            <EngineColumns vessel={vessel} />
          </tr>
        ))}
      </tbody>
    </Table>
  );
}

function EngineColumns({ vessel }: { vessel: VesselView }) {
  if (vessel.engines.length === 0) {
    return (
      <Td colSpan={3} className="text-muted">
        No engines recorded yet
      </Td>
    );
  }
  return (
    <>
      <Td>
        {vessel.engines.map((e) => (
          <p key={e.id}>
            <Link to={`/engines/${e.id}`} className="underline underline-offset-4">
              {engineTitle(e)}
            </Link>
          </p>
        ))}
      </Td>
      <Td>
        {vessel.engines.map((e) => (
          <p key={e.id} className="figures">
            {e.serialNumber}
          </p>
        ))}
      </Td>
      <Td>
        {vessel.engines.map((e) => (
          <p key={e.id}>
            <RatedRpm engine={e} />
          </p>
        ))}
      </Td>
    </>
  );
}
