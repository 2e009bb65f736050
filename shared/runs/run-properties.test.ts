import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { THROTTLE_POSITIONS } from '../programs/throttle';
import { orderEvents } from './event-order';
import { liveTimerState } from './live-timer';
import { accountRun, type RunAccount } from './run-accounting';
import type { RunEvent } from './run-event.schema';
import {
  ENGINE,
  eventsFromSteps,
  MIN,
  PROPERTY_PHASES as phases,
  SEC,
  shuffled,
  T0,
} from './test-events';
import { buildTimeline } from './timeline';

// Property tests of the attribution rule (timeline.ts) and the live timer over generated
// event streams. Phases and speeds are made up; no trade figure is checked here.

const KINDS = [
  'reading',
  'reading',
  'reading',
  'reading',
  'session-start',
  'session-stop',
  'phase-advance',
] as const;

const eventsArb = (options: { withClockJumps?: boolean; maxLength?: number } = {}) =>
  fc
    .array(
      fc.record({
        dtMs: fc.oneof(
          { weight: 1, arbitrary: fc.constant(0) },
          { weight: 6, arbitrary: fc.integer({ min: 1, max: 20 * MIN }) },
          {
            weight: options.withClockJumps ? 1 : 0,
            arbitrary: fc.integer({ min: -60 * MIN, max: -1 }),
          },
        ),
        kind: fc.constantFrom(...KINDS),
        id: fc.uuid(),
        rpm: fc.integer({ min: 0, max: 7000 }),
        throttle: fc.constantFrom(...THROTTLE_POSITIONS),
        phaseId: fc.constantFrom('a', 'b', 'c', 'ghost'),
      }),
      { maxLength: options.maxLength ?? 60 },
    )
    .map(eventsFromSteps);

const RUNS = { numRuns: 300 };

const totalCounted = (account: RunAccount) =>
  account.phases.reduce((sum, p) => sum + p.timeInBandMs + p.timeOverMs + p.timeUnderMs, 0) +
  account.unassignedMs;

describe('accounting properties', () => {
  it('time is never negative and shares stay within 0..1, even when the clock jumps back', () => {
    fc.assert(
      fc.property(eventsArb({ withClockJumps: true }), (events) => {
        const account = accountRun(events, phases);
        for (const p of account.phases) {
          for (const value of [
            p.timeInBandMs,
            p.timeOverMs,
            p.timeUnderMs,
            p.longestFullThrottleMs,
            p.maxFullThrottleInHourMs,
          ]) {
            expect(value).toBeGreaterThanOrEqual(0);
          }
          expect(p.progressShare).toBeGreaterThanOrEqual(0);
          expect(p.progressShare).toBeLessThanOrEqual(1);
          for (const r of p.reasons)
            if (r.fromMs !== null) expect(r.toMs!).toBeGreaterThanOrEqual(r.fromMs);
        }
        expect(account.sessionMs).toBeGreaterThanOrEqual(0);
        expect(account.overallProgress).toBeLessThanOrEqual(1);
      }),
      RUNS,
    );
  });

  it('in band + over + under never exceeds the wall time inside sessions', () => {
    fc.assert(
      fc.property(eventsArb({ withClockJumps: true }), (events) => {
        const account = accountRun(events, phases);
        expect(totalCounted(account)).toBeLessThanOrEqual(account.sessionMs);
      }),
      RUNS,
    );
  });

  it('splitting a session anywhere (stop and start at the same instant) changes nothing', () => {
    const share = fc.double({ min: 0, max: 1, noNaN: true });
    fc.assert(
      fc.property(eventsArb(), share, share, (events, pick, where) => {
        const sessions = buildTimeline(orderEvents(events)).sessions.filter(
          (s) => s.toMs - s.fromMs >= 2,
        );
        fc.pre(sessions.length > 0);
        const session = sessions[Math.min(sessions.length - 1, Math.floor(pick * sessions.length))];
        const at = session.fromMs + 1 + Math.floor(where * (session.toMs - session.fromMs - 2));
        const split: RunEvent[] = [
          ...events,
          {
            kind: 'session-stop',
            id: 'ffffffff-0000-4000-8000-000000000001',
            at,
            engineId: ENGINE,
          },
          {
            kind: 'session-start',
            id: '00000000-ffff-4000-8000-000000000002',
            at,
            engineId: ENGINE,
          },
        ];
        expect(accountRun(split, phases)).toEqual(accountRun(events, phases));
      }),
      RUNS,
    );
  });

  it('arrival order and duplicate copies do not change the result', () => {
    fc.assert(
      fc.property(
        eventsArb({ withClockJumps: true }),
        fc.integer(),
        fc.integer({ min: 0, max: 10 }),
        (events, randomStart, copies) => {
          const delivered = shuffled(
            [...events, ...shuffled(events, randomStart + 1).slice(0, copies)],
            randomStart,
          );
          expect(accountRun(delivered, phases)).toEqual(accountRun(events, phases));
        },
      ),
      RUNS,
    );
  });

  it('verdicts follow from the phases: complete means time done and no breach', () => {
    fc.assert(
      fc.property(eventsArb({ maxLength: 200 }), (events) => {
        const account = accountRun(events, phases);
        for (const p of account.phases) {
          if (p.verdict === 'complete') expect(p.timeInBandMs).toBeGreaterThanOrEqual(p.requiredMs);
          if (p.verdict === 'breached')
            expect(p.reasons.some((r) => r.code !== 'short-of-time')).toBe(true);
        }
        const verdicts = account.phases.map((p) => p.verdict);
        const expected = verdicts.includes('breached')
          ? 'breached'
          : verdicts.every((v) => v === 'complete')
            ? 'complete'
            : 'incomplete';
        expect(account.verdict).toBe(expected);
      }),
      RUNS,
    );
  });
});

