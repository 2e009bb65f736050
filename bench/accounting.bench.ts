/*
 * Accounting speed: a 50-hour run with a reading every 5 s (36,000 readings) must be
 * accounted in under 50 ms. Run with `npx tsx bench/accounting.bench.ts`; exits 1 on FAIL.
 * The data is demo data: a made-up outboard rated 5000–6000 rpm on the built-in four-stroke
 * program, with speeds drawn at random inside and around each phase's band.
 */
import { BUILT_IN_PROGRAMS } from '../shared/programs/built-in-programs';
import { resolveProgramPhases, type ResolvedPhase } from '../shared/programs/resolve-band';
import { THROTTLE_POSITIONS } from '../shared/programs/throttle';
import { accountRun } from '../shared/runs/run-accounting';
import type { RunEvent } from '../shared/runs/run-event.schema';
import { repeatableRandom } from '../server/lib/repeatable-random';

const TARGET_MS = 50;
const WARM_UP_RUNS = 5;
const MEASURED_RUNS = 30;
const READING_EVERY_MS = 5_000;
const OUTING_HOURS = 5;
const OUTINGS = 10; // 10 × 5 h = 50 h
const HOUR_MS = 3_600_000;
const START_MS = Date.UTC(2025, 4, 10, 8, 0, 0);
const ENGINE_ID = 'bench-engine';

const uuid = (n: number) => `00000000-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;

/** Which phase the skipper is on after `hoursRun` hours of engine time. */
function phaseAt(phases: ResolvedPhase[], runMs: number): ResolvedPhase {
  let end = 0;
  for (const phase of phases) {
    end += phase.requiredMs;
    if (runMs < end) return phase;
  }
  return phases[phases.length - 1];
}

function demoRun(phases: ResolvedPhase[]): RunEvent[] {
  const random = repeatableRandom(42);
  const events: RunEvent[] = [];
  const walk = { n: 0, runMs: 0, current: phases[0] };
  for (let outing = 0; outing < OUTINGS; outing++) logOuting(events, phases, outing, walk, random);
  // Sync delivers events in no particular order; shuffle so the sort does real work.
  for (let i = events.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [events[i], events[j]] = [events[j], events[i]];
  }
  return events;
}

/** One day's outing: a reading every 5 s for five hours, moving on a phase as its time is run. */
function logOuting(
  events: RunEvent[],
  phases: ResolvedPhase[],
  outing: number,
  walk: { n: number; runMs: number; current: ResolvedPhase },
  random: () => number,
) {
  const dayStart = START_MS + outing * 24 * HOUR_MS;
  events.push({ kind: 'session-start', id: uuid(++walk.n), at: dayStart, engineId: ENGINE_ID });
  for (
    let t = 0;
    t < OUTING_HOURS * HOUR_MS;
    t += READING_EVERY_MS, walk.runMs += READING_EVERY_MS
  ) {
    const phase = phaseAt(phases, walk.runMs);
    if (phase !== walk.current) {
      walk.current = phase;
      events.push({
        kind: 'phase-advance',
        id: uuid(++walk.n),
        at: dayStart + t,
        engineId: ENGINE_ID,
        phaseId: phase.id,
      });
    }
    const rpm = Math.round(
      phase.band.rpmMin + random() * (phase.band.rpmMax - phase.band.rpmMin) * 1.1,
    );
    const throttle = THROTTLE_POSITIONS[Math.floor(random() * THROTTLE_POSITIONS.length)];
    events.push({
      kind: 'reading',
      id: uuid(++walk.n),
      at: dayStart + t,
      engineId: ENGINE_ID,
      phaseId: phase.id,
      rpm,
      throttle,
    });
  }
  events.push({
    kind: 'session-stop',
    id: uuid(++walk.n),
    at: dayStart + OUTING_HOURS * HOUR_MS,
    engineId: ENGINE_ID,
  });
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil(p * sorted.length) - 1)];

function main(): void {
  const phases = resolveProgramPhases(BUILT_IN_PROGRAMS['four-stroke-outboard'], {
    ratedRpmMin: 5000,
    ratedRpmMax: 6000,
  });
  const events = demoRun(phases);
  const readings = events.filter((e) => e.kind === 'reading').length;
  for (let i = 0; i < WARM_UP_RUNS; i++) accountRun(events, phases);
  const times: number[] = [];
  let verdict = '';
  for (let i = 0; i < MEASURED_RUNS; i++) {
    const began = performance.now();
    verdict = accountRun(events, phases).verdict;
    times.push(performance.now() - began);
  }
  times.sort((a, b) => a - b);
  const median = percentile(times, 0.5);
  const p95 = percentile(times, 0.95);
  const pass = p95 < TARGET_MS;
  console.log(
    `accounting: ${readings} readings, ${events.length} events, ${OUTINGS * OUTING_HOURS} h of sessions (run verdict: ${verdict})`,
  );
  console.log(`runs: ${WARM_UP_RUNS} warm-up, ${MEASURED_RUNS} measured`);
  console.log(`median ${median.toFixed(2)} ms, p95 ${p95.toFixed(2)} ms, target < ${TARGET_MS} ms`);
  console.log(pass ? 'PASS' : 'FAIL');
  if (!pass) process.exitCode = 1;
}

main();
