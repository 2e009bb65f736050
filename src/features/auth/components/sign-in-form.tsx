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
import { applyServerFieldErrors } from '../../../lib/form-errors';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useSignIn } from '../api';

interface Refusal {
  title: string;
  detail: string;
}

function refusalFor(error: unknown, leftOver: string[]): Refusal | null {
  if (!isApiError(error))
    return { title: 'Could not sign in', detail: 'Something went wrong. Try again.' };
  if (error.fieldErrors.length > 0 && leftOver.length === 0) return null; // shown on the fields
  const title =
    error.status === 401
      ? 'Not signed in'
      : error.status === 429
        ? 'Too many attempts'
        : 'Could not sign in';
  return { title, detail: leftOver.length ? leftOver.join(' ') : error.message };
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
      onError: (error) =>
        setRefusal(
          refusalFor(error, applyServerFieldErrors(error, setError, ['email', 'password'])),
        ),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
      {refusal && <Alert title={refusal.title}>{refusal.detail}</Alert>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
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
