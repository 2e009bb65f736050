import 'reflect-metadata';
import type { Database } from 'better-sqlite3';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { createApp } from '../server/app.js';
import { insertRunEventsSql, runEventRow } from '../server/features/runs/run-event-row.js';
import { prepareData } from '../server/prepare-data.js';
import { openDatabase } from '../server/lib/database.js';
import { nativeConnection } from '../server/lib/native-sql.js';
import { repeatableRandom } from '../server/lib/repeatable-random.js';
import { createLogger } from '../server/lib/logger.js';
import { hashPassword } from '../server/lib/passwords.js';
import { BUILT_IN_PROGRAMS } from '../shared/programs/built-in-programs.js';
import { resolvePhaseBand } from '../shared/programs/resolve-band.js';
import { THROTTLE_POSITIONS } from '../shared/programs/throttle.js';
import type { RunEvent } from '../shared/runs/run-event.schema.js';

/*
 * Issue target: the runs board of a workshop with 2,000 runs, and the review of a run with
 * 36,000 readings, each answer in under 100 ms at the API. Data is generated into a temporary
 * database (made-up engines rated 5000–6000 rpm on the built-in four-stroke program), and every
 * request goes over real HTTP to the app. Run with `npx tsx bench/review.bench.ts`; exits 1 on a miss.
 */
const TARGET_MS = 100;
const BOARD_RUNS = 2000;
const READINGS_PER_RUN = 150; // typed readings, one every few minutes over a ten-hour break-in
const LONG_RUN_READINGS = 36_000; // 50 h with a reading every 5 s
const WARM_UP = 3;
const MEASURED = 25;
const T0 = Date.UTC(2026, 9, 1, 8, 0, 0);

const random = repeatableRandom(7);
const program = BUILT_IN_PROGRAMS['four-stroke-outboard'];
const rating = { ratedRpmMin: 5000, ratedRpmMax: 6000 };
const bands = Object.fromEntries(program.phases.map((p) => [p.id, resolvePhaseBand(p, rating)]));
const STATES = [
  'planned',
  'under-way',
  'under-way',
  'submitted',
  'signed-off',
  'signed-off',
  'signed-off',
  'signed-off',
  'returned',
  'under-way',
];

type Native = Database;

function insertWorkshop(
  db: Native,
  ids: { workshop: string; manager: string },
  passwordHash: string,
) {
  db.prepare(
    'INSERT INTO "workshop" ("id", "name", "address", "email", "timezone", "units") VALUES (?, ?, ?, ?, ?, ?)',
  ).run(
    ids.workshop,
    'Bench Boatyard',
    'Quay 1',
    'desk@bench.example',
    'UTC',
    JSON.stringify({ speed: 'kn', volume: 'L', power: 'kW', temperature: 'C' }),
  );
  db.prepare(
    'INSERT INTO "user" ("id", "workshopId", "email", "name", "role", "passwordHash") VALUES (?, ?, ?, ?, ?, ?)',
  ).run(ids.manager, ids.workshop, 'bench@bench.example', 'Bench Manager', 'manager', passwordHash);
}

