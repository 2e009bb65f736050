import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startRealServer, type RealServer } from '../../tests/helpers/real-server.js';
import { DEMO } from '../../tests/helpers/test-server.js';
import {
  describePlan,
  killPlans,
  progressCounter,
  readDatabase,
  signInOver,
  watchNewFiles,
  type FaultSession,
  type KillPlan,
} from './fault-session.js';
import {
  certificateFile,
  classify,
  signOffCounts,
  strayCertificateFiles,
  type SignOffState,
} from './signoff-state.js';
import { demoSubmittedRun, submittedRuns } from './submitted-runs.js';

/*
 * Kill -9 while the workshop signs runs off: each run comes back either wholly signed off or
 * not at all, a sign-off answered before the kill is there, and signing off again afterwards
 * finishes what the kill interrupted. A sign-off writes its certificate's PDF (through a
 * .partial file) inside its transaction, just before the commit; each trial kills the server a
 * random while, more often short than long, after a random one of those files appears.
 */

const TRIALS = 4;
const SIGN = 'certificate file';
const plans = killPlans(TRIALS, [1, 3], 1000, 3);
/** A trial restarts the server once (about 4 s) besides its sign-offs. */
const TRIAL_TIMEOUT_MS = 60_000;

let server: RealServer;
let tech: FaultSession;
let skipper: FaultSession;
const everyRun: string[] = [];

beforeAll(async () => {
  server = await startRealServer();
  tech = await signInOver(server.baseURL, DEMO.technician);
  skipper = await signInOver(server.baseURL, DEMO.skipperA);
});
afterAll(() => server?.stop());

const signOff = (runId: string) =>
  tech(`/api/runs/${runId}/sign-off`, {
    body: { decision: 'confirm', comments: 'Short log accepted; engine checked at the yard.' },
  });

/** The demo workshop's certificate folder (the demo's signed-off run put a PDF there at start). */
const certificateFolder = () => {
  const root = path.join(server.dir, 'certificates');
  const [workshop] = fs.readdirSync(root);
  return path.join(root, workshop);
};

/** Signs every run off at once and kills the server where the plan says; the answers that came. */
async function signOffAndKill(runIds: string[], plan: KillPlan) {
  const answers = new Map<string, number>();
  const counter = progressCounter();
  const stopWatching = watchNewFiles(certificateFolder(), '.partial', counter.note);
  const signing = Promise.all(
    runIds.map(async (id) => {
      try {
        answers.set(id, (await signOff(id)).status);
      } catch {
        // the server went away before it answered
      }
    }),
  );
  await Promise.race([counter.reached(plan.after), signing]);
  await new Promise((r) => setTimeout(r, plan.delayMs));
  await server.kill();
  stopWatching();
  await signing;
  return answers;
}

/** What each run holds in the data folder the killed server left, and the PDFs no row names. */
async function statesOnDisk(runIds: string[]) {
  const { found, strays } = readDatabase(server.dir, (db) => ({
    found: runIds.map((id) => ({
      counts: signOffCounts(db, id),
      pdf: certificateFile(db, server.dir, id),
    })),
    strays: strayCertificateFiles(db, server.dir),
  }));
  const states = new Map<string, SignOffState>();
  for (const [i, id] of runIds.entries())
    states.set(id, await classify(found[i].counts, found[i].pdf));
  return { states, strays };
}

/**
 * What a kill between a PDF's write and the commit leaves, made by hand so each restart has some
 * to clear: a whole PDF no certificate names, and a .partial one.
 */
function plantCutShortFiles(): string[] {
  const folder = certificateFolder();
  const cutShort = path.join(folder, `${randomUUID()}.pdf`);
  fs.copyFileSync(path.join(folder, fs.readdirSync(folder)[0]), cutShort);
  fs.writeFileSync(`${cutShort}.4242.partial`, '%PDF-1.7');
  return [cutShort, `${cutShort}.4242.partial`];
}

async function restart() {
  server = await startRealServer({}, [], server.dir);
  for (const session of [tech, skipper]) session.moveTo(server.baseURL);
}

/**
 * After the restart each run shows what the disk held; signing off again finishes a run the kill
 * cut short and is refused for one already done (its answer was lost); each has its certificate.
 */
async function signOffAgain(states: Map<string, SignOffState>, why: string) {
  for (const [id, state] of states) {
    const run = await tech(`/api/runs/${id}`);
    expect(run.body.run.state, `${id} after the restart; ${why}`).toBe(state.kind);
    const again = await signOff(id);
    if (state.kind === 'signed-off')
      expect(again.body?.errors, `signing ${id} off again; ${why}`).toEqual([
        { field: 'decision', message: 'This run is already signed off.' },
      ]);
    expect(again.status, `signing ${id} off again; ${why}`).toBe(
      state.kind === 'signed-off' ? 409 : 200,
    );
    const certificate = await tech.download(`/api/runs/${id}/certificate`);
    expect(certificate.type, `certificate of ${id}; ${why}`).toBe('application/pdf');
    expect(certificate.bytes.subarray(0, 5).toString()).toBe('%PDF-');
  }
}

describe('kill -9 during sign-off', () => {
  for (let trial = 0; trial < TRIALS; trial++) {
    it(
      `leaves each run wholly signed off or not at all (trial ${trial})`,
      async () => {
        const why = describePlan(trial, plans[trial], SIGN);
        const runIds = await submittedRuns(tech, skipper);
        if (trial === 0) runIds.push(await demoSubmittedRun(tech));
        everyRun.push(...runIds);
        const answers = await signOffAndKill(runIds, plans[trial]);
        const { states, strays } = await statesOnDisk(runIds);

        const partial = [...states].filter(([, s]) => s.kind === 'partial');
        expect(partial, `half-done sign-offs; ${why}`).toEqual([]);
        for (const [id, status] of answers) {
          expect(status, `sign-off of ${id} answered; ${why}`).toBe(200);
          expect(states.get(id)?.kind, `answered 200 but not signed off: ${id}; ${why}`).toBe(
            'signed-off',
          );
        }

        const left = [...strays, ...plantCutShortFiles()];
        await restart();
        for (const file of left)
          expect(fs.existsSync(file), `${file} left after the restart; ${why}`).toBe(false);
        await signOffAgain(states, why);
        const done = [...states.values()].filter((s) => s.kind === 'signed-off').length;
        console.log(
          `${why}: ${runIds.length} sign-offs, ${answers.size} answered before the kill, ${done} done on disk, ${runIds.length - done} signed off again; ${strays.length} stray PDF files`,
        );
      },
      TRIAL_TIMEOUT_MS,
    );
  }

  it('holds every run wholly signed off, once, after the retries', async () => {
    await server.kill();
    const { states, strays } = await statesOnDisk(everyRun);
    const kinds = [...states.values()].map((s) => s.kind);
    expect(kinds).toEqual(everyRun.map(() => 'signed-off'));
    const numbers = [...states.values()].map((s) => (s.kind === 'signed-off' ? s.number : ''));
    expect(new Set(numbers).size, 'each certificate number issued once').toBe(everyRun.length);
    expect(strays, 'certificate files of sign-offs that never committed').toEqual([]);
  });
});
