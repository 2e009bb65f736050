import { cx } from '../../../components/ui/cx';

/*
 * The one thing a skipper reads at a glance. Never colour alone: each state has its word, its
 * shape (solid, hatched, outlined, dashed) and its arrow, so it reads in glare, at night and for
 * colour-blind eyes.
 */

export type DeckState = 'in-band' | 'over' | 'under' | 'no-reading' | 'paused' | 'waiting';

const WORDS: Record<DeckState, { word: string; hint: string }> = {
  'in-band': { word: 'In band', hint: 'hold it here' },
  over: { word: 'Over', hint: 'ease back' },
  under: { word: 'Under', hint: 'open up a little' },
  'no-reading': { word: 'No reading', hint: 'log one to count time' },
  paused: { word: 'Stopped', hint: 'time is not counting' },
  waiting: { word: 'Waiting', hint: 'for the workshop' },
};

const SHAPES: Record<DeckState, string> = {
  'in-band': 'deck-solid border-4',
  over: 'deck-hatch border-4 border-danger bg-surface text-ink',
  under: 'border-4 border-ink bg-surface text-ink',
  'no-reading': 'border-4 border-dashed border-ink bg-surface text-ink',
  paused: 'border-4 border-dashed border-line bg-surface text-muted',
  waiting: 'border-4 border-dotted border-line bg-surface text-muted',
};

/** Arrows say where the engine speed sits against the band; a level mark when it sits inside. */
function StateArrow({ state }: { state: DeckState }) {
  const common = {
    viewBox: '0 0 48 48',
    className: 'size-10 shrink-0 sm:size-12',
    'aria-hidden': true,
    fill: 'currentColor',
  } as const;
  if (state === 'over')
    return (
      <svg {...common}>
        <path d="M24 4 44 30H32v14H16V30H4z" />
      </svg>
    );
  if (state === 'under')
    return (
      <svg {...common}>
        <path d="M24 44 4 18h12V4h16v14h12z" />
      </svg>
    );
  if (state === 'in-band')
    return (
      <svg {...common}>
        <path d="M2 24 16 12v8h16v-8l14 12-14 12v-8H16v8z" />
      </svg>
    );
  return (
    <svg {...common} fill="none" stroke="currentColor" strokeWidth="5" strokeLinecap="round">
      {state === 'waiting' ? (
        <path d="M24 10v14l9 6M24 44a20 20 0 1 1 0-40 20 20 0 0 1 0 40z" />
      ) : (
        <path d="M14 12v24M34 12v24" />
      )}
    </svg>
  );
}

export function BandState({
  state,
  engineLabel,
  wide = false,
}: {
  state: DeckState;
  engineLabel: string;
  wide?: boolean;
}) {
  const { word, hint } = WORDS[state];
  return (
    <div
      role="status"
      aria-label={`${engineLabel}: ${word}, ${hint}`}
      data-state={state}
      className={cx(
        'relative flex min-h-24 items-center gap-2 overflow-hidden rounded-lg px-2 py-2',
        SHAPES[state],
      )}
    >
      {/* On the hatched shape the word sits on a plain plate so it stays readable. */}
      <div
        className={cx(
          'flex items-center gap-2',
          state === 'over' && 'rounded-md border-2 border-danger bg-surface px-2 py-1',
        )}
      >
        <StateArrow state={state} />
        <p className="flex flex-col leading-none">
          <span
            className={cx('font-extrabold uppercase', wide ? 'text-4xl' : 'text-xl sm:text-4xl')}
          >
            {word}
          </span>
          <span className="mt-1 text-sm font-semibold sm:text-base">{hint}</span>
        </p>
      </div>
    </div>
  );
}
