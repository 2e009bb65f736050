import { useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import type { EngineRow } from '../../../shared/vessels/vessel-view';
import { AssignProgram } from '../../features/programs/components/assign-program';
import { AttachmentPanel } from '../../features/attachments/components/attachment-panel';
import { boardKeys } from '../../features/board/api';
import { EngineRuns } from '../../features/service/components/engine-runs';
import { FirstServiceCard } from '../../features/service/components/first-service-card';
import { useVesselList } from '../../features/vessels/api';
import { useArchiveEngine, useEngine } from '../../features/vessels/engine-api';
import { ArchiveControl } from '../../features/vessels/components/archive-control';
import { EngineFacts } from '../../features/vessels/components/engine-facts';
import { EngineForm } from '../../features/vessels/components/engine-form';
import { engineName } from '../../features/vessels/components/engines-list';
import { ArchivedPill, ChecklistPill } from '../../features/vessels/components/status-pills';
import { Button } from '../../components/ui/button';
import { ButtonLink } from '../../components/ui/button-link';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { SkipperEngine } from './skipper-engine';
import { formatDate } from '../../lib/format';
import { useSessionUser } from '../shell/session';

function DetailsCard({ engine }: { engine: EngineRow }) {
  const [editing, setEditing] = useState(false);
  const vessels = useVesselList({ q: '', status: 'active' });
  return (
    <Card title="Engine record">
      {editing ? (
        <EngineForm
          engine={engine}
          vesselId={engine.vesselId}
          vessels={vessels.data?.map(({ id, name }) => ({ id, name }))}
          onSaved={() => setEditing(false)}
          onCancel={() => setEditing(false)}
        />
      ) : (
        <div className="flex flex-col gap-4">
          <EngineFacts engine={engine} />
          {!engine.archivedAt && (
            <Button variant="secondary" className="self-start" onClick={() => setEditing(true)}>
              Edit engine
            </Button>
          )}
        </div>
      )}
    </Card>
  );
}

/** The checklist's state and the way to start, continue or view it. */
function ChecklistCard({ engine: e }: { engine: EngineRow }) {
  return (
    <Card title="Commissioning checklist">
      <div className="flex flex-wrap items-center gap-3">
        <ChecklistPill engine={e} />
        {e.checklist?.completedAt && <span>Completed {formatDate(e.checklist.completedAt)}</span>}
      </div>
      <ButtonLink to={`/engines/${e.id}/checklist`} className="mt-3">
        {e.checklist?.completedAt
          ? 'View the checklist'
          : e.checklist
            ? 'Continue the checklist'
            : 'Start the checklist'}
      </ButtonLink>
    </Card>
  );
}

/** The engine's record: its runs, then the first service due or done (recording it also clears the board's flag). */
function EngineRecordCards({ engine: e }: { engine: EngineRow }) {
  const user = useSessionUser();
  const queryClient = useQueryClient();
  return (
    <>
      <Card title="Break-in runs">
        <EngineRuns engineId={e.id} />
      </Card>
      <Card title="First service">
        <FirstServiceCard
          engineId={e.id}
          userName={user.name}
          onRecorded={() => queryClient.invalidateQueries({ queryKey: boardKeys.all })}
          attachments={(serviceId) => (
            <AttachmentPanel recordType="service" recordId={serviceId} canAdd />
          )}
        />
      </Card>
    </>
  );
}

function EnginePage({ id }: { id: string }) {
  const engine = useEngine(id);
  const archive = useArchiveEngine();
  if (engine.isPending) return <Loading label="Loading the engine…" />;
  if (engine.isError)
    return <LoadError error={engine.error} what="the engine" onRetry={() => engine.refetch()} />;
  const e = engine.data;
  return (
    <div className="flex flex-col gap-5">
      <title>{`${engineName(e)} · Ringseat`}</title>
      <Link
        to={`/vessels/${e.vessel.id}`}
        className="flex min-h-touch items-center self-start underline underline-offset-4"
      >
        ← {e.vessel.name}
      </Link>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-3xl font-bold">{engineName(e)}</h1>
        <ArchivedPill archivedAt={e.archivedAt} />
      </div>
      <p className="figures text-lg">{e.serialNumber}</p>
      <EngineRecordCards engine={e} />
      <ChecklistCard engine={e} />
      <DetailsCard engine={e} />
      {!e.archivedAt && (
        <Card title="Assign break-in program" aria-label="Assign break-in program">
          <AssignProgram engineId={e.id} />
        </Card>
      )}
      <Card title="Photos and documents">
        <AttachmentPanel recordType="engine" recordId={e.id} canAdd={!e.archivedAt} />
      </Card>
      <ArchiveControl
        what="this engine"
        archived={Boolean(e.archivedAt)}
        pending={archive.isPending}
        error={archive.error}
        onChange={(archived) => archive.mutate({ id: e.id, archived })}
      />
    </div>
  );
}

export function EngineRoute() {
  const { id = '' } = useParams();
  const user = useSessionUser();
  if (user.role === 'skipper') return <SkipperEngine key={id} id={id} />;
  return <EnginePage key={id} id={id} />;
}

export { EngineRoute as Component };
