import fc from 'fast-check';

/*
 * JSON-ish values for bodies: the API's own field names holding values of the wrong type,
 * values that are no object, text no parser takes and text no serializer writes.
 */

/** Field names the API uses, so a wrong value lands on a field that is read. */
const FIELD_NAMES = [
  'id',
  'name',
  'email',
  'password',
  'role',
  'token',
  'deviceId',
  'sentAt',
  'items',
  'runId',
  'engineId',
  'vesselId',
  'programId',
  'decision',
  'decisions',
  'note',
  'checks',
  'at',
  'event',
  'phases',
  'serialNumber',
  'recordType',
  'recordId',
  'kind',
  'type',
  '__proto__',
  'constructor',
  'toString',
  'valueOf',
];

const HUGE_NUMBERS = [1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -0, 2 ** 63, Number.MIN_VALUE];

/** Objects that break careless `String(value)` or `${value}` (no usable toString or valueOf). */
const UNPRINTABLE: unknown[] = [{ toString: 1 }, { toString: null, valueOf: [] }, { valueOf: {} }];

export const wrongValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...UNPRINTABLE, ...HUGE_NUMBERS, true, false, null, '', [], {}),
  fc.string({ unit: 'grapheme', maxLength: 60 }),
  fc.anything({ maxDepth: 3, maxKeys: 4 }),
  fc.jsonValue({ maxDepth: 4 }),
);

/** A JSON object with the API's field names (and others) holding values of any type. */
export const wrongObject: fc.Arbitrary<Record<string, unknown>> = fc.oneof(
  fc.dictionary(fc.oneof(fc.constantFrom(...FIELD_NAMES), fc.string()), wrongValue, {
    maxKeys: 6,
  }),
  fc.object({ maxDepth: 3, maxKeys: 5 }),
);

/** A JSON value that is not an object: no object schema accepts it, whatever it holds. */
export const nonObjectJson: fc.Arbitrary<unknown> = fc.oneof(
  fc.array(wrongValue, { maxLength: 5 }),
  fc.constantFrom(...HUGE_NUMBERS, true, false, null, '', 'null'),
  fc.string({ unit: 'grapheme', maxLength: 60 }),
);

/** JSON text no parser accepts. */
export const malformedJson: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(
    '{',
    '{"a":',
    '[1,]',
    "{'a':1}",
    '{"a":1}}',
    'NaN',
    '\u0000',
    '   ',
    '{"__proto__":',
    '['.repeat(20_000),
  ),
  fc.string({ unit: 'binary', minLength: 1, maxLength: 80 }).filter((text) => !parses(text)),
);

/** Raw JSON text a serializer would never write: numbers past a double, nesting far down. */
export const oddJsonText: fc.Arbitrary<string> = fc.constantFrom(
  '{"offset":1e999,"limit":-1e999}',
  '{"id":1e999,"name":-0}',
  `${'['.repeat(5000)}${']'.repeat(5000)}`,
  `${'{"a":'.repeat(2000)}1${'}'.repeat(2000)}`,
  '{"a":"\\ud800"}',
);

function parses(text: string): boolean {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
}
