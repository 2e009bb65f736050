import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import {
  SignInInputSchema,
  type SessionUser,
  type SignInInput,
} from '../../../../shared/auth/auth.schema';
import { isApiError } from '../../../lib/api-client';
import { serverErrorMessages } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { signInEmailProps } from './sign-in-email';
import { useSignIn } from '../api';

interface Refusal {
  title: string;
  detail: string;
}

function refusalTitle(error: unknown): string {
  const status = isApiError(error) ? error.status : null;
  if (status === 401) return 'Not signed in';
  if (status === 429) return 'Too many attempts';
  return 'Could not sign in';
}

export function SignInForm({ onSignedIn }: { onSignedIn: (user: SessionUser) => void }) {
  const signIn = useSignIn();
  const [refusal, setRefusal] = useState<Refusal | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<
    z.input<typeof SignInInputSchema>,
    unknown,
    SignInInput
  >({
    resolver: zodResolver(SignInInputSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit((input) => {
    setRefusal(null);
    signIn.mutate(input, {
      onSuccess: ({ user }) => onSignedIn(user),
      onError: (error) => {
        const messages = serverErrorMessages(error, setError, ['email', 'password']);
        // Nothing to add when every message went on a field.
        if (messages.length) setRefusal({ title: refusalTitle(error), detail: messages.join(' ') });
      },
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {refusal && <Alert title={refusal.title}>{refusal.detail}</Alert>}
      <TextField
        {...signInEmailProps}
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" pending={signIn.isPending} pendingLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
