import { useState } from 'react';
import type {
  AttachmentRecordType,
  AttachmentView,
} from '../../../../shared/attachments/attachment.schema';
import { isImage } from '../../../../shared/attachments/attachment.schema';
import { Button } from '../../../components/ui/button';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { formatDate } from '../../../lib/format';
import { useAttachments, useRemoveAttachment } from '../api';
import { UploadForm } from './upload-form';

const sizeText = (bytes: number) =>
  bytes < 1024 * 1024
    ? `${Math.max(1, Math.round(bytes / 1024))} KB`
    : `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/** Removing deletes the file for good, so it asks once more. */
function RemoveButton({
  name,
  removing,
  onRemove,
}: {
  name: string;
  removing: boolean;
  onRemove: () => void;
}) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming)
    return (
      <Button
        variant="quiet"
        className="self-start px-0"
        aria-label={`Remove ${name}`}
        onClick={() => setConfirming(true)}
      >
        Remove
      </Button>
    );
  return (
    <div role="group" aria-label={`Remove ${name} for good?`} className="flex flex-wrap gap-2">
      <Button
        variant="secondary"
        className="px-2"
        pending={removing}
        pendingLabel="Removing…"
        onClick={onRemove}
      >
        Remove for good
      </Button>
      <Button variant="quiet" className="px-2" onClick={() => setConfirming(false)}>
        Keep
      </Button>
    </div>
  );
}

function AttachmentItem({
  attachment,
  onRemove,
  removing,
}: {
  attachment: AttachmentView;
  onRemove?: () => void;
  removing: boolean;
}) {
  const name = attachment.caption || attachment.originalName;
  return (
    <li className="flex flex-col gap-2 rounded-md border-2 border-line bg-paper p-2">
      {isImage(attachment.mimeType) ? (
        <a href={attachment.url} target="_blank" rel="noopener" className="block">
          <img
            src={attachment.url}
            alt={name}
            loading="lazy"
            className="aspect-[4/3] w-full rounded object-cover"
          />
        </a>
      ) : (
        <a
          href={attachment.url}
          className="flex min-h-touch items-center gap-2 font-semibold underline underline-offset-4"
          download={attachment.originalName}
        >
          <span aria-hidden="true" className="rounded border-2 border-ink px-1 text-sm">
            PDF
          </span>
          Download {attachment.originalName}
        </a>
      )}
      <p className="break-words font-semibold">{name}</p>
      <p className="text-sm text-muted">
        {attachment.uploadedBy.name} · {formatDate(attachment.createdAt)} ·{' '}
        <span className="figures">{sizeText(attachment.sizeBytes)}</span>
      </p>
      {onRemove && <RemoveButton name={name} removing={removing} onRemove={onRemove} />}
    </li>
  );
}

/** Photos and documents on one record. Only people allowed to see the record get here, or get the files. */
export function AttachmentPanel({
  recordType,
  recordId,
  canAdd,
  canRemove = canAdd,
}: {
  recordType: AttachmentRecordType;
  recordId: string;
  canAdd: boolean;
  canRemove?: boolean;
}) {
  const attachments = useAttachments(recordType, recordId);
  const remove = useRemoveAttachment(recordType, recordId);
  return (
    <div className="flex flex-col gap-4">
      {attachments.isPending && <Loading label="Loading photos and documents…" />}
      {attachments.isError && (
        <LoadError
          error={attachments.error}
          what="the photos and documents"
          onRetry={() => attachments.refetch()}
        />
      )}
      {attachments.data?.length === 0 && <p className="text-muted">No photos or documents yet.</p>}
      {attachments.data && attachments.data.length > 0 && (
        <ul
          className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4"
          aria-label="Photos and documents"
        >
          {attachments.data.map((a) => (
            <AttachmentItem
              key={a.id}
              attachment={a}
              removing={remove.isPending}
              onRemove={canRemove ? () => remove.mutate(a.id) : undefined}
            />
          ))}
        </ul>
      )}
      {canAdd && <UploadForm recordType={recordType} recordId={recordId} />}
    </div>
  );
}
