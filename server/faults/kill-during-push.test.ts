import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openRunFor } from '../../tests/helpers/api.js';
import {
  killAndRestart,
  startRealServer,
  type RealServer,
} from '../../tests/helpers/real-server.js';
import { DEMO } from '../../tests/helpers/test-server.js';
import {
  progressCounter,
  describePlan,
  killPlans,
  readDatabase,
  readingIdsOf,
  signInOver,
  type FaultSession,
} from './fault-session.js';
import {
  devicesFor,
  noAnswers,
  readingIds,
  sendOutbox,
  unanswered,
  type Answers,
  type Device,
  type PushRun,
} from './push-devices.js';

/*
 * Kill -9 while devices push: whatever the server answered "stored" must be on disk when it
 * comes back, and once the devices have sent again what went unanswered, every reading is kept
 * exactly once. Each trial kills the server a random while after a random number of answers.
 */

const TRIALS = 4;
const BATCHES = 2;
const BATCH_SIZE = 1000;
const plans = killPlans(TRIALS, [0, BATCHES * 3 - 2], 150);
/** A trial restarts the server once (about 4 s) and lists every reading twice. */
const TRIAL_TIMEOUT_MS = 60_000;

let server: RealServer;
let skipper: FaultSession;
let runs: PushRun[];
/** Every reading the devices made, and what the server answered before each kill. */
const made: string[] = [];
const storedBeforeKill = new Set<string>();

beforeAll(async () => {
  server = await startRealServer();
  const tech = await signInOver(server.baseURL, DEMO.technician);
  runs = [
    await openRunFor(tech, 'Gannet', 'single'),
    await openRunFor(tech, 'Blue Tern', 'port'),
    await openRunFor(tech, 'Blue Tern', 'starboard'),
  ];
  skipper = await signInOver(server.baseURL, DEMO.skipperA);
});
afterAll(() => server?.stop());

/** The readings of all three runs as the restarted server lists them. */
async function idsOnServer(): Promise<string[]> {
  return (await Promise.all(runs.map((run) => readingIdsOf(skipper, run.id)))).flat();
}

/** Pushes from every device at once and kills the server where the plan says; returns the answers. */
async function pushAndKill(devices: Device[], trial: number): Promise<Answers> {
  const answers = noAnswers();
  const counter = progressCounter();
  const pushing = Promise.all(devices.map((d) => sendOutbox(skipper, d, answers, counter.note)));
  await Promise.race([counter.reached(plans[trial].after), pushing]);
  await new Promise((r) => setTimeout(r, plans[trial].delayMs));
  const restarted = killAndRestart(server);
  await pushing;
  server = await restarted;
  skipper.moveTo(server.baseURL);
  return answers;
}

describe('kill -9 during a push', () => {
  for (let trial = 0; trial < TRIALS; trial++) {
    it(
      `keeps every answered reading, and each reading once after the re-sends (trial ${trial})`,
      async () => {
        const why = describePlan(trial, plans[trial], 'answer');
        const devices = devicesFor(
          runs,
          BATCHES,
          BATCH_SIZE,
          Date.now() - 6 * 3600_000 + trial * 3600_000,
        );
        made.push(...readingIds(devices));
        const before = await pushAndKill(devices, trial);
        for (const id of before.stored) storedBeforeKill.add(id);
        const waiting = unanswered(devices);

        const held = new Set(await idsOnServer());
        const lost = [...storedBeforeKill].filter((id) => !held.has(id));
        expect(lost, `answered "stored" but gone after the restart; ${why}`).toEqual([]);

        const after = noAnswers();
        await Promise.all(devices.map((d) => sendOutbox(skipper, d, after)));
        expect(unanswered(devices), why).toBe(0);
        expect([...before.refused, ...after.refused], why).toEqual([]);

        const listed = await idsOnServer();
        expect(listed.length - new Set(listed).size, `readings kept twice; ${why}`).toBe(0);
        expect(new Set(listed), `lost or unexpected readings; ${why}`).toEqual(new Set(made));
        console.log(
          `${why}: ${readingIds(devices).length} pushed, ${before.stored.size} answered before the kill, ${waiting} batches sent again (${after.stored.size} stored, ${after.duplicate.size} duplicate)`,
        );
      },
      TRIAL_TIMEOUT_MS,
    );
  }

  it('holds each reading exactly once in the database file', async () => {
    await server.kill();
    const rows = readDatabase(
      server.dir,
      (db) =>
        db
          .prepare(`SELECT "id" FROM "run_event" WHERE "kind" = 'reading' AND "runId" IN (?, ?, ?)`)
          .all(...runs.map((r) => r.id)) as Array<{ id: string }>,
    );
    const ids = rows.map((r) => r.id);
    expect(ids.length).toBe(made.length);
    expect(new Set(ids)).toEqual(new Set(made));
  });
});
