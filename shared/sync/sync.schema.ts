import { z } from 'zod/mini';
import '../zod-english';
import { RunEventSchema } from '../runs/run-event.schema';
import type { RunDetail } from '../runs/run-view';
import type { VesselView } from '../vessels/vessel-view';

/*
 * The sync protocol between a device and the server.
 * Push: the device sends what waits in its outbox, in batches. Every item has an id made on
 * the device; the server upserts by it, so a batch sent twice changes nothing the second time.
 * Pull: the device asks for what changed after its cursor, a server change number (never a clock).
 */

export const MAX_PUSH_ITEMS = 2000;
export const MAX_SUBMIT_NOTE = 2000;

/** A device-made event (reading, session start/stop, phase advance, alert, note) for one run. */
export const EventItemSchema = z.object({
  type: z.literal('event'),
  runId: z.uuid({ error: 'The run (runId) must be a run id.' }),
  event: RunEventSchema,
});
export type EventItem = z.infer<typeof EventItemSchema>;

/**
 * A change to the run itself. `id` makes it idempotent like an event. Fields left out are not
 * changed. `submit` asks for the run to go to the workshop for review; with a phase not complete
 * it needs `submitNote`, which the workshop reads on the review.
 */
export const RunPatchItemSchema = z.object({
  type: z.literal('run-patch'),
  id: z.uuid({ error: 'The change id (id) must be a UUID made on the device.' }),
  runId: z.uuid({ error: 'The run (runId) must be a run id.' }),
  at: z
    .number({ error: 'The change time (at) must be epoch milliseconds.' })
    .check(z.int(), z.nonnegative()),
  currentPhaseId: z.optional(z.string().check(z.trim(), z.minLength(1), z.maxLength(64))),
  notes: z.optional(
    z
      .string({ error: 'The run notes (notes) must be text.' })
      .check(
        z.maxLength(4000, { error: 'The run notes (notes) can have at most 4000 characters.' }),
      ),
  ),
  submit: z.optional(z.literal(true)),
  /** Why the run goes to the workshop with a phase not complete; required then (see apply-items). */
  submitNote: z.optional(
    z.string({ error: 'The note to the workshop (submitNote) must be text.' }).check(
      z.trim(),
      z.maxLength(MAX_SUBMIT_NOTE, {
        error: `The note to the workshop (submitNote) can have at most ${MAX_SUBMIT_NOTE} characters.`,
      }),
    ),
  ),
});
export type RunPatchItem = z.infer<typeof RunPatchItemSchema>;

/**
 * Items are checked one by one on the server (an invalid item is rejected with its reason while
 * the valid ones are stored), so the batch schema only checks the envelope.
 */
export const PushBatchSchema = z.object({
  deviceId: z.uuid({ error: 'The device id (deviceId) must be a UUID.' }),
  /** The device's clock when it sent the batch, to spot a device clock far off. */
  sentAt: z
    .number({ error: 'The send time (sentAt) must be epoch milliseconds.' })
    .check(z.int(), z.nonnegative()),
  items: z.array(z.unknown(), { error: 'The items (items) must be a list.' }).check(
    z.minLength(1, { error: 'Send at least one item (items).' }),
    z.maxLength(MAX_PUSH_ITEMS, {
      error: `Send at most ${MAX_PUSH_ITEMS} items (items) per batch.`,
    }),
  ),
});
export type PushBatch = z.infer<typeof PushBatchSchema>;

export const PushItemSchema = z.discriminatedUnion('type', [EventItemSchema, RunPatchItemSchema], {
  error: 'The item type (type) must be event or run-patch.',
});
export type PushItem = z.infer<typeof PushItemSchema>;

/** stored: new and kept; duplicate: already had (nothing changed); rejected: not kept, see reason. */
export const PushResultSchema = z.object({
  id: z.string(),
  status: z.enum(['stored', 'duplicate', 'rejected']),
  reason: z.optional(z.string()),
  field: z.optional(z.string()),
});
export type PushResult = z.infer<typeof PushResultSchema>;

export const PushResponseSchema = z.object({
  results: z.array(PushResultSchema),
  serverTime: z.number(),
});
export type PushResponse = z.infer<typeof PushResponseSchema>;

export const PullQuerySchema = z.object({
  cursor: z._default(
    z.coerce
      .number({ error: 'The cursor (cursor) must be a whole number.' })
      .check(z.int(), z.nonnegative()),
    0,
  ),
  limit: z._default(
    z.coerce
      .number()
      .check(
        z.int(),
        z.minimum(1),
        z.maximum(5000, { error: 'Ask for at most 5000 events (limit) at a time.' }),
      ),
    2000,
  ),
});

/** An event as a pull answers it: the run it belongs to and when the server received it. */
export const PulledEventSchema = z.object({
  runId: z.string(),
  receivedAt: z.number(),
  event: RunEventSchema,
});
export type PulledEvent = z.infer<typeof PulledEventSchema>;

const isRecord = (value: unknown) => typeof value === 'object' && value !== null;

/**
 * What GET /api/sync/pull answers: events changed after the cursor (in change order), the runs
 * that changed, and always every visible run id and vessel, so a device notices a run it may no
 * longer see. The server builds its answer as this type; the device checks a page with it
 * before storing anything. Runs and vessels are the API's own views, checked here only as
 * records: their fields are the server's making, and their full schemas would bring classic zod
 * onto the deck.
 */
export const PullResponseSchema = z.object({
  cursor: z.number().check(z.int(), z.nonnegative()),
  more: z.boolean(),
  runIds: z.array(z.string()),
  runs: z.array(z.custom<RunDetail>(isRecord)),
  events: z.array(PulledEventSchema),
  vessels: z.array(z.custom<VesselView>(isRecord)),
});
export type PullResponse = z.infer<typeof PullResponseSchema>;

/** A day: a device clock further off than this is flagged on the run for the workshop. */
export const CLOCK_SKEW_FLAG_MS = 24 * 60 * 60 * 1000;

/** Id of a push item: the event's own id, or the patch id. */
export const pushItemId = (item: PushItem): string =>
  item.type === 'event' ? item.event.id : item.id;
