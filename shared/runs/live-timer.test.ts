import { describe, expect, it } from 'vitest';
import { liveTimerState } from './live-timer';
import { accountRun } from './run-accounting';
import type { RunEvent } from './run-event.schema';
import { orderEvents } from './event-order';
import { THROTTLE_POSITIONS } from '../programs/throttle';
import { bandState } from './phase-rules';
import { buildTimeline } from './timeline';
import {
  advance,
  MIN,
  minutesAfterT0 as m,
  PROPERTY_PHASES,
  reading,
  SEC,
  start,
  stop,
  T0,
  testPhase,
} from './test-events';

// Made-up phases and speeds to exercise the timer; expectations follow from the attribution rule.
const half = testPhase({
  id: 'half',
  band: { rpmMin: 1000, rpmMax: 3000 },
  throttleCeiling: 'half',
  requiredMs: 60 * MIN,
});
const below = testPhase({
  id: 'below',
  band: { rpmMin: 0, rpmMax: 4500 },
  throttleCeiling: 'three-quarter',
  requiredMs: 120 * MIN,
});
const phases = [half, below];

describe('live timer', () => {
  it('before anything: stopped on the first phase, nothing done', () => {
    expect(liveTimerState([], phases, T0)).toMatchObject({
      state: 'stopped',
      currentPhaseId: 'half',
      currentPhaseIndex: 0,
      band: { rpmMin: 1000, rpmMax: 3000 },
      phaseDoneMs: 0,
      phaseLeftMs: 60 * MIN,
      sessionElapsedMs: 0,
      clockBehindMs: 0,
    });
  });

  it('in band: counts the open reading up to now', () => {
    const events = [start(m(0)), reading(m(1), 'half', 2000, 'half')];
    expect(liveTimerState(events, phases, m(4))).toMatchObject({
      state: 'in-band',
      phaseDoneMs: 3 * MIN,
      phaseLeftMs: 57 * MIN,
      phaseProgress: 0.05,
      overallProgress: (3 * MIN) / (180 * MIN),
      sessionElapsedMs: 4 * MIN,
    });
  });

  it('over and under are shown as such', () => {
    expect(
      liveTimerState([start(m(0)), reading(m(0), 'half', 3500, 'half')], phases, m(1)).state,
    ).toBe('over');
    expect(
      liveTimerState([start(m(0)), reading(m(0), 'half', 700, 'idle')], phases, m(1)).state,
    ).toBe('under');
  });

  it('after the hold runs out (10 min, our choice): paused, and the count stops', () => {
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half')];
    const later = liveTimerState(events, phases, m(45));
    expect(later).toMatchObject({
      state: 'paused',
      phaseDoneMs: 10 * MIN,
      sessionElapsedMs: 45 * MIN,
      heldReading: null,
    });
  });

  it('tells when the reading in force stops counting', () => {
    const events = [start(m(0)), reading(m(2), 'half', 2000, 'half')];
    expect(liveTimerState(events, phases, m(3)).heldReading?.holdEndsMs).toBe(m(12));
  });

  it('after a phase-advance: on the new phase, paused until a reading comes', () => {
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half'), advance(m(5), 'below')];
    expect(liveTimerState(events, phases, m(6))).toMatchObject({
      currentPhaseId: 'below',
      currentPhaseIndex: 1,
      state: 'paused',
      phaseDoneMs: 0,
      phaseLeftMs: 120 * MIN,
      overallProgress: (5 * MIN) / (180 * MIN),
    });
  });

  it('after a stop: stopped, with the time kept', () => {
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half'), stop(m(7))];
    expect(liveTimerState(events, phases, m(30))).toMatchObject({
      state: 'stopped',
      phaseDoneMs: 7 * MIN,
      sessionElapsedMs: 0,
    });
  });

  it('a clock set back before the newest event holds at that event: nothing negative', () => {
    const events = [start(m(0)), reading(m(5), 'half', 2000, 'half')];
    const state = liveTimerState(events, phases, m(5) - 60 * MIN);
    expect(state).toMatchObject({
      nowMs: m(5),
      clockBehindMs: 60 * MIN,
      phaseDoneMs: 0,
      sessionElapsedMs: 5 * MIN,
      state: 'in-band',
    });
  });

  it('events logged after the clock went back are still ordered and counted sensibly', () => {
    // Reading at 10:05, then the clock jumps back an hour and the next reading says 09:06.
    const events = [
      start(m(0)),
      reading(m(5), 'half', 2000, 'half'),
      reading(m(6) - 60 * MIN, 'half', 2500, 'half'),
    ];
    const state = liveTimerState(events, phases, m(6) - 60 * MIN + 30 * SEC);
    expect(state.phaseDoneMs).toBeGreaterThanOrEqual(0);
    expect(state.sessionElapsedMs).toBeGreaterThanOrEqual(0);
    expect(state.nowMs).toBe(m(5));
  });
});

