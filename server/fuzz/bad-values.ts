import fc from 'fast-check';

/** What goes in a request's body and the headers that describe it. */
export type BadBody = { text?: string; contentType?: string; contentEncoding?: string };

/*
 * Building blocks of bad requests: address segments, query strings, header values and JSON-ish
 * values, each leaning on the shapes that have broken servers before (bad percent-escapes,
 * prototype keys, numbers past what JSON or SQLite hold, very long text, other scripts).
 */

/** Segments that are wrong on purpose, already in the form they go on the wire. */
const ODD_SEGMENTS = [
  '%zz',
  '%',
  '%%',
  '%E0%A4%A',
  '%C0%AF',
  '%00',
  '%2F..%2F..',
  '%2e%2e',
  '..',
  '[object Object]',
  encodeURIComponent('{"$ne":null}'),
  encodeURIComponent('["a",{"b":1}]'),
  'null',
  'undefined',
  'NaN',
  '-1',
  '1e400',
  '9007199254740993',
  '0x10',
  '__proto__',
  'constructor',
  '\u00ff\u00e9', // latin-1 bytes Node lets through unescaped
  '',
  'a'.repeat(20_000), // past Node's 16 KB header limit
];

const textAsSegment = fc
  .string({ unit: 'binary', maxLength: 40 })
  .map((text) => encodeURIComponent(text));

/** Characters an address may carry as they are, the percent sign included, so escapes go wrong. */
const rawSegment = fc.stringMatching(/^[A-Za-z0-9%._~!$&'()*+,;=:@-]{1,40}$/);

const longSegment = fc
  .string({ unit: 'grapheme', minLength: 300, maxLength: 1500 })
  .map((text) => encodeURIComponent(text));

/** An address segment that names no record: malformed, odd, or a well-formed id nobody has. */
export const badSegment: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...ODD_SEGMENTS),
  textAsSegment,
  rawSegment,
  longSegment,
  fc.uuid(),
);

const QUERY_KEYS = [
  'offset',
  'limit',
  'cursor',
  'q',
  'status',
  'engineId',
  'vesselId',
  'recordType',
  'recordId',
  'show',
  'caption',
  '__proto__',
  'constructor',
  'a[b]',
  'a[]',
  '',
];

/** Numbers at the edges: past a double, past a safe integer, just inside it, signed zero. */
const NUMBERISH = [
  '1e308',
  '-1e308',
  '1e400',
  '-0',
  '9007199254740991',
  '9007199254740993',
  '4294967296',
  '0.1',
  'Infinity',
];
/** Words some filters accept, so a query can be right in one field and wrong in the next. */
const FILTER_WORDS = ['engine', 'run', 'checklist', 'service', 'all', 'archived', 'action'];

const queryValue = (knownIds: string[]) =>
  fc.oneof(
    fc.constantFrom(...NUMBERISH, ...FILTER_WORDS, ...knownIds, '%zz', '', 'true', '[]', '{}'),
    textAsSegment,
    rawSegment,
  );

/**
 * A query string (with its `?`), from none to repeated, malformed and very long ones; its values
 * may name the `knownIds` given.
 */
export function badQuery(knownIds: string[]): fc.Arbitrary<string> {
  const pair = fc
    .tuple(fc.oneof(fc.constantFrom(...QUERY_KEYS), rawSegment), queryValue(knownIds))
    .map(([key, value]) => `${key}=${value}`);
  return fc.oneof(
    fc.constant(''),
    fc.array(pair, { minLength: 1, maxLength: 6 }).map((pairs) => `?${pairs.join('&')}`),
    fc.constantFrom('?%zz', '?=&=&', '?&&&', '?offset=1&offset=2', `?q=${'x'.repeat(5000)}`),
  );
}

/** A printable header value (what Node lets a client send), odd in content. */
export const headerText = fc.oneof(
  fc.string({ unit: 'grapheme-ascii', maxLength: 60 }),
  fc.constantFrom('%zz', '""', ';;;', '=', '\\', 'x'.repeat(4000)),
);
