import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  ResetPasswordInputSchema,
  type ResetPasswordInput,
} from '../../../../shared/auth/account.schema';
import { serverErrorMessages } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useResetPassword } from '../account-api';
import { NEW_PASSWORD_HINT } from './change-password-form';

/** The new password from a reset link; it signs this browser in and every other one out. */
export function ResetPasswordForm({
  token,
  email,
  onDone,
}: {
  token: string;
  /** Shown to password managers, so they save the new password for the right account. */
  email: string;
  onDone: () => void;
}) {
  const resetPassword = useResetPassword();
  const [refusal, setRefusal] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<
    z.input<typeof ResetPasswordInputSchema>,
    unknown,
    ResetPasswordInput
  >({ resolver: zodResolver(ResetPasswordInputSchema), defaultValues: { token, password: '' } });

  const onSubmit = handleSubmit((input) => {
    setRefusal(null);
    resetPassword.mutate(input, {
      onSuccess: onDone,
      onError: (error) =>
        setRefusal(serverErrorMessages(error, setError, ['password']).join(' ') || null),
    });
  });
  const alert = refusal ?? formState.errors.token?.message;

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {alert && <Alert title="Could not set the new password">{alert}</Alert>}
      <input type="email" autoComplete="username" value={email} readOnly hidden />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={NEW_PASSWORD_HINT}
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={resetPassword.isPending} pendingLabel="Saving…">
        Save and sign in
      </Button>
    </form>
  );
}