/** Simulates a 10-hour day: readings every 20–90 s, stops, restarts and phase changes. */
function tenHourDay(randomStart: number): RunEvent[] {
  let state = randomStart >>> 0;
  const random = () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 4294967296;
  const events: RunEvent[] = [start(T0)];
  let phase = 'a';
  let open = true;
  for (let at = T0; at < T0 + 10 * 60 * MIN; at += Math.floor(20 * SEC + random() * 70 * SEC)) {
    const roll = random();
    if (roll < 0.01) {
      events.push(open ? stop(at) : start(at));
      open = !open;
    } else if (roll < 0.012) {
      phase = phase === 'a' ? 'b' : 'c';
      events.push(advance(at, phase));
    } else if (roll < 0.97) {
      // The rest of the time no reading is logged, which leaves a longer gap.
      events.push(
        reading(
          at,
          phase,
          Math.floor(500 + random() * 5000),
          THROTTLE_POSITIONS[Math.floor(random() * 5)],
        ),
      );
    }
  }
  return events;
}

describe('live timer against a single computation', () => {
  it('zero drift: at any now, the figures equal the one computation of the whole day cut at now', () => {
    let checked = 0;
    for (const randomStart of [1, 2, 3]) {
      const day = tenHourDay(randomStart);
      const whole = buildTimeline(orderEvents(day)).segments;
      for (let now = T0; now <= T0 + 10 * 60 * MIN + 15 * MIN; now += 61_337) {
        const live = liveTimerState(
          day.filter((e) => e.at <= now),
          PROPERTY_PHASES,
          now,
        );
        const phase = PROPERTY_PHASES[live.currentPhaseIndex];
        const expected = whole
          .filter(
            (s) =>
              s.phaseId === phase.id &&
              s.fromMs < now &&
              bandState(s.rpm, s.throttle, phase) === 'in-band',
          )
          .reduce((sum, s) => sum + Math.min(s.toMs, now) - s.fromMs, 0);
        expect(live.phaseDoneMs).toBe(expected);
        checked += expected > 0 ? 1 : 0;
      }
    }
    expect(checked).toBeGreaterThan(100); // the day really did accumulate time in band
  });

  it('after the last stop the timer shows exactly what the accounting shows', () => {
    const day = [...tenHourDay(7), stop(T0 + 11 * 60 * MIN)];
    const account = accountRun(day, PROPERTY_PHASES);
    for (const now of [T0 + 11 * 60 * MIN, T0 + 30 * 60 * MIN]) {
      const live = liveTimerState(day, PROPERTY_PHASES, now);
      expect(live.phaseDoneMs).toBe(account.phases[live.currentPhaseIndex].timeInBandMs);
      expect(live.overallProgress).toBe(account.overallProgress);
    }
  });

  it('in band, the count rises exactly as fast as the clock', () => {
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half')];
    let previous = liveTimerState(events, phases, m(0)).phaseDoneMs;
    for (let now = m(0) + 997; now < m(10); now += 997) {
      const done = liveTimerState(events, phases, now).phaseDoneMs;
      expect(done - previous).toBe(997);
      previous = done;
    }
  });
});
