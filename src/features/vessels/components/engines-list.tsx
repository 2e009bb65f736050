import { Link } from 'react-router-dom';
import { engineNameWords } from '../../../../shared/engines/engine-words';
import type { EngineRow } from '../../../../shared/vessels/vessel-view';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Td } from '../../../components/ui/table';
import { formatDate, formatRpmRange } from '../../../lib/format';
import { useSorting, type SortValue } from '../use-sorting';
import { SortableList } from './sortable-list';
import { ArchivedPill, ChecklistPill, checklistStateOf } from './status-pills';

type Column = 'engine' | 'serial' | 'vessel' | 'rated' | 'commissioned' | 'checklist';
const checklistOrder = { 'not-started': 0, 'in-progress': 1, completed: 2 } as const;
const columns: Record<Column, (e: EngineRow) => SortValue> = {
  engine: (e) => `${e.maker} ${e.model}`,
  serial: (e) => e.serialNumber,
  vessel: (e) => e.vessel.name,
  rated: (e) => e.ratedRpmMax,
  commissioned: (e) => e.commissionedOn,
  checklist: (e) => checklistOrder[checklistStateOf(e)],
};
const labels: Record<Column, string> = {
  engine: 'Engine',
  serial: 'Serial',
  vessel: 'Vessel',
  rated: 'Rated full throttle',
  commissioned: 'Commissioned',
  checklist: 'Checklist',
};

export const engineName = (e: Pick<EngineRow, 'position' | 'maker' | 'model'>) =>
  engineNameWords(e);

/** Starts a new engine from this one: twin installations share everything but position and serial. */
function CopyButton({ engine, onCopy }: { engine: EngineRow; onCopy?: (e: EngineRow) => void }) {
  if (!onCopy || engine.archivedAt) return null;
  return (
    <div className="mt-2">
      <Button
        variant="secondary"
        aria-label={`Copy ${engineName(engine)} to add the second engine`}
        onClick={() => onCopy(engine)}
      >
        Copy for the twin
      </Button>
    </div>
  );
}

/** Engines as a sortable table on wide screens and as cards on phones; each opens its engine page. */
export function EnginesList({
  engines,
  showVessel = true,
  emptyText = 'No engines recorded yet.',
  onCopy,
}: {
  engines: EngineRow[];
  showVessel?: boolean;
  emptyText?: string;
  /** When given, each engine in use offers to start a new engine as a copy of it. */
  onCopy?: (engine: EngineRow) => void;
}) {
  const sorting = useSorting<EngineRow, Column>(engines, columns, {
    key: showVessel ? 'vessel' : 'engine',
    direction: 'ascending',
  });
  const shown = (Object.keys(labels) as Column[]).filter((c) => showVessel || c !== 'vessel');
  if (engines.length === 0) return <p className="py-4">{emptyText}</p>;
  return (
    <SortableList
      noun="Engines"
      rows={sorting.sorted}
      columns={shown}
      labels={labels}
      sort={sorting.sort}
      sortBy={sorting.sortBy}
      setSort={sorting.setSort}
      cells={(e) => <EngineCells engine={e} showVessel={showVessel} onCopy={onCopy} />}
      card={(e) => <EngineCard engine={e} showVessel={showVessel} onCopy={onCopy} />}
    />
  );
}

interface RowProps {
  engine: EngineRow;
  showVessel: boolean;
  onCopy?: (engine: EngineRow) => void;
}

function EngineCells({ engine: e, showVessel, onCopy }: RowProps) {
  return (
    <>
      <Td>
        <Link to={`/engines/${e.id}`} className="font-bold underline underline-offset-4">
          {engineName(e)}
        </Link>{' '}
        <ArchivedPill archivedAt={e.archivedAt} />
        <CopyButton engine={e} onCopy={onCopy} />
      </Td>
      <Td className="figures">{e.serialNumber}</Td>
      {showVessel && (
        <Td>
          <Link to={`/vessels/${e.vessel.id}`} className="underline underline-offset-4">
            {e.vessel.name}
          </Link>
        </Td>
      )}
      <Td className="figures whitespace-nowrap">
        {formatRpmRange(e.ratedRpmMin, e.ratedRpmMax)} RPM
      </Td>
      <Td>
        {e.commissionedOn ? formatDate(e.commissionedOn) : <span className="text-muted">—</span>}
      </Td>
      <Td>
        <Link
          to={`/engines/${e.id}/checklist`}
          aria-label={`Checklist of ${engineName(e)}, ${e.serialNumber}`}
        >
          <ChecklistPill engine={e} />
        </Link>
      </Td>
    </>
  );
}

function EngineCard({ engine: e, showVessel, onCopy }: RowProps) {
  return (
    <Card
      level={3}
      title={
        <Link
          to={`/engines/${e.id}`}
          className="flex min-h-touch items-center underline underline-offset-4"
        >
          {engineName(e)}
        </Link>
      }
    >
      <p className="figures">{e.serialNumber}</p>
      {showVessel && (
        <p>
          <span className="text-muted">On </span>
          {e.vessel.name}
        </p>
      )}
      <p>
        <span className="text-muted">Rated </span>
        <span className="figures">{formatRpmRange(e.ratedRpmMin, e.ratedRpmMax)} RPM</span>
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <ChecklistPill engine={e} /> <ArchivedPill archivedAt={e.archivedAt} />
      </div>
      <Link
        to={`/engines/${e.id}/checklist`}
        className="mt-2 flex min-h-touch items-center font-semibold underline underline-offset-4"
      >
        Commissioning checklist
      </Link>
      <CopyButton engine={e} onCopy={onCopy} />
    </Card>
  );
}
