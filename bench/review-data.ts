import type { Database } from 'better-sqlite3';
import { randomUUID } from 'node:crypto';
import { insertRunEventsSql, runEventRow } from '../server/features/runs/run-event-row.js';
import { repeatableRandom } from '../server/lib/repeatable-random.js';
import { BUILT_IN_PROGRAMS } from '../shared/programs/built-in-programs.js';
import { resolvePhaseBand } from '../shared/programs/resolve-band.js';
import { THROTTLE_POSITIONS } from '../shared/programs/throttle.js';
import type { RunEvent } from '../shared/runs/run-event.schema.js';

/*
 * The review benchmark's workshop, written straight into SQLite: made-up engines rated
 * 5000–6000 rpm on the built-in four-stroke program, with readings drawn at random inside and a
 * little above each phase's band.
 */
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
type BenchIds = { workshop: string; manager: string };

function insertWorkshop(db: Native, ids: BenchIds, passwordHash: string) {
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
  ids: BenchIds,
  n: number,
  readings: number,
  everyMs: number,
  seq: { value: number },
): string {
  const vesselId = randomUUID();
  const engineId = randomUUID();
  const runId = randomUUID();
  insertVesselAndEngine(db, ids, n, vesselId, engineId);
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
  insertReadings(db, { ids, runId, engineId, events, everyMs, seq });
  return runId;
}

function insertVesselAndEngine(
  db: Native,
  ids: BenchIds,
  n: number,
  vesselId: string,
  engineId: string,
) {
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
}

/** `events` readings one every `everyMs`, in sessions of five hours a day, each session started and stopped. */
function insertReadings(
  db: Native,
  input: {
    ids: BenchIds;
    runId: string;
    engineId: string;
    events: number;
    everyMs: number;
    seq: { value: number };
  },
) {
  const { ids, runId, engineId, events, everyMs, seq } = input;
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
}

/**
 * The workshop, its manager and its runs in one transaction, the long run last; the change
 * counter is then set past every number used. Returns the long run's id and that count.
 */
export function fillBenchWorkshop(
  db: Native,
  ids: BenchIds,
  passwordHash: string,
  shape: { runs: number; readingsPerRun: number; longRunReadings: number },
): { longRun: string; changes: number } {
  const seq = { value: 1 };
  let longRun = '';
  db.transaction(() => {
    insertWorkshop(db, ids, passwordHash);
    for (let n = 0; n < shape.runs - 1; n++)
      insertRun(db, ids, n, shape.readingsPerRun, 4 * 60_000, seq);
    longRun = insertRun(db, ids, shape.runs, shape.longRunReadings, 5_000, seq);
  })();
  db.prepare('UPDATE "change_counter" SET "value" = ? WHERE "name" = ?').run(seq.value, 'changes');
  return { longRun, changes: seq.value };
}
