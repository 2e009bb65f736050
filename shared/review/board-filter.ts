import { needsAction } from './board-order';
import { BOARD_SHOWS, type BoardShow } from './review.schema';
import type { BoardRow } from './views';

/** A show choice from an address (?show=…); anything unknown is the default. */
export const readShow = (value: string | null): BoardShow =>
  (BOARD_SHOWS as readonly string[]).includes(value ?? '') ? (value as BoardShow) : 'action';

const haystack = (run: BoardRow) =>
  [
    run.vessel.name,
    run.engine.position,
    run.engine.maker,
    run.engine.model,
    run.engine.serialNumber,
    run.programName,
  ]
    .join(' ')
    .toLowerCase();

/** The runs for a choice and a search (every word must appear), keeping the action order. */
export function filterRuns(runs: readonly BoardRow[], show: BoardShow, q: string): BoardRow[] {
  const words = q.trim().toLowerCase().split(/\s+/).filter(Boolean);
  return runs.filter((run) => {
    if (show === 'action' && (run.state === 'cancelled' || !needsAction(run.group))) return false;
    if (show !== 'action' && show !== 'all' && run.state !== show) return false;
    if (words.length === 0) return true;
    const text = haystack(run);
    return words.every((w) => text.includes(w));
  });
}
