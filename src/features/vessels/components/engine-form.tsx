import { useState } from 'react';
import { useForm, useWatch, type Control } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  ENGINE_FIELDS,
  EngineInputSchema,
  type EngineFormInput,
  type EngineInput,
} from '../../../../shared/engines/engine.schema';
import { tachDialSetting } from '../../../../shared/engine-speed/engine-speed';
import { SignalSourceSchema } from '../../../../shared/engine-speed/signal-source.schema';
import type { EngineRow, EngineView } from '../../../../shared/vessels/vessel-view';
import { Alert } from '../../../components/ui/alert';
import { SelectField } from '../../../components/ui/field';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useSaveEngine } from '../engine-api';
import {
  CommissioningFields,
  IdentityFields,
  RatingFields,
  TachFields,
} from './engine-form-fields';
import { FormActions } from './form-actions';

interface EngineFormProps {
  /** The engine being edited; a new engine when absent. */
  engine?: EngineView;
  /** A new engine starts as a copy of this one (a twin), all but its position and serial number. */
  copyFrom?: EngineView;
  vesselId: string;
  /** When given, the engine can be moved to another of these vessels. */
  vessels?: Array<{ id: string; name: string }>;
  onSaved: (engine: EngineRow) => void;
  onCancel?: () => void;
}

const blank: Partial<EngineFormInput> = {
  position: 'single',
  installation: 'outboard',
  fuel: 'petrol',
  cycle: 'four-stroke',
  tachSource: 'none',
};

function valuesOf(engine: EngineView | undefined, vesselId: string): Partial<EngineFormInput> {
  if (!engine) return { ...blank, vesselId };
  const values: Record<string, unknown> = {};
  for (const field of ENGINE_FIELDS) values[field] = engine[field as keyof EngineView];
  return values as Partial<EngineFormInput>;
}

/** A twin's values: the engine copied, with position and serial number left to fill in. */
function copiedValues(source: EngineView, vesselId: string): Partial<EngineFormInput> {
  const { position: _position, serialNumber: _serial, ...rest } = valuesOf(source, vesselId);
  return { ...rest, vesselId, serialNumber: '' };
}

/** The number to dial into the helm tachometer, once the signal source is complete. */
function useDialHint(control: Control<EngineFormInput>): string | null {
  const [kind, poles, pulleyRatio] = useWatch({
    control,
    name: ['tachSource', 'poles', 'pulleyRatio'],
  });
  const source = SignalSourceSchema.safeParse({ kind, poles, pulleyRatio });
  if (!source.success) return null;
  const polesDial = tachDialSetting(source.data, 'poles');
  const pulsesDial = tachDialSetting(source.data, 'pulses-per-rev');
  const round = (n: number) => Math.round(n * 100) / 100;
  return `Helm tachometer setting: ${round(polesDial)} on a dial labelled in poles, or ${round(pulsesDial)} on one labelled in pulses per revolution (half-wave signal; a full-wave signal doubles both).`;
}

/** How many fields are marked: the form is long, and the marks may be out of sight. */
function AttentionNote({ count }: { count: number }) {
  if (count === 0) return null;
  return (
    <p role="alert" className="font-semibold text-danger">
      {count === 1 ? 'One field needs attention' : `${count} fields need attention`}: see the marked
      fields below.
    </p>
  );
}

/** Every field of an engine, checked with the shared schema here and again on the server. */
export function EngineForm({
  engine,
  copyFrom,
  vesselId,
  vessels,
  onSaved,
  onCancel,
}: EngineFormProps) {
  const save = useSaveEngine();
  const [refusal, setRefusal] = useState<string | null>(null);
  const { register, control, handleSubmit, setError, formState } = useForm<
    EngineFormInput,
    unknown,
    EngineInput
  >({
    resolver: zodResolver(EngineInputSchema),
    defaultValues:
      copyFrom && !engine ? copiedValues(copyFrom, vesselId) : valuesOf(engine, vesselId),
  });
  const dialHint = useDialHint(control);
  const errors = formState.errors;

  const onSubmit = handleSubmit((input) => {
    setRefusal(null);
    save.mutate(
      { id: engine?.id, input },
      {
        onSuccess: ({ engine: saved }) => onSaved(saved),
        onError: (error) => {
          const messages = serverErrorMessages(error, setError, ENGINE_FIELDS);
          setRefusal(messages.join(' ') || null);
        },
      },
    );
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      className="flex flex-col gap-5"
      aria-label={engine ? 'Edit engine' : 'New engine'}
    >
      {refusal && <Alert title="Engine not saved">{refusal}</Alert>}
      <AttentionNote count={Object.keys(errors).length} />
      {vessels && (
        <SelectField label="Vessel" error={errors.vesselId?.message} {...register('vesselId')}>
          {vessels.map((v) => (
            <option key={v.id} value={v.id}>
              {v.name}
            </option>
          ))}
        </SelectField>
      )}
      <IdentityFields register={register} errors={errors} choosePosition={Boolean(copyFrom)} />
      <RatingFields register={register} errors={errors} />
      <TachFields register={register} errors={errors} dialHint={dialHint} />
      <CommissioningFields register={register} errors={errors} />
      <FormActions pending={save.isPending} pendingLabel="Saving engine…" onCancel={onCancel}>
        {engine ? 'Save engine' : 'Add engine'}
      </FormActions>
    </form>
  );
}
