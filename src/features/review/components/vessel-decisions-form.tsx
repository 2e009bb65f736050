import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import {
  VesselDecisionsInputSchema,
  type VesselDecisionsFormValues,
  type VesselDecisionsInput,
} from '../../../../shared/review/review.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useVesselDecisions, type VesselDecisionView } from '../api';
import { EngineDecision, type EngineToDecide } from './engine-decision';

/** The fields of every decision, for putting the server's refusals on them. */
const fieldsOf = (count: number) =>
  Array.from({ length: count }, (_, i) =>
    (['decision', 'comments', 'rerunPhaseIds'] as const).map(
      (field) => `decisions.${i}.${field}` as Path<VesselDecisionsFormValues>,
    ),
  ).flat();

/** The page's one form over every decision, and saving it; a refusal not on a field goes in the alert. */
function useVesselDecisionsForm(
  vesselId: string,
  items: EngineToDecide[],
  onSaved: (results: VesselDecisionView[]) => void,
) {
  const save = useVesselDecisions(vesselId);
  const [refusal, setRefusal] = useState<string | null>(null);
  const form = useForm<VesselDecisionsFormValues, unknown, VesselDecisionsInput>({
    resolver: zodResolver(VesselDecisionsInputSchema),
    defaultValues: {
      decisions: items.map((item) => ({
        runId: item.runId,
        decision: 'confirm',
        comments: '',
        rerunPhaseIds: [],
      })),
    },
  });
  const onSubmit = form.handleSubmit((input) => {
    setRefusal(null);
    save.mutate(input, {
      onSuccess: (answer) => onSaved(answer.decisions),
      onError: (error) => {
        const messages = serverErrorMessages(error, form.setError, fieldsOf(items.length));
        setRefusal(messages.join(' ') || null);
      },
    });
  });
  return { save, form, refusal, onSubmit };
}

/**
 * The decisions on every submitted run of one vessel, saved with one button and together: when
 * one is refused none is saved, and the refusal names its engine.
 */
export function VesselDecisionsForm({
  vesselId,
  items,
  onSaved,
}: {
  vesselId: string;
  items: EngineToDecide[];
  onSaved: (results: VesselDecisionView[]) => void;
}) {
  const { save, form, refusal, onSubmit } = useVesselDecisionsForm(vesselId, items, onSaved);
  const both = items.length === 2 ? 'both decisions' : items.length > 2 ? 'all decisions' : null;
  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-label="Decisions">
      {refusal && <Alert title="Nothing saved">{refusal}</Alert>}
      <div className="grid items-start gap-5 lg:grid-cols-2">
        {items.map((item, index) => (
          <EngineDecision
            key={item.runId}
            index={index}
            item={item}
            control={form.control}
            register={form.register}
            errors={form.formState.errors}
          />
        ))}
      </div>
      <p className="text-sm">
        The engine maker&rsquo;s manual and warranty terms come first: sign off only what they
        accept. Each engine keeps its own run and certificate; nothing is saved unless every
        decision can be.
      </p>
      <Button type="submit" className="self-start" pending={save.isPending} pendingLabel="Saving…">
        {both ? `Save ${both}` : 'Save the decision'}
      </Button>
    </form>
  );
}
