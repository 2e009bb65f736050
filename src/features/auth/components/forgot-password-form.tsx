import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  PasswordResetRequestSchema,
  type PasswordResetRequest,
} from '../../../../shared/auth/account.schema';
import { errorMessage } from '../../../lib/api-client';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { signInEmailProps } from './sign-in-email';
import { useRequestReset } from '../account-api';

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export function ForgotPasswordForm({ email = '' }: { email?: string }) {
  const request = useRequestReset();
  const { register, handleSubmit, formState } = useForm<
    z.input<typeof PasswordResetRequestSchema>,
    unknown,
    PasswordResetRequest
  >({ resolver: zodResolver(PasswordResetRequestSchema), defaultValues: { email } });

  if (request.isSuccess)
    return (
      <p role="status" className="rounded-md border-2 border-ink bg-paper p-3">
        {request.data.detail} Check your inbox, and the spam folder too.
      </p>
    );
  return (
    <form
      noValidate
      onSubmit={handleSubmit((input) => request.mutate(input))}
      className="flex flex-col gap-4"
    >
      {request.isError && (
        <Alert title="Could not send the link">{errorMessage(request.error)}</Alert>
      )}
      <TextField
        {...signInEmailProps}
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" pending={request.isPending} pendingLabel="Sending…">
        E-mail me a link
      </Button>
    </form>
  );
}
