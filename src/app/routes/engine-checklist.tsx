import { Link, useParams } from 'react-router-dom';
import { AttachmentPanel } from '../../features/attachments/components/attachment-panel';
import { useChecklist } from '../../features/checklists/api';
import { ChecklistForm } from '../../features/checklists/components/checklist-form';
import { CommissioningCautions } from '../../features/checklists/components/commissioning-cautions';
import { useInvalidateFleet } from '../../features/vessels/api';
import { useEngine } from '../../features/vessels/engine-api';
import { engineName } from '../../features/vessels/components/engines-list';
import { Card } from '../../components/ui/card';
import { LoadError, Loading } from '../../components/ui/status-message';
import { StaffOnly } from './staff-only';

function ChecklistPage({ engineId }: { engineId: string }) {
  const engine = useEngine(engineId);
  const checklist = useChecklist(engineId);
  const refreshFleet = useInvalidateFleet();
  if (engine.isPending || checklist.isPending) return <Loading label="Loading the checklist…" />;
  if (engine.isError)
    return <LoadError error={engine.error} what="the engine" onRetry={() => engine.refetch()} />;
  if (checklist.isError)
    return (
      <LoadError error={checklist.error} what="the checklist" onRetry={() => checklist.refetch()} />
    );
  const e = engine.data;
  return (
    <div className="flex flex-col gap-5">
      <title>{`Checklist · ${engineName(e)} · Ringseat`}</title>
      <Link
        to={`/engines/${e.id}`}
        className="flex min-h-touch items-center self-start underline underline-offset-4"
      >
        ← {engineName(e)}
      </Link>
      <div>
        <h1 className="text-3xl font-bold">Commissioning checklist</h1>
        <p className="text-lg">
          {e.vessel.name} · {engineName(e)} · <span className="figures">{e.serialNumber}</span>
        </p>
      </div>
      <CommissioningCautions />
      <ChecklistForm checklist={checklist.data} engine={e} onChanged={() => void refreshFleet()} />
      <Card title="Photos for the checklist">
        {checklist.data.id ? (
          <AttachmentPanel recordType="checklist" recordId={checklist.data.id} canAdd />
        ) : (
          <p>
            Save the checklist once, then add photos of the hour meter, the tachometer and the
            installation here.
          </p>
        )}
      </Card>
    </div>
  );
}

export function EngineChecklistRoute() {
  const { id = '' } = useParams();
  return (
    <StaffOnly title="Commissioning checklist">
      <ChecklistPage key={id} engineId={id} />
    </StaffOnly>
  );
}

export { EngineChecklistRoute as Component };
