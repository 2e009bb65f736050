import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { THROTTLE_POSITIONS } from '../programs/throttle';
import { accountRun, type RunAccount } from './run-accounting';
import type { RunEvent, VoidEvent } from './run-event.schema';
import {
  ENGINE,
  eventsFromSteps,
  MIN,
  PROPERTY_PHASES as phases,
  shuffled,
  T0,
} from './test-events';

// Property tests of the void rule (voids.ts) and the re-run rule (phase-tally.ts) over generated
// event streams. Phases and speeds are made up; no trade figure is checked here.

const KINDS = ['reading', 'reading', 'reading', 'session-start', 'session-stop'] as const;

const eventsArb = fc
  .array(
    fc.record({
      dtMs: fc.integer({ min: 0, max: 15 * MIN }),
      kind: fc.constantFrom(...KINDS),
      id: fc.uuid(),
      rpm: fc.integer({ min: 0, max: 7000 }),
      throttle: fc.constantFrom(...THROTTLE_POSITIONS),
      phaseId: fc.constantFrom('a', 'b', 'c'),
    }),
    { maxLength: 50 },
  )
  .map(eventsFromSteps);

const RUNS = { numRuns: 300 };

const voidOf = (target: RunEvent, id: string, at: number): VoidEvent => ({
  kind: 'void',
  id,
  at,
  engineId: ENGINE,
  targetId: target.id,
  reason: 'Wrong figure typed.',
});

/** The events with every reading whose position `pick` marks voided, the voids at any later time. */
const withVoids = (events: RunEvent[], pick: boolean[], laterMs: number) =>
  events.flatMap((e, i) =>
    e.kind === 'reading' && pick[i % pick.length]
      ? [e, voidOf(e, `f${String(i).padStart(7, '0')}-0000-4000-8000-000000000000`, e.at + laterMs)]
      : [e],
  );

const counted = (account: RunAccount, index: number) => {
  const p = account.phases[index];
  return p.timeInBandMs + p.timeOverMs + p.timeUnderMs;
};

describe('void properties', () => {
  it('a voided reading counts exactly as if it had never been logged', () => {
    fc.assert(
      fc.property(
        eventsArb,
        fc.array(fc.boolean(), { minLength: 1, maxLength: 8 }),
        fc.integer({ min: 0, max: 120 * MIN }),
        (events, pick, laterMs) => {
          const voided = withVoids(events, pick, laterMs);
          const kept = events.filter((e, i) => !(e.kind === 'reading' && pick[i % pick.length]));
          expect(accountRun(voided, phases)).toEqual(accountRun(kept, phases));
        },
      ),
      RUNS,
    );
  });

  it('order of arrival, copies and a second void of the same entry change nothing', () => {
    fc.assert(
      fc.property(
        eventsArb,
        fc.array(fc.boolean(), { minLength: 1, maxLength: 8 }),
        fc.integer(),
        (events, pick, shuffleKey) => {
          const voided = withVoids(events, pick, MIN);
          const extra = voided
            .filter((e): e is VoidEvent => e.kind === 'void')
            .map((v, i) => ({
              ...v,
              id: `e${String(i).padStart(7, '0')}-0000-4000-8000-000000000000`,
            }));
          const messy = shuffled([...voided, ...voided.slice(0, 5), ...extra], shuffleKey);
          expect(accountRun(messy, phases)).toEqual(accountRun(voided, phases));
        },
      ),
      RUNS,
    );
  });
});

describe('re-run properties', () => {
  const rerun = (index: number, fromMs: number) =>
    phases.map((p, i) => (i === index ? { ...p, countsFromMs: fromMs } : p));

  it('time of a phase sent back is split at the return: counted after, set aside before, nothing lost', () => {
    fc.assert(
      fc.property(
        eventsArb,
        fc.integer({ min: 0, max: 2 }),
        fc.integer({ min: 0, max: 600 * MIN }),
        (events, index, offsetMs) => {
          const before = accountRun(events, phases);
          const after = accountRun(events, rerun(index, T0 + offsetMs));
          expect(counted(after, index) + after.phases[index].setAsideMs).toBe(
            counted(before, index),
          );
          // The phases not sent back keep what they had.
          for (let i = 0; i < phases.length; i++)
            if (i !== index) expect(after.phases[i]).toEqual(before.phases[i]);
        },
      ),
      RUNS,
    );
  });

  it('a phase counts only readings from the return on, however its earlier time was logged', () => {
    fc.assert(
      fc.property(eventsArb, eventsArb, fc.integer({ min: 0, max: 2 }), (early, late, index) => {
        // Everything early happens before the return, its last outing stopped by then; the late
        // events come after it.
        const returnMs = T0 + 1000 * MIN;
        const stop: RunEvent = {
          kind: 'session-stop',
          id: 'ffffffff-0000-4000-8000-000000000000',
          at: returnMs - 1,
          engineId: ENGINE,
        };
        const shifted = late.map((e) => ({ ...e, at: e.at + 1000 * MIN + 1 }));
        const both = accountRun([...early, stop, ...shifted], rerun(index, returnMs));
        const lateOnly = accountRun(shifted, rerun(index, returnMs));
        expect(both.phases[index].timeInBandMs).toBe(lateOnly.phases[index].timeInBandMs);
        expect(both.phases[index].verdict).toBe(lateOnly.phases[index].verdict);
      }),
      RUNS,
    );
  });

  it('a return before anything was logged changes nothing but the mark', () => {
    fc.assert(
      fc.property(eventsArb, fc.integer({ min: 0, max: 2 }), (events, index) => {
        const after = accountRun(events, rerun(index, T0 - 1));
        const before = accountRun(events, phases);
        expect({ ...after.phases[index], countsFromMs: null }).toEqual(before.phases[index]);
        expect(after.phases[index].setAsideMs).toBe(0);
      }),
      RUNS,
    );
  });
});
