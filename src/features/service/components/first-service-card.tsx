import { format } from 'date-fns';
import { useState, type ReactNode } from 'react';
import { Alert } from '../../../components/ui/alert';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { useEngineRuns, useServiceDue, type RecordedFirstService } from '../api';
import { FirstServiceForm } from './first-service-form';
import { ServiceDuePanel } from './service-due-panel';

/** Said wherever the first service is recorded: the work on the engine can hurt someone. */
function ServiceCaution() {
  return (
    <p className="rounded-md border-2 border-ink p-3 text-sm">
      <strong>Before working on the engine:</strong> stop it and take the kill-switch lanyard off;
      run it only in the water or on a flushing device, outdoors or well ventilated (exhaust carbon
      monoxide); no flame or spark near fuel or batteries. The engine maker&rsquo;s manual, local
      rules and licensed technicians come first.
    </p>
  );
}

function RecordSection({
  engineId,
  userName,
  onSaved,
}: {
  engineId: string;
  userName: string;
  onSaved: (result: RecordedFirstService) => void;
}) {
  return (
    <section aria-labelledby="record-first-service" className="flex flex-col gap-3">
      <h3 id="record-first-service" className="text-lg font-bold">
        Record the first service
      </h3>
      <ServiceCaution />
      <FirstServiceForm
        engineId={engineId}
        defaultDoneBy={userName}
        today={format(new Date(), 'yyyy-MM-dd')}
        onSaved={onSaved}
      />
    </section>
  );
}

interface FirstServiceCardProps {
  engineId: string;
  /** The signed-in person, the usual one to have done the work. */
  userName: string;
  /** Files on the recorded service (the attachments feature, composed by the page). */
  attachments?: (serviceId: string) => ReactNode;
  onRecorded?: () => void;
}

/** The first service due with its working, the calendar file, and recording it once done. */
export function FirstServiceCard({
  engineId,
  userName,
  attachments,
  onRecorded,
}: FirstServiceCardProps) {
  const due = useServiceDue(engineId);
  const runs = useEngineRuns(engineId);
  const [attachmentProblem, setAttachmentProblem] = useState<string | null>(null);
  if (due.isPending) return <Loading label="Working out the first service…" />;
  if (due.isError)
    return <LoadError error={due.error} what="the first service" onRetry={() => due.refetch()} />;
  const view = due.data;
  const signedOff = runs.data?.some((r) => r.state === 'signed-off') ?? false;
  return (
    <ServiceDuePanel view={view}>
      {attachmentProblem && <Alert title="File not attached">{attachmentProblem}</Alert>}
      {view.firstServiceDone && attachments?.(view.firstServiceDone.id)}
      {!view.firstServiceDone && signedOff && (
        <RecordSection
          engineId={engineId}
          userName={userName}
          onSaved={(result) => {
            setAttachmentProblem(result.attachmentProblem);
            onRecorded?.();
          }}
        />
      )}
      {!view.firstServiceDone && !signedOff && runs.isSuccess && (
        <p className="text-muted">
          The first service can be recorded here once a break-in run of this engine is signed off.
        </p>
      )}
    </ServiceDuePanel>
  );
}