describe('live timer properties', () => {
  it('live at now equals the accounting of the stored events with the session closed at now', () => {
    fc.assert(
      fc.property(eventsArb(), fc.integer({ min: 0, max: 24 * 60 * MIN }), (events, offset) => {
        const now = T0 + offset;
        const stored = events.filter((e) => e.at <= now);
        const live = liveTimerState(stored, phases, now);
        const account = accountRun(stored, phases, { untilMs: now });
        expect(live.phaseDoneMs).toBe(account.phases[live.currentPhaseIndex].timeInBandMs);
        expect(live.overallProgress).toBe(account.overallProgress);
      }),
      RUNS,
    );
  });

  it('reload in the middle: recomputing from stored events equals carrying on', () => {
    fc.assert(
      fc.property(
        eventsArb({ maxLength: 80 }),
        fc.array(fc.boolean(), { minLength: 80, maxLength: 80 }),
        (events, reloads) => {
          const running: RunEvent[] = [];
          let stored: RunEvent[] = [];
          events.forEach((event, i) => {
            running.push(event);
            stored.push(event);
            // A killed app comes back with only what storage kept, in whatever order it returns it.
            if (reloads[i]) stored = (JSON.parse(JSON.stringify(stored)) as RunEvent[]).reverse();
            const now = event.at + 90 * SEC;
            expect(liveTimerState(stored, phases, now)).toEqual(
              liveTimerState(running, phases, now),
            );
          });
        },
      ),
      { numRuns: 100 },
    );
  });

  it('never goes negative when the clock jumps', () => {
    fc.assert(
      fc.property(
        eventsArb({ withClockJumps: true }),
        fc.integer({ min: -120 * MIN, max: 24 * 60 * MIN }),
        (events, offset) => {
          const live = liveTimerState(events, phases, T0 + offset);
          for (const value of [
            live.phaseDoneMs,
            live.phaseLeftMs,
            live.sessionElapsedMs,
            live.clockBehindMs,
          ]) {
            expect(value).toBeGreaterThanOrEqual(0);
          }
          expect(live.nowMs).toBeGreaterThanOrEqual(T0 + offset);
        },
      ),
      RUNS,
    );
  });
});
