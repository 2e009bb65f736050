import { describe, expect, it } from 'vitest';
import { BUILT_IN_PROGRAMS } from '../programs/built-in-programs';
import { resolveProgramPhases } from '../programs/resolve-band';
import { liveTimerState } from './live-timer';
import { accountRun } from './run-accounting';
import type { RunEvent } from './run-event.schema';
import { advance, MIN, reading, SEC, start, stop, T0 } from './test-events';

// A whole run through the built-in four-stroke program on a made-up engine rated 5000–6000 rpm.
// The engine, the speeds and the timing are demo figures; what is checked is the accounting.
const engine = { ratedRpmMin: 5000, ratedRpmMax: 6000 };
const phases = resolveProgramPhases(BUILT_IN_PROGRAMS['four-stroke-outboard'], engine);
const at = (minutes: number) => T0 + minutes * MIN;

function fourStrokeRun(burstSeconds: number): RunEvent[] {
  const events: RunEvent[] = [
    start(at(0)),
    reading(at(0), 'dock-run', 750, 'idle'),
    reading(at(5), 'dock-run', 1400, 'idle'),
  ];
  events.push(stop(at(10)), start(at(60)), advance(at(60), 'below-half'));
  for (let m = 0; m < 110; m += 5)
    events.push(reading(at(60 + m), 'below-half', m % 10 === 0 ? 2200 : 2800, 'half'));
  events.push(advance(at(170), 'below-three-quarter'));
  for (let m = 0; m < 500; m += 5) {
    const t = at(170 + m);
    if (m % 60 === 30) {
      // A short full-throttle burst once an hour, then back down.
      events.push(
        reading(t, 'below-three-quarter', 5800, 'full'),
        reading(t + burstSeconds * SEC, 'below-three-quarter', 3800, 'three-quarter'),
      );
    } else {
      events.push(reading(t, 'below-three-quarter', m % 10 === 0 ? 3600 : 4200, 'three-quarter'));
    }
  }
  events.push(stop(at(670)));
  return events;
}

describe('a run through the built-in four-stroke outboard program', () => {
  it('resolves the program for the engine', () => {
    expect(phases.map((p) => p.band)).toEqual([
      { rpmMin: 0, rpmMax: 3000 },
      { rpmMin: 0, rpmMax: 3000 },
      { rpmMin: 0, rpmMax: 4500 },
    ]);
  });

  it('done as written, it is complete', () => {
    const account = accountRun(fourStrokeRun(30), phases);
    expect(account.phases.map((p) => [p.phaseId, p.verdict])).toEqual([
      ['dock-run', 'complete'],
      ['below-half', 'complete'],
      ['below-three-quarter', 'complete'],
    ]);
    expect(account.verdict).toBe('complete');
    expect(account.overallProgress).toBe(1);
    const last = account.phases[2];
    expect(last.longestFullThrottleMs).toBe(30 * SEC);
    expect(last.timeOverMs).toBe(8 * 30 * SEC); // one burst an hour, at minutes 30, 90 … 450
  });

  it('a burst held too long is a breach, with the time it happened', () => {
    const account = accountRun(fourStrokeRun(90), phases);
    expect(account.verdict).toBe('breached');
    const [first] = account.phases[2].reasons;
    expect(first).toEqual({
      code: 'full-throttle-too-long',
      message: 'Full throttle was held for 1 min 30 s; this phase allows at most 1 min at a time.',
      fromMs: at(200),
      toMs: at(200) + 90 * SEC,
    });
  });

  it('the live timer on deck agrees with the accounting at the end', () => {
    const events = fourStrokeRun(30);
    const live = liveTimerState(events, phases, at(700));
    expect(live).toMatchObject({
      currentPhaseId: 'below-three-quarter',
      state: 'stopped',
      phaseLeftMs: 0,
      overallProgress: 1,
    });
  });

  it('accounts a 50-hour run of 36,000 readings quickly (the 50 ms target is checked by the bench)', () => {
    const events: RunEvent[] = [start(T0)];
    for (let i = 0; i < 36_000; i++)
      events.push(
        reading(T0 + i * 5 * SEC, 'below-three-quarter', 3000 + (i % 7) * 150, 'three-quarter'),
      );
    events.push(stop(T0 + 36_000 * 5 * SEC));
    const began = performance.now();
    const account = accountRun(events.reverse(), phases);
    // A generous bound that only a quadratic slip would break, even on a busy test machine.
    expect(performance.now() - began).toBeLessThan(1000);
    expect(account.phases[2].timeInBandMs).toBe(50 * 60 * MIN);
  });
});
