import { Link } from 'react-router-dom';
import { engineNameWords } from '../../../../shared/engines/engine-words';
import { VESSEL_TYPE_WORDS } from '../../../../shared/vessels/vessel-words';
import type { VesselView } from '../../../../shared/vessels/vessel-view';
import { Card } from '../../../components/ui/card';
import { Td } from '../../../components/ui/table';
import { useSorting, type SortValue } from '../use-sorting';
import { SortableList } from './sortable-list';
import { ArchivedPill } from './status-pills';

type Column = 'name' | 'type' | 'homePort' | 'skippers' | 'engines';
const columns: Record<Column, (v: VesselView) => SortValue> = {
  name: (v) => v.name,
  type: (v) => VESSEL_TYPE_WORDS[v.type],
  homePort: (v) => v.homePort,
  skippers: (v) => v.skippers.map((s) => s.name).join(', '),
  engines: (v) => v.engines.length,
};
const labels: Record<Column, string> = {
  name: 'Vessel',
  type: 'Type',
  homePort: 'Home port',
  skippers: 'Skippers',
  engines: 'Engines',
};

const enginesText = (v: VesselView) =>
  v.engines.length === 0 ? 'none yet' : v.engines.map(engineNameWords).join('; ');

/** Vessels as a sortable table on wide screens and as cards on phones. */
export function VesselsList({ vessels }: { vessels: VesselView[] }) {
  const sorting = useSorting<VesselView, Column>(vessels, columns, {
    key: 'name',
    direction: 'ascending',
  });
  if (vessels.length === 0)
    return (
      <p className="py-4">No vessels match. Change the search or the filter, or add a vessel.</p>
    );
  return (
    <SortableList
      noun="Vessels"
      rows={sorting.sorted}
      columns={Object.keys(labels) as Column[]}
      labels={labels}
      sort={sorting.sort}
      sortBy={sorting.sortBy}
      setSort={sorting.setSort}
      cells={(v) => <VesselCells vessel={v} />}
      card={(v) => <VesselListCard vessel={v} />}
    />
  );
}

function VesselCells({ vessel: v }: { vessel: VesselView }) {
  return (
    <>
      <Td>
        <Link to={`/vessels/${v.id}`} className="font-bold underline underline-offset-4">
          {v.name}
        </Link>{' '}
        <ArchivedPill archivedAt={v.archivedAt} />
        {v.hin && <p className="figures text-sm text-muted">{v.hin}</p>}
      </Td>
      <Td>
        {VESSEL_TYPE_WORDS[v.type]}
        {v.lengthM !== null && <span className="figures text-muted"> · {v.lengthM} m</span>}
      </Td>
      <Td>{v.homePort || <span className="text-muted">—</span>}</Td>
      <Td>
        {v.skippers.map((s) => s.name).join(', ') || (
          <span className="text-muted">none linked</span>
        )}
      </Td>
      <Td>
        <span className="figures font-bold">{v.engines.length}</span>{' '}
        <span className="text-sm text-muted">{enginesText(v)}</span>
      </Td>
    </>
  );
}

function VesselListCard({ vessel: v }: { vessel: VesselView }) {
  return (
    <Card
      level={3}
      title={
        <Link
          to={`/vessels/${v.id}`}
          className="flex min-h-touch items-center underline underline-offset-4"
        >
          {v.name}
        </Link>
      }
    >
      <ArchivedPill archivedAt={v.archivedAt} />
      <p className="text-muted">
        {[VESSEL_TYPE_WORDS[v.type], v.lengthM !== null ? `${v.lengthM} m` : null, v.homePort]
          .filter(Boolean)
          .join(' · ')}
      </p>
      <p>
        <span className="text-muted">Skippers </span>
        {v.skippers.map((s) => s.name).join(', ') || 'none linked'}
      </p>
      <p>
        <span className="text-muted">Engines </span>
        {enginesText(v)}
      </p>
    </Card>
  );
}
