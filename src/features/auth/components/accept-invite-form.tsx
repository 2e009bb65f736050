import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  AcceptInviteInputSchema,
  type AcceptInviteInput,
  type SessionUser,
} from '../../../../shared/auth/auth.schema';
import { serverErrorMessages } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useAcceptInvite } from '../api';

interface AcceptInviteFormProps {
  token: string;
  onAccepted: (user: SessionUser) => void;
}

export function AcceptInviteForm({ token, onAccepted }: AcceptInviteFormProps) {
  const acceptInvite = useAcceptInvite();
  const [refusal, setRefusal] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<
    z.input<typeof AcceptInviteInputSchema>,
    unknown,
    AcceptInviteInput
  >({
    resolver: zodResolver(AcceptInviteInputSchema),
    defaultValues: { token, name: '', password: '' },
  });

  const onSubmit = handleSubmit((input) => {
    setRefusal(null);
    acceptInvite.mutate(input, {
      onSuccess: ({ user }) => onAccepted(user),
      onError: (error) => {
        const messages = serverErrorMessages(error, setError, ['name', 'password']);
        setRefusal(messages.join(' ') || null);
      },
    });
  });

  // The token comes from the link, not from a field: its problems are shown in the alert.
  const tokenProblem = formState.errors.token?.message;
  const alert = refusal ?? tokenProblem;

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {alert && <Alert title="Could not set your password">{alert}</Alert>}
      <TextField
        label="Your name"
        autoComplete="name"
        error={formState.errors.name?.message}
        {...register('name')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A short sentence is easy to type and hard to guess."
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={acceptInvite.isPending} pendingLabel="Setting password…">
        Set password and sign in
      </Button>
    </form>
  );
}
