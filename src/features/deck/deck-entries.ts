import { orderEvents } from '../../../shared/runs/event-order';
import type {
  NoteEvent,
  Reading,
  RunEvent,
  VoidEvent,
} from '../../../shared/runs/run-event.schema';
import { voidsByTarget } from '../../../shared/runs/voids';
import { THROTTLE_WORDS, timeText } from './format';

/** A reading or note as the deck lists it, with its void when it was taken back. */
export interface DeckEntry {
  event: Reading | NoteEvent;
  voided: VoidEvent | null;
  /** Made on this device, by the signed-in user. */
  own: boolean;
  /** The server's reason, when it refused a void of this entry made here. */
  refusedVoid: string | null;
}

/** One engine's readings and notes, newest first, each with its void (shared/runs/voids.ts). */
export function deckEntries(
  events: readonly RunEvent[],
  engineId: string,
  own: ReadonlySet<string>,
  refusedVoids: ReadonlyMap<string, string>,
): DeckEntry[] {
  const ordered = orderEvents(events, engineId);
  const voids = voidsByTarget(ordered);
  const entries: DeckEntry[] = [];
  for (let i = ordered.length - 1; i >= 0; i--) {
    const event = ordered[i];
    if (event.kind !== 'reading' && event.kind !== 'note') continue;
    entries.push({
      event,
      voided: voids.get(event.id) ?? null,
      own: own.has(event.id),
      refusedVoid: refusedVoids.get(event.id) ?? null,
    });
  }
  return entries;
}

/** Whether this user may take the entry back here: a skipper only their own (the server agrees). */
export const mayVoid = (entry: DeckEntry, role: 'skipper' | 'technician' | 'manager') =>
  entry.voided === null && (role !== 'skipper' || entry.own);

/** "14:05 · 2400 rpm at half throttle · Below half throttle…": an entry in a line. */
export function entryText(event: Reading | NoteEvent, phaseName: (id: string) => string): string {
  const at = timeText(event.at);
  if (event.kind === 'note') return `${at} · Note: ${event.text}`;
  const note = event.note ? ` · “${event.note}”` : '';
  return `${at} · ${event.rpm} rpm at ${THROTTLE_WORDS[event.throttle]} · ${phaseName(event.phaseId)}${note}`;
}
