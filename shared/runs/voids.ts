import type { RunEvent, VoidEvent } from './run-event.schema';

/*
 * VOID RULE: a void takes one earlier reading or note of the same engine out of the record.
 *
 * 1. The entry stays stored and shown (struck through, with the void's reason and author);
 *    accounting, charts and the live timer leave it out as if it had never been logged. A
 *    voided reading therefore holds no time: the reading before it holds on (up to the usual
 *    maximum hold) until the next reading that stands.
 * 2. Only the first void of an entry counts; a second one changes nothing. A void naming an
 *    entry that is not there (yet) changes nothing either, so order of arrival never matters.
 * 3. A void cannot itself be voided, and it names readings and notes only: session starts and
 *    stops, phase moves and alerts stand as logged.
 */

/** The first void of each entry, by the id of the entry it names. */
export function voidsByTarget(events: readonly RunEvent[]): Map<string, VoidEvent> {
  const found = new Map<string, VoidEvent>();
  for (const event of events) {
    if (event.kind !== 'void') continue;
    const earlier = found.get(event.targetId);
    const first =
      earlier === undefined ||
      event.at < earlier.at ||
      (event.at === earlier.at && event.id < earlier.id);
    if (first) found.set(event.targetId, event);
  }
  return found;
}

/** The events that count, order kept: voided readings and notes left out, the voids too. */
export function withoutVoided<T extends RunEvent>(events: readonly T[]): readonly T[] {
  // Most runs have no void at all: then the same array goes on, with no copy and no lookup.
  let anyVoid = false;
  for (let i = 0; i < events.length && !anyVoid; i++) anyVoid = events[i].kind === 'void';
  if (!anyVoid) return events;
  const voided = voidsByTarget(events);
  return events.filter(
    (e) => e.kind !== 'void' && !((e.kind === 'reading' || e.kind === 'note') && voided.has(e.id)),
  );
}
