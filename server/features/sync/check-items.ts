import {
  PushItemSchema,
  type PushItem,
  type PushResult,
} from '../../../shared/sync/sync.schema.js';
import { fieldErrors } from '../../middleware/validate.js';

type Checked = { index: number; item: PushItem } | { index: number; rejected: PushResult };

/** Checks each item on its own: an invalid item is rejected with its reason, the others go on. */
export function checkItems(items: unknown[]): Checked[] {
  return items.map((raw, index) => {
    const parsed = PushItemSchema.safeParse(raw);
    if (parsed.success) return { index, item: parsed.data };
    const [first] = fieldErrors(parsed.error);
    const id =
      typeof raw === 'object' && raw !== null
        ? String(
            (raw as { id?: unknown; event?: { id?: unknown } }).event?.id ??
              (raw as { id?: unknown }).id ??
              `#${index}`,
          )
        : `#${index}`;
    return {
      index,
      rejected: { id, status: 'rejected', reason: first.message, field: first.field },
    };
  });
}
