import { randomUUID } from 'node:crypto';
import path from 'node:path';
import Database from 'better-sqlite3';
import { insertRunEventsSql, runEventRow } from '../server/features/runs/run-event-row.js';
import { MAX_PUSH_ITEMS } from '../shared/sync/sync.schema.js';
import { startRealServer } from '../tests/helpers/real-server.js';

/*
 * Issue target: pushing 10,000 readings through POST /api/sync/push, in batches as the device
 * sends them, takes at most 3× the time of inserting the same rows straight into SQLite with
 * better-sqlite3 in one transaction. Both are measured here, side by side, several times.
 */
const READINGS = 10_000;
const ROUNDS = 7;
/** A first round that is not counted: both sides start cold (JIT, page cache), as no long-running server does. */
const WARM_UP = 1;
const TARGET_RATIO = 3;

// The server runs in its own process, as in production. The push time counts everything from
// the first batch leaving to the last answer arriving, including building and sending the JSON.
// PROFILE_SERVER=dir writes a CPU profile of the server process into dir.
const server = await startRealServer(
  { LOG_LEVEL: 'silent' },
  process.env.PROFILE_SERVER ? ['--cpu-prof', `--cpu-prof-dir=${process.env.PROFILE_SERVER}`] : [],
);
const base = server.baseURL;
const databaseFile = path.join(server.dir, 'ringseat.sqlite');
const reader = new Database(databaseFile);

async function call(pathname: string, cookie: string, body?: unknown) {
  const res = await fetch(base + pathname, {
    method: body === undefined ? 'GET' : 'POST',
    headers: { 'content-type': 'application/json', origin: base, cookie },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${pathname}: ${res.status} ${await res.text()}`);
  return res;
}

async function signIn(email: string) {
  const res = await call('/api/auth/sign-in', '', { email, password: 'ringseat-demo' });
  return res.headers.get('set-cookie')!.split(';')[0];
}

const benchRunIds: string[] = [];
const tech = await signIn('ivo@tidewright.example');
const skipper = await signIn('sunniva@skipper.example');
const vessels = (await (await call('/api/vessels', tech)).json()).vessels;
const programs = (await (await call('/api/programs', tech)).json()).programs;

async function newRun(position: 'port' | 'starboard' | 'single', vesselName: string) {
  const engine = vessels
    .find((v: { name: string }) => v.name === vesselName)
    .engines.find((e: { position: string }) => e.position === position);
  const program = programs.find(
    (p: { builtInKey: string }) => p.builtInKey === 'four-stroke-outboard',
  );
  return (
    await (await call('/api/runs', tech, { engineId: engine.id, programId: program.id })).json()
  ).run;
}

function readings(run: {
  id: string;
  engine: { id: string };
  program: { phases: Array<{ id: string }> };
}) {
  const t0 = Date.parse('2026-12-01T08:00:00Z');
  return Array.from({ length: READINGS }, (_, i) => ({
    type: 'event' as const,
    runId: run.id,
    event: {
      kind: 'reading' as const,
      id: randomUUID(),
      at: t0 + i * 5000,
      engineId: run.engine.id,
      phaseId: run.program.phases[1].id,
      rpm: 2600 + (i % 40) * 10,
      throttle: 'half' as const,
    },
  }));
}

async function timePush(items: ReturnType<typeof readings>) {
  const deviceId = randomUUID();
  const started = performance.now();
  for (let from = 0; from < items.length; from += MAX_PUSH_ITEMS) {
    await call('/api/sync/push', skipper, {
      deviceId,
      sentAt: Date.now(),
      items: items.slice(from, from + MAX_PUSH_ITEMS),
    });
  }
  return performance.now() - started;
}

/**
 * The same rows straight into a copy of the database as it stands just before the push (same
 * tables, indexes, foreign keys and the rows already there), in one transaction on a plain
 * connection: WAL with synchronous NORMAL as the server, SQLite's default checkpointing, so its
 * commit folds the 10,000 rows into the database file as the server's checkpoints do over time.
 */
async function timeRaw(items: ReturnType<typeof readings>, workshopId: string) {
  const file = path.join(server.dir, `raw-${randomUUID()}.sqlite`);
  reader.prepare('VACUUM INTO ?').run(file);
  const db = new Database(file);
  db.pragma('journal_mode = WAL');
  db.pragma('synchronous = NORMAL');
  const { maxSeq } = db.prepare('SELECT COALESCE(MAX(seq), 0) AS maxSeq FROM run_event').get() as {
    maxSeq: number;
  };
  const insert = db.prepare(insertRunEventsSql(1));
  const started = performance.now();
  db.transaction(() => {
    items.forEach(({ runId, event }, i) =>
      insert.run(
        ...runEventRow(event, {
          runId,
          workshopId,
          receivedAt: Date.now(),
          authorId: 'bench',
          seq: maxSeq + i + 1,
        }),
      ),
    );
  })();
  const elapsed = performance.now() - started;
  db.close();
  return elapsed;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const ratios: number[] = [];
const pushes: number[] = [];
const raws: number[] = [];
const runSlots: Array<['port' | 'starboard' | 'single', string]> = [
  ['single', 'Gannet'],
  ['port', 'Blue Tern'],
  ['starboard', 'Blue Tern'],
];
for (let round = 0; round < WARM_UP + ROUNDS; round++) {
  const [position, vessel] = runSlots[round % runSlots.length];
  if (round >= runSlots.length) {
    const writer = new Database(databaseFile);
    writer
      .prepare(
        'UPDATE run SET state = ? WHERE engineId IN (SELECT id FROM engine WHERE position = ?)',
      )
      .run('signed-off', position);
    writer.close();
  }
  const run = await newRun(position, vessel);
  benchRunIds.push(run.id);
  const items = readings(run);
  const { workshopId } = reader.prepare('SELECT workshopId FROM run WHERE id = ?').get(run.id) as {
    workshopId: string;
  };
  const raw = await timeRaw(items, workshopId);
  const push = await timePush(items);
  const label = round < WARM_UP ? 'warm-up (not counted)' : `round ${round + 1 - WARM_UP}`;
  console.log(
    `${label}: push ${push.toFixed(0)} ms (${Math.ceil(READINGS / MAX_PUSH_ITEMS)} batches of ${MAX_PUSH_ITEMS}), raw insert ${raw.toFixed(0)} ms, ratio ${(push / raw).toFixed(2)}`,
  );
  if (round < WARM_UP) continue;
  raws.push(raw);
  pushes.push(push);
  ratios.push(push / raw);
}
const { n: stored } = reader
  .prepare(
    `SELECT COUNT(*) AS n FROM run_event WHERE runId IN (${benchRunIds.map(() => '?').join(', ')})`,
  )
  .get(...benchRunIds) as { n: number };
reader.close();
await server.stop();

const ratio = median(ratios);
console.log(
  `sync push: ${READINGS} readings, median push ${median(pushes).toFixed(0)} ms, median raw ${median(raws).toFixed(0)} ms, median ratio ${ratio.toFixed(2)} (target ≤ ${TARGET_RATIO}); rows stored ${stored}`,
);
if (stored !== READINGS * (WARM_UP + ROUNDS)) {
  console.log(`FAIL: expected ${READINGS * (WARM_UP + ROUNDS)} rows`);
  process.exit(1);
}
console.log(ratio <= TARGET_RATIO ? 'PASS' : 'FAIL');
process.exit(ratio <= TARGET_RATIO ? 0 : 1);
