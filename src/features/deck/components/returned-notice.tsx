import type { ResolvedPhase } from '../../../../shared/programs/resolve-band';
import type { RunRecord } from '../../../lib/db';
import { dateText } from '../format';
import { isLoggable } from '../run-phases';

/**
 * Why the workshop sent the run back, in its own words, and which phases to run again. Time
 * already logged on those phases is set aside (the re-run rule in shared/runs/phase-tally.ts).
 */
export function ReturnedNotice({
  run,
  phases,
  label,
}: {
  run: RunRecord;
  phases: ResolvedPhase[];
  label: string;
}) {
  const decision = run.lastDecision;
  if (decision?.decision !== 'returned' || !isLoggable(run)) return null;
  const names = decision.rerunPhaseIds.map((id) => phases.find((p) => p.id === id)?.name ?? id);
  return (
    <section
      aria-label={`${label}: returned by the workshop`}
      className="flex flex-col gap-1 rounded-md border-4 border-double border-ink bg-surface p-2"
    >
      <p className="font-extrabold">
        <span aria-hidden="true">↩ </span>Returned by the workshop
      </p>
      <p className="text-sm">
        {decision.reviewerName}, {dateText(decision.decidedAt)}
      </p>
      {decision.comments && (
        <blockquote className="whitespace-pre-line border-l-4 border-ink pl-2">
          {decision.comments}
        </blockquote>
      )}
      {names.length > 0 && (
        <>
          <p className="font-semibold">Phases to run again:</p>
          <ul aria-label={`${label}: phases to run again`} className="list-disc pl-5">
            {names.map((name) => (
              <li key={name}>{name}</li>
            ))}
          </ul>
          <p className="text-sm">
            Time logged on these before the return is set aside and not counted; the other phases
            stand as they are.
          </p>
        </>
      )}
    </section>
  );
}
