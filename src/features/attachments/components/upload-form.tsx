import { useId, useRef, useState, type FormEvent, type RefObject } from 'react';
import {
  ACCEPTED_FILE_TYPES,
  ACCEPTED_TYPE_WORDS,
  MAX_ATTACHMENT_BYTES,
  type AttachmentRecordType,
} from '../../../../shared/attachments/attachment.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { errorMessage } from '../../../lib/api-client';
import { TooLargeError, useUploadAttachment } from '../api';

const accept = Object.keys(ACCEPTED_FILE_TYPES).join(',');

/** Why the last upload failed, in words; null when it did not. */
function uploadProblem(error: Error | null): string | null {
  if (!error) return null;
  return error instanceof TooLargeError ? error.message : errorMessage(error);
}

function FileField({
  inputRef,
  onChoose,
}: {
  inputRef: RefObject<HTMLInputElement | null>;
  onChoose: (file: File | null) => void;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        Photo or document
      </label>
      <p
        id={`${id}-hint`}
        className="text-sm text-muted"
      >{`Send ${ACCEPTED_TYPE_WORDS}, up to ${MAX_ATTACHMENT_BYTES / (1024 * 1024)} MB.`}</p>
      <input
        ref={inputRef}
        id={id}
        type="file"
        accept={accept}
        aria-describedby={`${id}-hint`}
        className="min-h-touch rounded-md border-2 border-dashed border-line bg-surface p-2 file:mr-3 file:min-h-10 file:rounded-md file:border-2 file:border-ink file:bg-surface file:px-3 file:font-semibold file:text-ink"
        onChange={(e) => onChoose(e.target.files?.[0] ?? null)}
      />
    </div>
  );
}

/** The chosen file and caption, and sending them; a sent file clears the form for the next. */
function useUploadForm(recordType: AttachmentRecordType, recordId: string) {
  const upload = useUploadAttachment(recordType, recordId);
  const [file, setFile] = useState<File | null>(null);
  const [caption, setCaption] = useState('');
  const [missing, setMissing] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    if (!file) return setMissing(true);
    upload.mutate(
      { file, caption },
      {
        onSuccess: () => {
          setFile(null);
          setCaption('');
          if (input.current) input.current.value = '';
        },
      },
    );
  };
  const choose = (chosen: File | null) => {
    setFile(chosen);
    setMissing(false);
    upload.reset();
  };
  const problem = missing ? 'Choose a photo or document first.' : uploadProblem(upload.error);
  return { upload, caption, setCaption, input, onSubmit, choose, problem };
}

/** Picks one photo or document, with an optional caption, and sends it. */
export function UploadForm({
  recordType,
  recordId,
}: {
  recordType: AttachmentRecordType;
  recordId: string;
}) {
  const { upload, caption, setCaption, input, onSubmit, choose, problem } = useUploadForm(
    recordType,
    recordId,
  );
  return (
    <form
      noValidate
      onSubmit={onSubmit}
      className="flex flex-col gap-3"
      aria-label="Add a photo or document"
    >
      {problem && <Alert title="Not attached">{problem}</Alert>}
      <FileField inputRef={input} onChoose={choose} />
      <TextField
        label="Caption (optional)"
        value={caption}
        maxLength={200}
        onChange={(e) => setCaption(e.target.value)}
        hint="What it shows, e.g. hour meter at handover"
      />
      <Button
        type="submit"
        variant="secondary"
        className="self-start"
        pending={upload.isPending}
        pendingLabel="Uploading…"
      >
        Attach file
      </Button>
    </form>
  );
}
