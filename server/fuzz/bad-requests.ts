import fc from 'fast-check';
import { fillPattern, isRead, routeName, type AppRoute } from './app-routes.js';
import {
  anyBody,
  malformedBody,
  readBody,
  refusedBy,
  refusedTypeBody,
  type BadBody,
} from './bad-bodies.js';
import { multipartBody } from './bad-multipart.js';
import { badQuery, badSegment, headerText } from './bad-values.js';
import { BODY_SCHEMAS, PAST_SCHEMA_BODIES } from './body-schemas.js';

/** One request as sent: what the failure message shows to replay it by hand. */
export type BadRequest = {
  method: AppRoute['method'];
  path: string;
  headers: Record<string, string>;
  body: BadBody;
};

/** Origins that are not the app's own: a write carrying one is refused (403) before its handler. */
const FOREIGN_ORIGINS = [
  'http://evil.example',
  'null',
  'https://ringseat.test.evil.example',
  'file://',
  '%zz',
];

const ODD_COOKIES = [
  'theme=%zz',
  'a=%',
  '=',
  ';;;',
  'ringseat_session=',
  'ringseat_session=%zz',
  `big=${'y'.repeat(3000)}`,
];

const oddHeaders = fc.record(
  {
    cookie: fc.oneof(
      fc.constantFrom(...ODD_COOKIES),
      headerText,
      fc.uuid().map((id) => `theme=dark; ringseat_session=${id}`),
    ),
    'x-forwarded-for': headerText,
    accept: fc.oneof(fc.constantFrom('*/*', 'text/html', 'application/pdf', ''), headerText),
    'if-none-match': headerText,
    range: fc.constantFrom('bytes=0-0', 'bytes=-1', 'bytes=99999999999-', 'items=1-2'),
    'accept-encoding': fc.constantFrom('br', 'gzip;q=0', '*', 'identity;q=0'),
  },
  { requiredKeys: [] },
);

type BodyAndOrigin = { body: BadBody; origin?: string };

const withOrigin = (body: fc.Arbitrary<BadBody>, origin: fc.Arbitrary<string | undefined>) =>
  fc.record({ body, origin }) as fc.Arbitrary<BodyAndOrigin>;

/** Now and then an Origin that is not the app's; mostly the app's own, so checks past it run. */
const anyOrigin = fc.oneof(
  { weight: 6, arbitrary: fc.constant(undefined) },
  { weight: 1, arbitrary: fc.oneof(fc.constantFrom(...FOREIGN_ORIGINS), headerText) },
);

/**
 * How a route's requests are kept harmless, whoever sends them:
 * - a read (GET) must not write whatever it is sent;
 * - a write with an id in its address gets ids that name no record, so any body is fine;
 * - a write without one gets a body its own schema refuses (BODY_SCHEMAS), or, when the test
 *   does not hold that schema, only requests refused before any handler runs.
 */
function bodyAndOrigin(route: AppRoute): fc.Arbitrary<BodyAndOrigin> {
  if (isRead(route)) return withOrigin(readBody, anyOrigin);
  if (route.params.length > 0) return withOrigin(anyBody, anyOrigin);
  const schema = BODY_SCHEMAS[routeName(route)];
  const past = PAST_SCHEMA_BODIES[routeName(route)];
  // Multipart is refused (415) everywhere but the upload, whose form names no real record.
  if (schema)
    return withOrigin(
      fc.oneof(refusedBy(schema), multipartBody, ...(past ? [past, past, past] : [])),
      anyOrigin,
    );
  return fc.oneof(
    withOrigin(malformedBody, fc.constant(undefined)),
    withOrigin(refusedTypeBody, fc.constant(undefined)),
    withOrigin(anyBody, fc.constantFrom(...FOREIGN_ORIGINS)),
  );
}

/**
 * Bad requests for `route`. `readableIds` are ids of real records, put into the address and
 * query of reads only (a bad query on a real run reaches further than one on no run at all).
 */
export function badRequests(route: AppRoute, readableIds: string[]): fc.Arbitrary<BadRequest> {
  const ids = isRead(route) ? readableIds : [];
  const segment = ids.length > 0 ? fc.oneof(badSegment, fc.constantFrom(...ids)) : badSegment;
  return fc
    .record({
      segments: fc.tuple(...route.params.map(() => segment)),
      query: badQuery(ids),
      headers: oddHeaders,
      bodyAndOrigin: bodyAndOrigin(route),
    })
    .map(({ segments, query, headers, bodyAndOrigin: { body, origin } }) => ({
      method: route.method,
      path: fillPattern(route, segments) + query,
      headers: withBodyHeaders({ ...definedOnly(headers), ...(origin ? { origin } : {}) }, body),
      body,
    }));
}

function withBodyHeaders(headers: Record<string, string>, body: BadBody): Record<string, string> {
  const result = { ...headers };
  if (body.contentType !== undefined) result['content-type'] = body.contentType;
  if (body.contentEncoding !== undefined) result['content-encoding'] = body.contentEncoding;
  return result;
}

const definedOnly = (headers: Partial<Record<string, string>>): Record<string, string> =>
  Object.fromEntries(
    Object.entries(headers).filter((entry): entry is [string, string] => entry[1] !== undefined),
  );
