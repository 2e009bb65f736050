import fc from 'fast-check';
import { z } from 'zod';
import { multipartBody } from './bad-multipart.js';
import { malformedJson, nonObjectJson, oddJsonText, wrongObject } from './bad-json.js';
import { type BadBody, headerText } from './bad-values.js';

/** Types the API never reads as JSON (outside the one multipart upload). */
const NOT_JSON = [
  'text/plain',
  'application/x-www-form-urlencoded',
  'application/xml',
  'image/png',
  'application/octet-stream',
];
/** Types that are JSON, or look like it to a careless check. */
const JSONISH = [
  'application/json',
  'APPLICATION/JSON',
  'application/json; charset=utf-8',
  'application/json; charset=utf-16',
  'application/json; charset=koi8-r',
  'application/merge-patch+json',
  'application/json;;;',
  'application/jsonx',
  'json',
];
const ENCODINGS = ['br', 'gzip', 'deflate', 'identity', 'x-unknown', 'br, gzip'];

const json = (text: fc.Arbitrary<string>) =>
  fc.record({ text, contentType: fc.constant('application/json') });

/** Any JSON text, mostly objects with wrong-typed fields so the checks past parsing are reached. */
const anyJsonText = fc.oneof(
  { weight: 4, arbitrary: wrongObject.map((value) => JSON.stringify(value)) },
  { weight: 1, arbitrary: nonObjectJson.map((value) => JSON.stringify(value) ?? 'null') },
  { weight: 1, arbitrary: oddJsonText },
  { weight: 1, arbitrary: malformedJson },
);

const rarely = <T>(arbitrary: fc.Arbitrary<T>) =>
  fc.oneof({ weight: 5, arbitrary: fc.constant(undefined) }, { weight: 1, arbitrary });

/** A body sent with a type the API refuses (415) before anything reads it. */
export const refusedTypeBody: fc.Arbitrary<BadBody> = fc.record({
  text: fc.oneof(anyJsonText, headerText).filter((text) => text.length > 0),
  contentType: fc.oneof(fc.constantFrom(...NOT_JSON), headerText.filter(notJsonType)),
  contentEncoding: rarely(fc.constantFrom(...ENCODINGS)),
});

function notJsonType(type: string): boolean {
  const lower = type.toLowerCase();
  return type.trim() !== '' && !lower.includes('json') && !lower.includes('multipart');
}

/**
 * Every kind of body, for requests that are refused whatever the body holds; mostly JSON, so
 * that most requests get past the body reading to the checks after it.
 */
export const anyBody: fc.Arbitrary<BadBody> = fc.oneof(
  { weight: 3, arbitrary: fc.constant({}) },
  { weight: 6, arbitrary: json(anyJsonText) },
  {
    weight: 2,
    arbitrary: fc.record({
      text: anyJsonText,
      contentType: fc.constantFrom(...JSONISH),
      contentEncoding: rarely(fc.constantFrom(...ENCODINGS)),
    }),
  },
  { weight: 1, arbitrary: refusedTypeBody },
  { weight: 1, arbitrary: multipartBody },
);

/** A read's body: usually none, as a browser sends, sometimes any of the above. */
export const readBody: fc.Arbitrary<BadBody> = fc.oneof(
  { weight: 4, arbitrary: fc.constant({}) },
  { weight: 1, arbitrary: anyBody },
);

/** Malformed JSON, typed as JSON and not compressed: refused while it is read (400). */
export const malformedBody: fc.Arbitrary<BadBody> = json(malformedJson);

/**
 * Bodies a route checking `schema` refuses: JSON that is not an object, malformed JSON, and
 * objects (or no body at all, read as `{}`) that the route's own schema turns down.
 */
export function refusedBy(schema: z.core.$ZodType): fc.Arbitrary<BadBody> {
  const refused = (value: unknown) => !z.safeParse(schema, value).success;
  return fc.oneof(
    json(nonObjectJson.map((value) => JSON.stringify(value) ?? 'null')),
    malformedBody,
    json(
      fc
        .oneof(
          wrongObject.map((value) => JSON.stringify(value)),
          oddJsonText,
        )
        .filter((text) => refused(JSON.parse(text))),
    ),
    refused({}) ? fc.constant({}) : malformedBody,
  );
}

export type { BadBody };
