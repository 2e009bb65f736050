import { Link } from 'react-router-dom';
import type { SkipperOption } from '../../../../shared/vessels/vessel-view';
import { Card } from '../../../components/ui/card';
import { Td } from '../../../components/ui/table';
import { useSorting, type SortValue } from '../use-sorting';
import { SortableList } from './sortable-list';

type Column = 'name' | 'email' | 'vessels';
type Row = SkipperOption & { vessels: Array<{ id: string; name: string }> };
const columns: Record<Column, (s: Row) => SortValue> = {
  name: (s) => s.name,
  email: (s) => s.email,
  vessels: (s) => s.vessels.length,
};
const labels: Record<Column, string> = { name: 'Skipper', email: 'E-mail', vessels: 'Vessels' };

const folded = (text: string) => text.toLocaleLowerCase('en-GB');
const matches = (row: Row, q: string) =>
  !q ||
  [row.name, row.email, ...row.vessels.map((v) => v.name)].some((t) =>
    folded(t).includes(folded(q)),
  );

function VesselLinks({ vessels }: { vessels: Row['vessels'] }) {
  if (vessels.length === 0) return <span className="text-muted">none linked</span>;
  return (
    <>
      {vessels.map((v, i) => (
        <span key={v.id}>
          {i > 0 && ', '}
          <Link to={`/vessels/${v.id}`} className="underline underline-offset-4">
            {v.name}
          </Link>
        </span>
      ))}
    </>
  );
}

function SkipperCells({ skipper: s }: { skipper: Row }) {
  return (
    <>
      <Td className="font-bold">{s.name}</Td>
      <Td className="break-all">{s.email}</Td>
      <Td>
        <VesselLinks vessels={s.vessels} />
      </Td>
    </>
  );
}

function SkipperCard({ skipper: s }: { skipper: Row }) {
  return (
    <Card level={3} title={s.name}>
      <p className="break-all text-muted">{s.email}</p>
      <p>
        <span className="text-muted">Vessels </span>
        <VesselLinks vessels={s.vessels} />
      </p>
    </Card>
  );
}

/** The workshop's skippers and the vessels each may log; linking is done on the vessel's page. */
export function SkippersList({
  skippers,
  vesselNames,
  q,
}: {
  skippers: SkipperOption[];
  vesselNames: Map<string, string>;
  q: string;
}) {
  const rows: Row[] = skippers
    .map((s) => ({
      ...s,
      vessels: s.vesselIds
        .filter((id) => vesselNames.has(id))
        .map((id) => ({ id, name: vesselNames.get(id)! })),
    }))
    .filter((row) => matches(row, q));
  const { sorted, sort, sortBy, setSort } = useSorting<Row, Column>(rows, columns, {
    key: 'name',
    direction: 'ascending',
  });
  if (rows.length === 0)
    return (
      <p className="py-4">No skippers match. Skippers join through an invite from the Team page.</p>
    );
  return (
    <SortableList
      noun="Skippers"
      rows={sorted}
      columns={Object.keys(labels) as Column[]}
      labels={labels}
      sort={sort}
      sortBy={sortBy}
      setSort={setSort}
      cells={(s) => <SkipperCells skipper={s} />}
      card={(s) => <SkipperCard skipper={s} />}
    />
  );
}
