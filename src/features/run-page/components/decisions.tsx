import type { RunReviewView } from '../../../../shared/review/views';
import { formatDate } from '../../../lib/format';

type Decision = RunReviewView['reviews'][number];

/** Every decision the workshop made on the run, newest first, in its own words. */
export function WorkshopComments({ reviews }: { reviews: Decision[] }) {
  if (reviews.length === 0) return <p>The workshop has not decided on this run yet.</p>;
  const newestFirst = [...reviews].sort((a, b) => b.decidedAt.localeCompare(a.decidedAt));
  return (
    <ol aria-label="The workshop's decisions" className="flex flex-col gap-2">
      {newestFirst.map((review, i) => (
        <li key={`${review.decidedAt}-${i}`} className="rounded-md border-2 border-line p-3">
          <p className="font-semibold">
            {review.decision === 'confirmed' ? 'Signed off' : 'Returned'} by {review.reviewerName},{' '}
            {formatDate(review.decidedAt)}
          </p>
          {review.comments && <p className="whitespace-pre-line">{review.comments}</p>}
          {review.rerunPhaseNames.length > 0 && (
            <p className="text-sm">To run again: {review.rerunPhaseNames.join(', ')}</p>
          )}
        </li>
      ))}
    </ol>
  );
}

/** The phases to run again after the latest return, by name. */
export function RerunPhases({ names }: { names: string[] }) {
  return (
    <section
      aria-labelledby="rerun"
      className="flex flex-col gap-2 rounded-lg border-4 border-double border-ink bg-surface p-4"
    >
      <h2 id="rerun" className="text-xl font-bold">
        <span aria-hidden="true">↩ </span>Returned: phases to run again
      </h2>
      <ul className="list-disc pl-5">
        {names.map((name) => (
          <li key={name}>{name}</li>
        ))}
      </ul>
      <p className="text-sm">
        Only engine time from the return on counts for these phases; what was logged on them before
        is set aside. The other phases stand. Run them on deck, then submit again.
      </p>
    </section>
  );
}
