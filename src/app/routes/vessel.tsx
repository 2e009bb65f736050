import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { VESSEL_TYPE_WORDS } from '../../../shared/vessels/vessel-words';
import type { EngineRow, VesselView } from '../../../shared/vessels/vessel-view';
import { useArchiveVessel, useVessel } from '../../features/vessels/api';
import { useEngineList } from '../../features/vessels/engine-api';
import { ArchiveControl } from '../../features/vessels/components/archive-control';
import { EngineForm } from '../../features/vessels/components/engine-form';
import { engineName, EnginesList } from '../../features/vessels/components/engines-list';
import { SkipperLinks } from '../../features/vessels/components/skipper-links';
import { ArchivedPill } from '../../features/vessels/components/status-pills';
import { DecideTogetherLink } from './decide-together-link';
import { VesselForm } from '../../features/vessels/components/vessel-form';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { StaffOnly } from './staff-only';

function VesselFacts({ vessel }: { vessel: VesselView }) {
  const facts: Array<[string, string]> = [
    ['Type', VESSEL_TYPE_WORDS[vessel.type]],
    ['Length', vessel.lengthM !== null ? `${vessel.lengthM} m` : '—'],
    ['Home port', vessel.homePort || '—'],
    ['HIN', vessel.hin || '—'],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
      {facts.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-muted">{label}</dt>
          <dd className={label === 'HIN' ? 'figures' : undefined}>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** "New engine", or a twin copied from one already on the vessel. */
type Adding = { copyFrom?: EngineRow } | null;

function NewEngine({
  vessel,
  adding,
  onClose,
}: {
  vessel: VesselView;
  adding: Adding;
  onClose: () => void;
}) {
  const navigate = useNavigate();
  const source = adding?.copyFrom;
  return (
    <div className="mt-4 flex flex-col gap-3 border-t-2 border-line pt-4">
      <h3 className="text-lg font-bold">
        {source
          ? `Second engine on ${vessel.name}, copied from ${engineName(source)}`
          : `New engine on ${vessel.name}`}
      </h3>
      {source && <p>Everything is copied but the position and the serial number: enter those.</p>}
      <EngineForm
        key={source?.id ?? 'new'}
        vesselId={vessel.id}
        copyFrom={source}
        onSaved={(e) => navigate(`/engines/${e.id}`)}
        onCancel={onClose}
      />
    </div>
  );
}

function EnginesCard({ vessel }: { vessel: VesselView }) {
  const [adding, setAdding] = useState<Adding>(null);
  const engines = useEngineList({ q: '', status: 'all', vesselId: vessel.id });
  const open = !vessel.archivedAt;
  return (
    <Card title="Engines">
      {engines.isPending && <Loading label="Loading engines…" />}
      {engines.isError && (
        <LoadError error={engines.error} what="the engines" onRetry={() => engines.refetch()} />
      )}
      {engines.data && (
        <EnginesList
          engines={engines.data}
          showVessel={false}
          onCopy={open && !adding ? (copyFrom) => setAdding({ copyFrom }) : undefined}
        />
      )}
      {open && adding && (
        <NewEngine vessel={vessel} adding={adding} onClose={() => setAdding(null)} />
      )}
      {open && !adding && (
        <Button className="mt-4" onClick={() => setAdding({})}>
          Add an engine
        </Button>
      )}
    </Card>
  );
}

/** The vessel's facts, edited in place. */
function VesselRecordCard({ vessel: v }: { vessel: VesselView }) {
  const [editing, setEditing] = useState(false);
  return (
    <Card title="Vessel">
      {editing ? (
        <VesselForm
          vessel={v}
          onSaved={() => setEditing(false)}
          onCancel={() => setEditing(false)}
        />
      ) : (
        <div className="flex flex-col gap-4">
          <VesselFacts vessel={v} />
          {!v.archivedAt && (
            <Button variant="secondary" className="self-start" onClick={() => setEditing(true)}>
              Edit vessel
            </Button>
          )}
        </div>
      )}
    </Card>
  );
}

function VesselPage({ id }: { id: string }) {
  const vessel = useVessel(id);
  const archive = useArchiveVessel();
  if (vessel.isPending) return <Loading label="Loading the vessel…" />;
  if (vessel.isError)
    return <LoadError error={vessel.error} what="the vessel" onRetry={() => vessel.refetch()} />;
  const v = vessel.data;
  return (
    <div className="flex flex-col gap-5">
      <title>{`${v.name} · Ringseat`}</title>
      <Link
        to="/vessels"
        className="flex min-h-touch items-center self-start underline underline-offset-4"
      >
        ← All vessels
      </Link>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-3xl font-bold">{v.name}</h1>
        <ArchivedPill archivedAt={v.archivedAt} />
      </div>
      <DecideTogetherLink
        vesselId={v.id}
        className="rounded-md border-2 border-ink bg-surface p-3"
      />
      <VesselRecordCard vessel={v} />
      <EnginesCard vessel={v} />
      <Card title="Skippers">
        <SkipperLinks vessel={v} />
      </Card>
      <ArchiveControl
        what={v.name}
        archived={Boolean(v.archivedAt)}
        pending={archive.isPending}
        error={archive.error}
        onChange={(archived) => archive.mutate({ id: v.id, archived })}
      />
    </div>
  );
}

export function VesselRoute() {
  const { id = '' } = useParams();
  return (
    <StaffOnly title="Vessel">
      <VesselPage key={id} id={id} />
    </StaffOnly>
  );
}

export { VesselRoute as Component };
