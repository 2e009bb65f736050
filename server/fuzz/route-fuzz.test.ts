import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer } from '../../tests/helpers/test-server.js';
import { appRoutes, routeName, type AppRoute } from './app-routes.js';
import { badRequests, type BadRequest } from './bad-requests.js';
import { changeCount, changedTables, fingerprint, type Fingerprint } from './db-fingerprint.js';
import { everyone, readableIds } from './fuzz-setup.js';
import { describeExchange, send, type Sender } from './send-request.js';
import { capturingLogger } from './server-log.js';

/** The same inputs on every run, so what fails in CI fails on a laptop too. */
const FIXED_SEED = 20_260_601;
/** Fresh inputs on every run; a failure names this seed, and FUZZ_SEED=<it> replays it. */
const RUN_SEED = Number(process.env.FUZZ_SEED ?? Math.floor(Math.random() * 2 ** 31));
/**
 * Requests for the whole file, shared by routes, senders and both seeds: about 25 s on two
 * cores. FUZZ_BUDGET=20000 hunts longer on a laptop.
 */
const REQUEST_BUDGET = Number(process.env.FUZZ_BUDGET ?? 4_800);
/** Fewer means the walk over the router broke, not that the API shrank. */
const MIN_ROUTES = 40;

const log = capturingLogger();
const server = await startTestServer({ logger: log.logger });
const routes = appRoutes(server.app);
let senders: Sender[] = [];
let ids: string[] = [];
let before: Fingerprint;
let latest: Fingerprint;
let changes = 0;
let sent = 0;

beforeAll(async () => {
  senders = await everyone(server.app);
  ids = await readableIds(server.dataSource);
  before = latest = fingerprint(server.dataSource);
  changes = changeCount(server.dataSource);
});
afterAll(() => server.close());

const runsPerSeed = () =>
  Math.max(2, Math.floor(REQUEST_BUDGET / (routes.length * senders.length * 2)));

/** Tables changed by the request just answered (a full fingerprint only when something wrote). */
function tablesChangedJustNow(): string[] {
  const count = changeCount(server.dataSource);
  if (count === changes) return [];
  changes = count;
  const now = fingerprint(server.dataSource);
  const changed = changedTables(latest, now);
  latest = now;
  return changed;
}

async function sendChecked(sender: Sender, request: BadRequest): Promise<void> {
  const answer = await send(server.app, sender, request);
  sent += 1;
  const changed = tablesChangedJustNow();
  const errors = log.takeErrors();
  if (answer.status > 0 && answer.status < 500 && changed.length === 0) return;
  const what = changed.length > 0 ? `changed rows of ${changed.join(', ')}` : 'was answered 5xx';
  throw new Error(`A bad request ${what}:\n${describeExchange(sender, request, answer, errors)}`);
}

async function fuzz(route: AppRoute, seed: number): Promise<void> {
  const property = fc.asyncProperty(badRequests(route, ids), async (request) => {
    for (const sender of senders) await sendChecked(sender, request);
  });
  await fc.assert(property, {
    seed: seedFor(route, seed),
    numRuns: runsPerSeed(),
    reporter: (details) => {
      if (!details.failed) return;
      const cause = details.errorInstance instanceof Error ? details.errorInstance.message : '';
      throw new Error(
        `${routeName(route)} failed with ${seed === FIXED_SEED ? 'the fixed' : "this run's"} seed ${seed}` +
          ` (replay: FUZZ_SEED=${seed} npx vitest run --project node server/fuzz -t '${routeName(route)}')` +
          `; fast-check path "${details.counterexamplePath}", shrunk ${details.numShrinks} times.\n${cause}`,
      );
    },
  });
}

/** Each route its own stream of inputs from one seed, so routes do not all see the same ones. */
function seedFor(route: AppRoute, seed: number): number {
  let hash = seed | 0;
  for (const char of routeName(route)) hash = (Math.imul(hash, 31) + char.charCodeAt(0)) | 0;
  return hash;
}

describe('bad input to every API route: never a 5xx, never a changed row', () => {
  it(`finds the app's routes in its router (at least ${MIN_ROUTES})`, () => {
    expect(routes.length).toBeGreaterThanOrEqual(MIN_ROUTES);
  });

  for (const route of routes) {
    it(routeName(route), async () => {
      await fuzz(route, FIXED_SEED);
      await fuzz(route, RUN_SEED);
    });
  }

  it('left every row as it was and every sender signed in', async () => {
    expect(changedTables(before, fingerprint(server.dataSource))).toEqual([]);
    for (const sender of senders.filter((s) => s.sessionCookie)) {
      const me = { method: 'GET', path: '/api/auth/me', headers: {}, body: {} } as const;
      expect((await send(server.app, sender, me)).status, sender.who).toBe(200);
    }
    expect(sent).toBeGreaterThanOrEqual(routes.length * senders.length * 2 * runsPerSeed());
  });
});
