import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  ChangePasswordInputSchema,
  type ChangePasswordInput,
} from '../../../../shared/auth/account.schema';
import { serverErrorMessages } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useChangePassword } from '../account-api';

export const NEW_PASSWORD_HINT =
  'At least 10 characters, and not a common password. A short sentence of your own is easy to type and hard to guess.';

/** Current password, then the new one; other devices are signed out when it changes. */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const [refusal, setRefusal] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, setError, reset, formState } = useForm<
    z.input<typeof ChangePasswordInputSchema>,
    unknown,
    ChangePasswordInput
  >({
    resolver: zodResolver(ChangePasswordInputSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });

  const onSubmit = handleSubmit((input) => {
    setRefusal(null);
    setDone(false);
    change.mutate(input, {
      onSuccess: () => {
        reset();
        setDone(true);
      },
      onError: (error) => {
        const messages = serverErrorMessages(error, setError, ['currentPassword', 'newPassword']);
        setRefusal(messages.join(' ') || null);
      },
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {refusal && <Alert title="The password was not changed">{refusal}</Alert>}
      {done && (
        <p role="status" className="rounded-md border-2 border-ink bg-paper p-3 font-semibold">
          Password changed. Every other device was signed out; this one stays signed in.
        </p>
      )}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={NEW_PASSWORD_HINT}
        error={formState.errors.newPassword?.message}
        {...register('newPassword')}
      />
      <Button
        type="submit"
        pending={change.isPending}
        pendingLabel="Changing…"
        className="self-start"
      >
        Change password
      </Button>
    </form>
  );
}
