import { useId } from 'react';
import { Link } from 'react-router-dom';
import { useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { positionWords } from '../../../../shared/engines/engine-words';
import type { VesselDecisionsFormValues } from '../../../../shared/review/review.schema';
import type { RunReviewView } from '../../../../shared/review/views';
import { Field, controlClass } from '../../../components/ui/field';
import { LoadError, Loading } from '../../../components/ui/status-message';
import { useRunReview } from '../api';
import { formatDuration, formatMoment } from '../format';
import { commentsHint, DecisionChoices } from './decision-choices';
import { RerunPhases } from './rerun-phases';
import { VerdictMark } from './verdict-mark';

export interface EngineToDecide {
  runId: string;
  engine: { position: string; maker: string; model: string };
}

/** Each phase in one line: time in band of the time required, its verdict and how many remarks. */
function PhaseLines({ review }: { review: RunReviewView }) {
  return (
    <ul className="flex flex-col gap-1" aria-label="Phases">
      {review.phases.map((phase) => (
        <li key={phase.id} className="flex flex-wrap items-center justify-between gap-2">
          <span>
            {phase.name}
            <span className="figures block text-sm text-muted">
              {formatDuration(phase.timeInBandMs)} in band of {formatDuration(phase.requiredMs)}
              {phase.reasons.length > 0 &&
                ` · ${phase.reasons.length} remark${phase.reasons.length > 1 ? 's' : ''}`}
            </span>
          </span>
          <VerdictMark verdict={phase.verdict} />
        </li>
      ))}
    </ul>
  );
}

/** What the log of the run shows, in short, with the way to its full review. */
function RunInShort({ review }: { review: RunReviewView }) {
  const { run } = review;
  return (
    <div className="flex flex-col gap-3">
      <p className="flex flex-wrap items-center gap-2">
        <VerdictMark verdict={review.account.verdict} />
        <span>
          {run.programName}
          {run.submittedAt && `, submitted ${formatMoment(run.submittedAt)}`}
        </span>
      </p>
      {run.submitNote && (
        <blockquote className="border-l-4 border-ink pl-3">
          <p className="text-sm text-muted">The skipper&rsquo;s note</p>
          <p>{run.submitNote}</p>
        </blockquote>
      )}
      <PhaseLines review={review} />
      {review.voidedCount > 0 && (
        <p className="text-sm">
          {review.voidedCount} entr{review.voidedCount > 1 ? 'ies' : 'y'} voided (struck through in
          the full review).
        </p>
      )}
      <Link
        to={`/runs/${run.id}/review`}
        className="inline-flex min-h-touch items-center self-start font-semibold underline underline-offset-4"
      >
        Full review of this engine&rsquo;s run
      </Link>
    </div>
  );
}

interface FieldsProps {
  index: number;
  control: Control<VesselDecisionsFormValues>;
  register: UseFormRegister<VesselDecisionsFormValues>;
  errors: FieldErrors<VesselDecisionsFormValues>;
}

/** The `index`th decision's fields: confirm or return, the phases to run again, the comments. */
function DecisionFields({
  index,
  control,
  register,
  errors,
  review,
}: FieldsProps & { review: RunReviewView | undefined }) {
  const decision = useWatch({ control, name: `decisions.${index}.decision` });
  const fieldErrors = errors.decisions?.[index];
  return (
    <>
      <DecisionChoices
        field={register(`decisions.${index}.decision`)}
        error={fieldErrors?.decision?.message}
      />
      {decision === 'return' && (
        <RerunPhases
          phases={review?.phases ?? []}
          field={register(`decisions.${index}.rerunPhaseIds`)}
          error={fieldErrors?.rerunPhaseIds?.message}
        />
      )}
      <Field
        label="Comments"
        error={fieldErrors?.comments?.message}
        hint={commentsHint(decision ?? 'confirm', review?.account.verdict ?? 'complete')}
      >
        {(props) => (
          <textarea
            {...props}
            rows={3}
            className={`${controlClass} py-2`}
            {...register(`decisions.${index}.comments`)}
          />
        )}
      </Field>
    </>
  );
}

/**
 * One engine's submitted run on the vessel's decision page: the run in short, then its decision,
 * comments and, on a return, the phases to run again. The fields are the `index`th decision of
 * the page's one form.
 */
export function EngineDecision({ item, ...fields }: FieldsProps & { item: EngineToDecide }) {
  const headingId = useId();
  const review = useRunReview(item.runId);
  const { engine } = item;
  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-lg border-2 border-line bg-surface p-4 sm:p-5"
    >
      <h2 id={headingId} className="text-xl font-bold">
        {positionWords(engine.position)} engine · {engine.maker} {engine.model}
      </h2>
      {review.isPending && <Loading label="Loading the run…" />}
      {review.isError && (
        <LoadError error={review.error} what="this run" onRetry={() => review.refetch()} />
      )}
      {review.data && <RunInShort review={review.data} />}
      <DecisionFields {...fields} review={review.data} />
    </section>
  );
}
