import type { PhaseRow, PhaseStatus } from '../engine-snapshot';
import { percent } from '../format';

const STATUS: Record<PhaseStatus, { mark: string; word: string }> = {
  done: { mark: '✓', word: 'done' },
  current: { mark: '▶', word: 'now' },
  'waiting-for-workshop': { mark: '⌛', word: 'waiting for the workshop' },
  'to-come': { mark: '○', word: 'to come' },
};

/** After a return: which phases the workshop sent back, and which keep what they had. */
const RERUN_WORDS = { again: 'to run again', stands: 'stands' } as const;

/** Every phase of the run with its state in words and a mark: one tap away from the panel. */
export function PhaseList({ rows, label }: { rows: PhaseRow[]; label: string }) {
  return (
    <details className="text-sm">
      <summary className="flex min-h-touch cursor-pointer items-center font-semibold">
        All phases ({rows.length})
      </summary>
      <ol aria-label={`${label}: phases`} className="flex flex-col gap-1">
        {rows.map(({ phase, status, progress, rerun }) => (
          <li key={phase.id} className="flex gap-2">
            <span aria-hidden="true" className="w-4 shrink-0 text-center">
              {STATUS[status].mark}
            </span>
            <span>
              <span className="font-semibold">{phase.name}</span>
              {' · '}
              {phase.performedBy === 'workshop' ? 'workshop' : 'skipper'}
              {' · '}
              <span className="font-semibold">{STATUS[status].word}</span>
              {status === 'current' && <span className="figures"> {percent(progress)}</span>}
              {rerun && <span className="font-semibold"> · {RERUN_WORDS[rerun]}</span>}
            </span>
          </li>
        ))}
      </ol>
    </details>
  );
}
