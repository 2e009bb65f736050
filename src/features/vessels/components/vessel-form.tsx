import { useState } from 'react';
import { useForm, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  VESSEL_TYPES,
  VesselInputSchema,
  type VesselInput,
} from '../../../../shared/vessels/vessel.schema';
import { VESSEL_TYPE_WORDS } from '../../../../shared/vessels/vessel-words';
import type { VesselView } from '../../../../shared/vessels/vessel-view';
import { Alert } from '../../../components/ui/alert';
import { SelectField, TextField } from '../../../components/ui/field';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useSaveVessel } from '../api';
import { toNumberOrNull } from '../form-values';
import { FormActions } from './form-actions';

type VesselFormValues = z.input<typeof VesselInputSchema>;
const FIELDS = ['name', 'hin', 'type', 'lengthM', 'homePort'] as const;

const valuesOf = (vessel: VesselView | undefined): VesselFormValues =>
  vessel
    ? {
        name: vessel.name,
        hin: vessel.hin,
        type: vessel.type,
        lengthM: vessel.lengthM,
        homePort: vessel.homePort,
      }
    : { name: '', hin: '', type: 'runabout', lengthM: null, homePort: '' };

function VesselFields({
  register,
  errors,
}: {
  register: UseFormRegister<VesselFormValues>;
  errors: FieldErrors<VesselFormValues>;
}) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <TextField
        label="Vessel name"
        autoComplete="off"
        error={errors.name?.message}
        {...register('name')}
      />
      <TextField
        label="Hull identification number (HIN)"
        hint="Optional; 12 to 14 letters and digits"
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        className="figures"
        error={errors.hin?.message}
        {...register('hin')}
      />
      <SelectField label="Type" error={errors.type?.message} {...register('type')}>
        {VESSEL_TYPES.map((t) => (
          <option key={t} value={t}>
            {VESSEL_TYPE_WORDS[t]}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Length (m)"
        inputMode="decimal"
        autoComplete="off"
        className="figures"
        error={errors.lengthM?.message}
        {...register('lengthM', { setValueAs: toNumberOrNull })}
      />
      <TextField
        label="Home port"
        autoComplete="off"
        error={errors.homePort?.message}
        {...register('homePort')}
      />
    </div>
  );
}

/** A vessel's name, HIN, type, length and home port; a new vessel when none is given. */
export function VesselForm({
  vessel,
  onSaved,
  onCancel,
}: {
  vessel?: VesselView;
  onSaved: (vessel: VesselView) => void;
  onCancel?: () => void;
}) {
  const save = useSaveVessel();
  const [refusal, setRefusal] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<
    VesselFormValues,
    unknown,
    VesselInput
  >({
    resolver: zodResolver(VesselInputSchema),
    defaultValues: valuesOf(vessel),
  });
  const errors = formState.errors;

  const onSubmit = handleSubmit((input) => {
    setRefusal(null);
    save.mutate(
      { id: vessel?.id, input },
      {
        onSuccess: ({ vessel: saved }) => onSaved(saved),
        onError: (error) => {
          const messages = serverErrorMessages(error, setError, FIELDS);
          setRefusal(messages.join(' ') || null);
        },
      },
    );
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      className="flex flex-col gap-4"
      aria-label={vessel ? 'Edit vessel' : 'New vessel'}
    >
      {refusal && <Alert title="Vessel not saved">{refusal}</Alert>}
      <VesselFields register={register} errors={errors} />
      <FormActions pending={save.isPending} pendingLabel="Saving vessel…" onCancel={onCancel}>
        {vessel ? 'Save vessel' : 'Add vessel'}
      </FormActions>
    </form>
  );
}
