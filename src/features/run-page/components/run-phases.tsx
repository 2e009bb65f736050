import type { ReviewPhase } from '../../../../shared/review/views';
import { VERDICT_WORDS } from '../../../../shared/review/run-words';
import { durationWords } from '../../../../shared/runs/duration-words';

const MARK = { complete: '✓', incomplete: '…', breached: '▲' } as const;

/** Every phase with its verdict and the reasons for it, as the workshop judges them. */
export function RunPhaseList({
  phases,
  rerunIds,
}: {
  phases: ReviewPhase[];
  /** Phases the workshop sent back at its latest return; empty otherwise. */
  rerunIds: ReadonlySet<string>;
}) {
  return (
    <ol aria-label="Phases" className="flex flex-col gap-3">
      {phases.map((phase, i) => (
        <PhaseItem
          key={phase.id}
          phase={phase}
          number={i + 1}
          rerun={rerunIds.size === 0 ? null : rerunIds.has(phase.id)}
        />
      ))}
    </ol>
  );
}

function PhaseItem({
  phase,
  number,
  rerun,
}: {
  phase: ReviewPhase;
  number: number;
  /** After a return: sent back (true) or standing (false); null when never returned. */
  rerun: boolean | null;
}) {
  return (
    <li className="rounded-md border-2 border-line p-3">
      <p className="font-bold">
        {number}. {phase.name}
        <span className="font-normal">
          {' · '}
          {phase.performedBy === 'workshop' ? 'workshop' : 'skipper'}
        </span>
        {rerun !== null && <span> · {rerun ? 'to run again' : 'stands'}</span>}
      </p>
      <p>
        <span aria-hidden="true">{MARK[phase.verdict]} </span>
        {VERDICT_WORDS[phase.verdict]}: in band{' '}
        <span className="figures">{durationWords(phase.timeInBandMs)}</span> of{' '}
        <span className="figures">{durationWords(phase.requiredMs)}</span> required
        {phase.setAsideMs > 0 && (
          <>
            ; <span className="figures">{durationWords(phase.setAsideMs)}</span> set aside (logged
            before it was sent back)
          </>
        )}
      </p>
      {phase.reasons.length > 0 && (
        <ul className="mt-1 list-disc pl-5">
          {phase.reasons.map((reason, j) => (
            <li key={`${reason.code}-${j}`}>{reason.message}</li>
          ))}
        </ul>
      )}
    </li>
  );
}
