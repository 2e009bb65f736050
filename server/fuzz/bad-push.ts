import fc from 'fast-check';
import { wrongObject, wrongValue } from './bad-json.js';
import type { BadBody } from './bad-values.js';

/*
 * Sync pushes whose envelope is right and whose items are not. The push checks its items one by
 * one after the envelope (check-items.ts), so only such a batch reaches that code. Every item
 * names a run id made up here (or no id at all): the server refuses an item naming a run the
 * sender may not see, so nothing from these batches can be stored.
 */

const madeUpRunId = fc.oneof(wrongValue, fc.uuid());

const eventLike = fc.record(
  {
    kind: fc.oneof(
      fc.constantFrom('reading', 'note', 'void', 'session-start', 'phase-change'),
      wrongValue,
    ),
    id: fc.oneof(wrongValue, fc.uuid()),
    at: fc.oneof(fc.nat(), wrongValue),
    engineId: wrongValue,
    rpm: wrongValue,
    throttle: wrongValue,
  },
  { requiredKeys: ['kind', 'id'] },
);

const itemLike = fc.record(
  {
    type: fc.oneof(fc.constantFrom('event', 'run-patch'), wrongValue),
    id: fc.oneof(wrongValue, fc.uuid()),
    runId: madeUpRunId,
    at: fc.oneof(fc.nat(), wrongValue),
    event: fc.oneof(eventLike, wrongValue),
    submit: wrongValue,
    notes: wrongValue,
  },
  { requiredKeys: ['type', 'id', 'runId'] },
);

/** A well-formed batch envelope around up to ten bad items, mostly shaped like real ones. */
export const pushOfBadItems: fc.Arbitrary<BadBody> = fc
  .record({
    deviceId: fc.uuid(),
    sentAt: fc.nat(),
    items: fc.array(fc.oneof({ weight: 3, arbitrary: itemLike }, wrongObject, wrongValue), {
      minLength: 1,
      maxLength: 10,
    }),
  })
  .map((batch) => ({ text: JSON.stringify(batch), contentType: 'application/json' }));
