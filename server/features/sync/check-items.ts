import { nextTurn } from '../../lib/next-turn.js';
import {
  PushItemSchema,
  type PushItem,
  type PushResult,
} from '../../../shared/sync/sync.schema.js';
import { fieldErrors } from '../../middleware/validate.js';

export type Checked = { index: number; item: PushItem } | { index: number; rejected: PushResult };

/**
 * Checks each item on its own: an invalid item is rejected with its reason, the others go on.
 * A few hundred at a time, letting other requests in between.
 */
export async function checkItems(items: unknown[]): Promise<Checked[]> {
  const checked: Checked[] = [];
  for (let from = 0; from < items.length; from += 100) {
    if (from > 0) await nextTurn();
    items.slice(from, from + 100).forEach((raw, i) => checked.push(checkItem(raw, from + i)));
  }
  return checked;
}

function checkItem(raw: unknown, index: number): Checked {
  const parsed = PushItemSchema.safeParse(raw);
  if (parsed.success) return { index, item: parsed.data };
  const [first] = fieldErrors(parsed.error);
  const named =
    typeof raw === 'object' && raw !== null
      ? ((raw as { event?: { id?: unknown } }).event?.id ?? (raw as { id?: unknown }).id)
      : undefined;
  // Only a text or number id can name the item back to the device; an object may not even turn
  // into text (`{"toString":1}` throws), so the item is named by its place in the batch instead.
  const id = typeof named === 'string' || typeof named === 'number' ? String(named) : `#${index}`;
  return {
    index,
    rejected: { id, status: 'rejected', reason: first.message, field: first.field },
  };
}

/** The runs the well-formed items name, each once. */
export const namedRunIds = (checked: Checked[]): string[] => [
  ...new Set(checked.flatMap((c) => ('item' in c ? [c.item.runId] : []))),
];

const UNSEEN_RUN =
  'This run is not shared with you, or no longer exists: ask the workshop to link you to its boat again.';

/** Refuses by name each item whose run the user may not see; the others go on. */
export function refuseUnseenRuns(
  checked: Checked[],
  visible: ReadonlyMap<string, unknown>,
): Checked[] {
  return checked.map((c) =>
    'item' in c && !visible.has(c.item.runId)
      ? {
          index: c.index,
          rejected: {
            id: c.item.type === 'event' ? c.item.event.id : c.item.id,
            status: 'rejected',
            reason: UNSEEN_RUN,
            field: 'runId',
          },
        }
      : c,
  );
}
