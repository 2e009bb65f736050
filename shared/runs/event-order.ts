import type { RunEvent } from './run-event.schema';

const compareIds = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);
const byTimeThenId = (a: RunEvent, b: RunEvent): number => a.at - b.at || compareIds(a.id, b.id);

/** Events in order with their times alongside, so later passes need not visit every event. */
interface Sorted {
  events: RunEvent[];
  times: Float64Array;
}

function sortWithComparator(events: readonly RunEvent[]): Sorted {
  const sorted = events.slice().sort(byTimeThenId);
  return { events: sorted, times: Float64Array.from(sorted, (e) => e.at) };
}

/**
 * Sorts by time. The time and the position are packed into one number and sorted as a
 * Float64Array, which runs natively and several times faster than a comparator over objects
 * (36,000 readings: a few ms instead of 15–30). Falls back to the comparator when the time
 * span is too wide to pack exactly or a time is not whole milliseconds. Ties keep input order
 * here; orderTiesById settles them.
 */
function sortByTime(events: readonly RunEvent[]): Sorted {
  const n = events.length;
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < n; i++) {
    const at = events[i].at;
    if (!Number.isInteger(at)) return sortWithComparator(events);
    if (at < min) min = at;
    if (at > max) max = at;
  }
  const slots = 2 ** Math.max(1, Math.ceil(Math.log2(n + 1)));
  if (n === 0 || (max - min + 1) * slots > Number.MAX_SAFE_INTEGER)
    return sortWithComparator(events);
  const keys = new Float64Array(n);
  for (let i = 0; i < n; i++) keys[i] = (events[i].at - min) * slots + i;
  keys.sort();
  const sorted = new Array<RunEvent>(n);
  const times = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const position = keys[i] % slots;
    sorted[i] = events[position];
    times[i] = (keys[i] - position) / slots + min;
  }
  return { events: sorted, times };
}

/** Puts each run of events at the same instant in id order. */
function orderTiesById({ events, times }: Sorted): void {
  for (let from = 0; from < events.length;) {
    let to = from + 1;
    while (to < events.length && times[to] === times[from]) to++;
    if (to - from > 1) {
      const tied = events.slice(from, to).sort((a, b) => compareIds(a.id, b.id));
      for (let i = 0; i < tied.length; i++) events[from + i] = tied[i];
    }
    from = to;
  }
}

/**
 * One engine's events in a fixed order: by time, then id, with copies dropped.
 * Sync may deliver events late, twice or shuffled; the result must not depend on that.
 * An event is made once on the device and never edited, so a copy has the same id and the
 * same time: after sorting, copies sit side by side and dropping repeats needs no lookup
 * table (a Set of 36,000 ids alone costs 10–20 ms on a slow machine).
 */
export function orderEvents(events: readonly RunEvent[], engineId?: string): RunEvent[] {
  const mine = engineId === undefined ? events : events.filter((e) => e.engineId === engineId);
  const sorted = sortByTime(mine);
  orderTiesById(sorted);
  const { events: ordered, times } = sorted;
  let kept = 0;
  for (let i = 0; i < ordered.length; i++) {
    // Only events at the same instant can be copies, so most events are not even looked at.
    const copy = kept > 0 && times[i] === times[kept - 1] && ordered[i].id === ordered[kept - 1].id;
    if (copy) continue;
    times[kept] = times[i];
    ordered[kept++] = ordered[i];
  }
  ordered.length = kept;
  return ordered;
}
