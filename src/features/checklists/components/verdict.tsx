import type { CSSProperties } from 'react';
import type { ItemJudgement, ItemVerdict } from '../../../../shared/checklists/evaluation';
import { cx } from '../../../components/ui/cx';

/*
 * A verdict is never colour alone: each has its word, its mark and its shape (solid for pass,
 * hatched for fail, dashed outline for open, thin outline for not applicable), so it reads in
 * glare, at night and for colour-blind eyes.
 */
const LOOK: Record<ItemVerdict, { word: string; mark: string; frame: string }> = {
  pass: { word: 'Pass', mark: '✓', frame: 'border-ink bg-ink text-paper' },
  fail: { word: 'Fail', mark: '✕', frame: 'border-danger bg-surface text-ink' },
  open: { word: 'Open', mark: '', frame: 'border-dashed border-ink bg-surface text-ink' },
  'not-applicable': {
    word: 'Not applicable',
    mark: '–',
    frame: 'border-line bg-surface text-muted',
  },
};

const HATCH: CSSProperties = {
  backgroundImage: 'repeating-linear-gradient(135deg, var(--rs-danger) 0 3px, transparent 3px 7px)',
};

export function VerdictPill({ verdict, className }: { verdict: ItemVerdict; className?: string }) {
  const { word, mark, frame } = LOOK[verdict];
  return (
    <span
      data-verdict={verdict}
      className={cx(
        'inline-flex shrink-0 items-center gap-1.5 rounded-full border-2 py-0.5 pl-1 pr-3 text-sm font-bold',
        frame,
        className,
      )}
    >
      <span
        aria-hidden="true"
        className={cx(
          'flex size-5 items-center justify-center rounded-full border-2 border-current text-xs',
          verdict === 'open' && 'border-dashed',
        )}
        style={verdict === 'fail' ? HATCH : undefined}
      >
        {verdict === 'fail' ? '' : mark}
      </span>
      {verdict === 'fail' && <span aria-hidden="true">{mark}</span>}
      {word}
    </span>
  );
}

/** What the computation made of an item: reasons in words and the figures it worked out. */
export function ItemOutcome({ judgement, id }: { judgement: ItemJudgement; id?: string }) {
  return (
    <div id={id} aria-live="polite" className="flex flex-col gap-2">
      {judgement.reasons.length > 0 && (
        <ul className="list-disc space-y-1 pl-5">
          {judgement.reasons.map((reason) => (
            <li key={reason}>{reason}</li>
          ))}
        </ul>
      )}
      {judgement.figures.length > 0 && (
        <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 gap-y-1 rounded-md bg-sunk px-3 py-2">
          {judgement.figures.map((f) => (
            <div key={f.label} className="contents">
              <dt className="text-muted">{f.label}</dt>
              <dd className="figures whitespace-nowrap text-right font-semibold">{f.value}</dd>
            </div>
          ))}
        </dl>
      )}
    </div>
  );
}
