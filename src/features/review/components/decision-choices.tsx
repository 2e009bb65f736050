import type { UseFormRegisterReturn } from 'react-hook-form';
import type { SignOffFormValues } from '../../../../shared/review/review.schema';
import type { Verdict } from '../../../../shared/runs/phase-tally';
import { FieldsetError } from '../../../components/ui/field';

/** Confirm or return: the two decisions on a submitted run, with what each one does. */
const CHOICES = [
  {
    value: 'confirm',
    label: 'Confirm and sign off',
    hint: 'Freezes the run, issues the PDF certificate and e-mails it to the skipper.',
  },
  {
    value: 'return',
    label: 'Return to the skipper',
    hint: 'Opens logging again and e-mails the skipper your comments and what the log shows.',
  },
] as const;

/** What the comments are for: next steps on a return, the certificate's words on a sign-off. */
export function commentsHint(decision: SignOffFormValues['decision'], verdict: Verdict): string {
  if (decision === 'return') return 'Say what the skipper should do next.';
  return verdict === 'complete'
    ? 'Optional; printed on the certificate.'
    : 'The computation does not judge this run complete: say why you confirm it. Printed on the certificate.';
}

export function DecisionChoices({
  field,
  error,
}: {
  /** The form's registration of the decision (its name differs per engine on a vessel's page). */
  field: UseFormRegisterReturn;
  error?: string;
}) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-semibold">Decision</legend>
      {CHOICES.map((choice) => (
        <label
          key={choice.value}
          className="flex min-h-touch cursor-pointer items-start gap-3 rounded-md border-2 border-line p-3 has-[:checked]:border-ink"
        >
          <input
            type="radio"
            value={choice.value}
            className="mt-1 size-5 accent-[var(--rs-accent)]"
            {...field}
          />
          <span>
            <span className="font-bold">{choice.label}</span>
            <span className="block text-sm text-muted">{choice.hint}</span>
          </span>
        </label>
      ))}
      <FieldsetError error={error} />
    </fieldset>
  );
}
