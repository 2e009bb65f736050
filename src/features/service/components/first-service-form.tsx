import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import {
  ACCEPTED_FILE_TYPES,
  ACCEPTED_TYPE_WORDS,
} from '../../../../shared/attachments/attachment.schema';
import {
  FIRST_SERVICE_FIELDS,
  FirstServiceInputSchema,
  type FirstServiceFormInput,
  type FirstServiceInput,
} from '../../../../shared/service/service-record.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, TextField, controlClass } from '../../../components/ui/field';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useRecordFirstService, type RecordedFirstService } from '../api';

/** Typed text to the number the schema checks: empty is "not entered", a comma a decimal point. */
const hoursOrNaN = (value: unknown) => {
  const text = String(value ?? '')
    .trim()
    .replace(',', '.');
  return text === '' ? undefined : Number(text);
};

interface FirstServiceFormProps {
  engineId: string;
  /** The signed-in person, the usual one to have done the work. */
  defaultDoneBy: string;
  /** The workshop's today, YYYY-MM-DD: the usual day to record it. */
  today: string;
  onSaved?: (result: RecordedFirstService) => void;
}

function useFirstServiceForm({ engineId, defaultDoneBy, today, onSaved }: FirstServiceFormProps) {
  const save = useRecordFirstService(engineId);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [file, setFile] = useState<File | null>(null);
  const form = useForm<FirstServiceFormInput, unknown, FirstServiceInput>({
    resolver: zodResolver(FirstServiceInputSchema),
    defaultValues: { date: today, doneBy: defaultDoneBy, notes: '' },
  });
  const onSubmit = form.handleSubmit((input) => {
    setRefusal(null);
    save.mutate(
      { input, file },
      {
        onSuccess: (result) => onSaved?.(result),
        onError: (error) => {
          const messages = serverErrorMessages(error, form.setError, FIRST_SERVICE_FIELDS);
          setRefusal(messages.join(' ') || null);
        },
      },
    );
  });
  return { form, save, refusal, onSubmit, setFile };
}

function AttachmentField({ onChoose }: { onChoose: (file: File | null) => void }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        Attachment (optional)
      </label>
      <p id={`${id}-hint`} className="text-sm text-muted">
        {`The service sheet or invoice: ${ACCEPTED_TYPE_WORDS}.`}
      </p>
      <input
        id={id}
        type="file"
        accept={Object.keys(ACCEPTED_FILE_TYPES).join(',')}
        aria-describedby={`${id}-hint`}
        className="min-h-touch rounded-md border-2 border-dashed border-line bg-surface p-2"
        onChange={(e) => onChoose(e.target.files?.[0] ?? null)}
      />
    </div>
  );
}

/** Records the first service done: checked here with the shared schema, and again on the server. */
export function FirstServiceForm(props: FirstServiceFormProps) {
  const { form, save, refusal, onSubmit, setFile } = useFirstServiceForm(props);
  const { register, formState } = form;
  const errors = formState.errors;
  return (
    <form
      noValidate
      onSubmit={onSubmit}
      className="flex flex-col gap-4"
      aria-label="Record the first service"
    >
      {refusal && <Alert title="First service not saved">{refusal}</Alert>}
      <TextField label="Date" type="date" error={errors.date?.message} {...register('date')} />
      <TextField
        label="Hour meter"
        inputMode="decimal"
        autoComplete="off"
        hint="Hours on the engine's hour meter at the service."
        className="figures"
        error={errors.hourMeter?.message}
        {...register('hourMeter', { setValueAs: hoursOrNaN })}
      />
      <TextField label="Done by" error={errors.doneBy?.message} {...register('doneBy')} />
      <Field
        label="Notes"
        hint="Optional: what was done, parts used."
        error={errors.notes?.message}
      >
        {(c) => (
          <textarea {...c} rows={3} className={`${controlClass} py-2`} {...register('notes')} />
        )}
      </Field>
      <AttachmentField onChoose={setFile} />
      <Button type="submit" pending={save.isPending} pendingLabel="Saving…" className="self-start">
        Save first service
      </Button>
    </form>
  );
}
