import { useState } from 'react';
import { Controller, useForm, useWatch, type Control, type FieldErrors } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { InviteInputSchema, ROLES, type InviteInput } from '../../../../shared/auth/auth.schema';
import { serverErrorMessages } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { roleLabel, useInvite, type SentInvite } from '../api';
import { InviteLink } from './invite-link';
import { VesselChoice, type VesselOption } from './vessel-choice';

type InviteFormValues = z.input<typeof InviteInputSchema>;

/** The vessels a new skipper may log, chosen before the invite goes out. */
function VesselsField({
  control,
  vessels,
  errors,
}: {
  control: Control<InviteFormValues>;
  vessels: VesselOption[];
  errors: FieldErrors<InviteFormValues>;
}) {
  return (
    <Controller
      control={control}
      name="vesselIds"
      render={({ field, fieldState }) => (
        <VesselChoice
          vessels={vessels}
          value={field.value ?? []}
          onChange={field.onChange}
          error={fieldState.error?.message ?? errors.vesselIds?.root?.message}
        />
      )}
    />
  );
}

/** The invite form and sending it: the link comes back, or the server's refusal. */
function useInviteForm() {
  const invite = useInvite();
  const [sent, setSent] = useState<SentInvite | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);
  const form = useForm<InviteFormValues, unknown, InviteInput>({
    resolver: zodResolver(InviteInputSchema),
    defaultValues: { email: '', role: 'skipper', vesselIds: [] },
  });
  const onSubmit = form.handleSubmit((input) => {
    setRefusal(null);
    setSent(null);
    const body = { ...input, vesselIds: input.role === 'skipper' ? input.vesselIds : [] };
    invite.mutate(body, {
      onSuccess: (result) => {
        setSent(result);
        form.reset();
      },
      onError: (error) => {
        const messages = serverErrorMessages(error, form.setError, ['email', 'role', 'vesselIds']);
        setRefusal(messages.join(' ') || null);
      },
    });
  });
  return { form, invite, sent, refusal, onSubmit };
}

/** Invites a person to the workshop and shows the link to pass on. */
export function InviteForm({ vessels = [] }: { vessels?: VesselOption[] }) {
  const { form, invite, sent, refusal, onSubmit } = useInviteForm();
  const { register, control, formState } = form;
  const role = useWatch({ control, name: 'role' });

  return (
    <div className="flex flex-col gap-4">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {refusal && <Alert title="Invite not sent">{refusal}</Alert>}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          error={formState.errors.email?.message}
          {...register('email')}
        />
        <SelectField label="Role" error={formState.errors.role?.message} {...register('role')}>
          {ROLES.map((value) => (
            <option key={value} value={value}>
              {roleLabel[value]}
            </option>
          ))}
        </SelectField>
        {role === 'skipper' && vessels.length > 0 && (
          <VesselsField control={control} vessels={vessels} errors={formState.errors} />
        )}
        <Button
          type="submit"
          pending={invite.isPending}
          pendingLabel="Sending invite…"
          className="self-start"
        >
          Send invite
        </Button>
      </form>
      {sent && <InviteLink sent={sent} />}
    </div>
  );
}
