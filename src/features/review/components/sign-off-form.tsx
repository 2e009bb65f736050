import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import {
  SignOffInputSchema,
  type SignOffFormValues,
  type SignOffInput,
} from '../../../../shared/review/review.schema';
import type { DecisionView } from '../../../../shared/review/views';
import type { Verdict } from '../../../../shared/runs/phase-tally';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Field, controlClass } from '../../../components/ui/field';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useSignOff } from '../api';
import { commentsHint, DecisionChoices } from './decision-choices';
import { RerunPhases } from './rerun-phases';

/** The decision form and sending it; a refusal the fields do not show goes in the alert. */
function useSignOffForm(runId: string, onDecided?: (result: DecisionView) => void) {
  const signOff = useSignOff(runId, onDecided);
  const [refusal, setRefusal] = useState<string | null>(null);
  const form = useForm<SignOffFormValues, unknown, SignOffInput>({
    resolver: zodResolver(SignOffInputSchema),
    defaultValues: { decision: 'confirm', comments: '', rerunPhaseIds: [] },
  });
  const decision = useWatch({ control: form.control, name: 'decision' });
  const onSubmit = form.handleSubmit((input) => {
    setRefusal(null);
    signOff.mutate(input, {
      onError: (error) => {
        const messages = serverErrorMessages(error, form.setError, [
          'decision',
          'comments',
          'rerunPhaseIds',
        ]);
        setRefusal(messages.join(' ') || null);
      },
    });
  });
  return { signOff, form, decision, refusal, onSubmit };
}

/** The technician's decision on a submitted run. */
export function SignOffForm({
  runId,
  verdict,
  phases,
  onDecided,
}: {
  runId: string;
  verdict: Verdict;
  /** The run's phases, to choose those to run again on a return. */
  phases: ReadonlyArray<{ id: string; name: string }>;
  onDecided?: (result: DecisionView) => void;
}) {
  const { signOff, form, decision, refusal, onSubmit } = useSignOffForm(runId, onDecided);
  const { register, formState } = form;
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Sign-off">
      {refusal && <Alert title="Not saved">{refusal}</Alert>}
      <DecisionChoices field={register('decision')} error={formState.errors.decision?.message} />
      {decision === 'return' && (
        <RerunPhases
          phases={phases}
          field={register('rerunPhaseIds')}
          error={formState.errors.rerunPhaseIds?.message}
        />
      )}
      <Field
        label="Comments"
        error={formState.errors.comments?.message}
        hint={commentsHint(decision, verdict)}
      >
        {(control) => (
          <textarea
            {...control}
            rows={4}
            className={`${controlClass} py-2`}
            {...register('comments')}
          />
        )}
      </Field>
      <p className="text-sm">
        The engine maker&rsquo;s manual and warranty terms come first: sign off only what they
        accept.
      </p>
      <Button
        type="submit"
        className="self-start"
        pending={signOff.isPending}
        pendingLabel="Saving…"
      >
        {decision === 'return' ? 'Return the run' : 'Sign off the run'}
      </Button>
    </form>
  );
}
