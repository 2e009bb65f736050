import { percent } from '../format';

/** A plain bar with its figure beside it: the share is read from the number, the bar is a help. */
export function ProgressBar({ share, label }: { share: number; label: string }) {
  const shown = Math.min(1, Math.max(0, share));
  return (
    <div className="flex items-center gap-2">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.floor(shown * 100)}
        className="h-4 flex-1 overflow-hidden rounded-sm border-2 border-ink bg-surface"
      >
        <div className="deck-solid h-full" style={{ width: `${shown * 100}%` }} />
      </div>
      <span className="figures w-14 text-right font-bold">{percent(shown)}</span>
    </div>
  );
}
