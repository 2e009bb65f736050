import { VERDICT_WORDS } from '../../../../shared/review/run-words';
import type { Verdict } from '../../../../shared/runs/phase-tally';
import { Pill } from '../../../components/ui/pill';

const MARK: Record<Verdict, string> = { complete: '✓', incomplete: '…', breached: '▲' };

/** A verdict as a word, a symbol and a shape (solid for a broken rule), never colour alone. */
export function VerdictMark({ verdict }: { verdict: Verdict }) {
  return (
    <Pill tone={verdict === 'breached' ? 'solid' : verdict === 'complete' ? 'outline' : 'quiet'}>
      <span aria-hidden="true">{MARK[verdict]}</span>
      {VERDICT_WORDS[verdict]}
    </Pill>
  );
}