/** One vessel, engine and run; `readings` readings spread over sessions of five hours. */
function insertRun(
  db: Native,
  ids: { workshop: string; manager: string },
  n: number,
  readings: number,
  everyMs: number,
  seq: { value: number },
): string {
  const vesselId = randomUUID();
  const engineId = randomUUID();
  const runId = randomUUID();
  db.prepare('INSERT INTO "vessel" ("id", "workshopId", "name", "type") VALUES (?, ?, ?, ?)').run(
    vesselId,
    ids.workshop,
    `Bench boat ${n}`,
    'workboat',
  );
  db.prepare(
    'INSERT INTO "engine" ("id", "vesselId", "workshopId", "position", "installation", "maker", "model", "serialNumber", "fuel", "cycle", "ratedRpmMin", "ratedRpmMax", "hourMeterAtCommissioning", "commissionedOn") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
  ).run(
    engineId,
    vesselId,
    ids.workshop,
    'single',
    'outboard',
    'Benchmark',
    'B-100',
    `BENCH-${n}`,
    'petrol',
    'four-stroke',
    5000,
    6000,
    0.5,
    '2026-10-01',
  );
  const state = readings > 1000 ? 'submitted' : STATES[n % STATES.length];
  const events = state === 'planned' ? 0 : readings;
  db.prepare(
    'INSERT INTO "run" ("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "lastEventAt", "seq") VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)',
  ).run(
    runId,
    ids.workshop,
    engineId,
    vesselId,
    randomUUID(),
    JSON.stringify(program),
    JSON.stringify(bands),
    state,
    ids.manager,
    events ? T0 + events * everyMs : null,
    seq.value++,
  );
  const insert = db.prepare(insertRunEventsSql(1));
  const add = (event: Record<string, unknown> & { id: string; kind: string; at: number }) =>
    insert.run(
      ...runEventRow({ engineId, ...event } as RunEvent, {
        runId,
        workshopId: ids.workshop,
        receivedAt: event.at + 60_000,
        authorId: ids.manager,
        seq: seq.value++,
      }),
    );
  const perSession = Math.ceil((5 * 3_600_000) / everyMs);
  let required = 0;
  for (let i = 0; i < events; i++) {
    const at = T0 + Math.floor(i / perSession) * 86_400_000 + (i % perSession) * everyMs;
    if (i % perSession === 0) add({ kind: 'session-start', id: randomUUID(), at, engineId });
    required += everyMs;
    const phase = program.phases[required < 600_000 ? 0 : required < 7_200_000 ? 1 : 2];
    const band = bands[phase.id];
    add({
      kind: 'reading',
      id: randomUUID(),
      at,
      engineId,
      phaseId: phase.id,
      rpm: Math.round(band.rpmMin + random() * (band.rpmMax - band.rpmMin) * 1.05),
      throttle: THROTTLE_POSITIONS[1 + Math.floor(random() * 3)],
    });
    if (i % perSession === perSession - 1 || i === events - 1)
      add({ kind: 'session-stop', id: randomUUID(), at: at + everyMs, engineId });
  }
  return runId;
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil(p * sorted.length) - 1)];

async function measure(label: string, url: string, cookie: string): Promise<boolean> {
  const once = async () => {
    const started = performance.now();
    const res = await fetch(url, { headers: { cookie } });
    if (!res.ok) throw new Error(`${label}: ${res.status} ${await res.text()}`);
    await res.arrayBuffer();
    return performance.now() - started;
  };
  const cold = await once();
  for (let i = 0; i < WARM_UP; i++) await once();
  const times: number[] = [];
  for (let i = 0; i < MEASURED; i++) times.push(await once());
  times.sort((a, b) => a - b);
  const p95 = percentile(times, 0.95);
  const pass = p95 < TARGET_MS;
  console.log(
    `${label}: first request ${cold.toFixed(1)} ms; then median ${percentile(times, 0.5).toFixed(1)} ms, p95 ${p95.toFixed(1)} ms over ${MEASURED} (target p95 < ${TARGET_MS} ms) ${pass ? 'PASS' : 'FAIL'}`,
  );
  return pass;
}

async function main() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-bench-review-'));
  const dataSource = await openDatabase(path.join(dir, 'bench.sqlite'));
  await prepareData(dataSource, { demo: 'none' });
  const ids = { workshop: randomUUID(), manager: randomUUID() };
  const db = nativeConnection(dataSource);
  const passwordHash = await hashPassword('ringseat-bench');
  const seq = { value: 1 };
  let longRun = '';
  const started = performance.now();
  db.transaction(() => {
    insertWorkshop(db, ids, passwordHash);
    for (let n = 0; n < BOARD_RUNS - 1; n++)
      insertRun(db, ids, n, READINGS_PER_RUN, 4 * 60_000, seq);
    longRun = insertRun(db, ids, BOARD_RUNS, LONG_RUN_READINGS, 5_000, seq);
  })();
  db.prepare('UPDATE "change_counter" SET "value" = ? WHERE "name" = ?').run(seq.value, 'changes');
  console.log(
    `data: ${BOARD_RUNS} runs, ${seq.value} events and runs in ${((performance.now() - started) / 1000).toFixed(1)} s (one run with ${LONG_RUN_READINGS} readings)`,
  );

  const app = createApp({ dataSource, logger: createLogger('silent'), dataDir: dir });
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'bench@bench.example', password: 'ringseat-bench' }),
  });
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
  try {
    const board = await measure(`runs board (${BOARD_RUNS} runs)`, `${base}/api/board`, cookie);
    const review = await measure(
      `run review (${LONG_RUN_READINGS} readings)`,
      `${base}/api/runs/${longRun}/review`,
      cookie,
    );
    console.log(board && review ? 'PASS' : 'FAIL');
    if (!(board && review)) process.exitCode = 1;
  } finally {
    server.close();
    await dataSource.destroy();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

await main();
