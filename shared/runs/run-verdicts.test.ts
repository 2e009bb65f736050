import { describe, expect, it } from 'vitest';
import { accountRun } from './run-accounting';
import { MIN, minutesAfterT0 as m, reading, SEC, start, stop, testPhase } from './test-events';

// Made-up phases and engine speeds to exercise the verdicts and their reasons; the expected
// numbers follow from the rules in phase-rules.ts and phase-tally.ts, not from any trade figure.
const halfPhase = testPhase({
  id: 'half',
  band: { rpmMin: 1000, rpmMax: 3000 },
  throttleCeiling: 'half',
  requiredMs: 60 * MIN,
});
const phases = [halfPhase];

describe('verdicts and reasons', () => {
  it('complete once time in band reaches the requirement', () => {
    const short = testPhase({ id: 'half', requiredMs: 5 * MIN });
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      reading(m(5), 'half', 2300, 'half'),
      stop(m(6)),
    ];
    const account = accountRun(events, [short]);
    expect(account.phases[0]).toMatchObject({ verdict: 'complete', progressShare: 1, reasons: [] });
    expect(account.verdict).toBe('complete');
    expect(account.overallProgress).toBe(1);
  });

  it('incomplete says how much is left', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      reading(m(9), 'half', 2400, 'half'),
      stop(m(15)),
    ];
    const [phase] = accountRun(events, phases).phases;
    expect(phase.verdict).toBe('incomplete');
    expect(phase.progressShare).toBe(0.25);
    expect(phase.reasons).toEqual([
      {
        code: 'short-of-time',
        message: 'In band for 15 min of the 1 h 00 min required; 45 min to go.',
        fromMs: m(0),
        toMs: m(15),
      },
    ]);
  });

  it('a phase never run says so, with no times', () => {
    const [phase] = accountRun([], phases).phases;
    expect(phase.reasons).toEqual([
      {
        code: 'short-of-time',
        message: 'Not run yet: 1 h 00 min in band is required.',
        fromMs: null,
        toMs: null,
      },
    ]);
  });

  it('over the band longer than the one-minute grace (our allowance) is a breach', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 3400, 'half'),
      reading(m(3), 'half', 2000, 'half'),
      stop(m(4)),
    ];
    const [phase] = accountRun(events, phases).phases;
    expect(phase.verdict).toBe('breached');
    expect(phase.reasons[0]).toEqual({
      code: 'over-band',
      message:
        "The engine ran above this phase's band (up to 3000 rpm at half throttle or less) for 3 min.",
      fromMs: m(0),
      toMs: m(3),
    });
  });

  it('a short overshoot is counted as over but is no breach', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 3400, 'half'),
      reading(m(0) + 40 * SEC, 'half', 2000, 'half'),
      stop(m(2)),
    ];
    const [phase] = accountRun(events, phases).phases;
    expect(phase.timeOverMs).toBe(40 * SEC);
    expect(phase.reasons.map((r) => r.code)).toEqual(['short-of-time']);
  });

  it('full throttle held longer than the rule; bursts are judged by the full-throttle rules only', () => {
    const bursts = testPhase({
      id: 'bursts',
      band: { rpmMin: 0, rpmMax: 4500 },
      throttleCeiling: 'three-quarter',
      rules: { fullThrottleMaxSeconds: 60 },
    });
    const events = [
      start(m(0)),
      reading(m(0), 'bursts', 4000, 'three-quarter'),
      reading(m(10), 'bursts', 6000, 'full'),
      reading(m(10) + 50 * SEC, 'bursts', 4000, 'half'),
      reading(m(20), 'bursts', 6000, 'full'),
      reading(m(22), 'bursts', 3000, 'half'),
      stop(m(30)),
    ];
    const [phase] = accountRun(events, [bursts]).phases;
    expect(phase.longestFullThrottleMs).toBe(2 * MIN);
    expect(phase.timeOverMs).toBe(2 * MIN + 50 * SEC);
    expect(phase.reasons.filter((r) => r.code !== 'short-of-time')).toEqual([
      {
        code: 'full-throttle-too-long',
        message: 'Full throttle was held for 2 min; this phase allows at most 1 min at a time.',
        fromMs: m(20),
        toMs: m(22),
      },
    ]);
  });

  it('full throttle in any rolling hour, found across separate bursts', () => {
    const bursts = testPhase({
      id: 'bursts',
      band: { rpmMin: 0, rpmMax: 4500 },
      throttleCeiling: 'full',
      rules: { fullThrottleMaxMinutesPerHour: 5 },
    });
    const events = [start(m(0))];
    // Two minutes of full throttle every 20 minutes: 6 min in the hour from minute 20.
    for (let t = 0; t < 120; t += 20) {
      events.push(
        reading(m(t), 'bursts', 3000, 'half'),
        reading(m(t + 10), 'bursts', 4400, 'full'),
        reading(m(t + 12), 'bursts', 3000, 'half'),
      );
    }
    events.push(stop(m(120)));
    const [phase] = accountRun(events, [bursts]).phases;
    expect(phase.maxFullThrottleInHourMs).toBe(6 * MIN);
    expect(phase.reasons.find((r) => r.code === 'full-throttle-too-often')).toEqual({
      code: 'full-throttle-too-often',
      message:
        'Full throttle added up to 6 min within one hour; this phase allows at most 5 min in any hour.',
      fromMs: m(10),
      toMs: m(70),
    });
  });

  it('no change of speed for longer than the rule; changes under 200 rpm (common practice) do not count', () => {
    const steady = testPhase({ id: 'half', rules: { changeSpeedEveryMinutes: 15 } });
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      reading(m(8), 'half', 2150, 'half'),
      reading(m(16), 'half', 1900, 'half'),
      reading(m(20), 'half', 2600, 'half'),
      stop(m(30)),
    ];
    const [phase] = accountRun(events, [steady]).phases;
    expect(phase.reasons[0]).toEqual({
      code: 'no-speed-change',
      message:
        'The engine stayed near 2000 rpm for 20 min without a change of speed; this phase asks for a change at least every 15 min.',
      fromMs: m(0),
      toMs: m(20),
    });
    expect(phase.reasons).toHaveLength(2); // plus short-of-time
  });

  it('a slow drift adds up to a change of speed', () => {
    const steady = testPhase({ id: 'half', rules: { changeSpeedEveryMinutes: 15 } });
    const events = [start(m(0))];
    for (let t = 0; t < 30; t += 5) events.push(reading(m(t), 'half', 2000 + t * 20, 'half'));
    events.push(stop(m(30)));
    // +100 rpm every 5 min: 2000 → 2200 at minute 10 ends the first stretch, 2200 → 2400 at 20 the next.
    expect(accountRun(events, [steady]).phases[0].reasons.map((r) => r.code)).toEqual([
      'short-of-time',
    ]);
  });

  it('idling longer than the rule', () => {
    const idle = testPhase({ id: 'half', rules: { idleMaxMinutes: 10 } });
    const events = [
      start(m(0)),
      reading(m(0), 'half', 800, 'idle'),
      reading(m(9), 'half', 850, 'idle'),
      reading(m(12), 'half', 2000, 'half'),
      stop(m(13)),
    ];
    const [phase] = accountRun(events, [idle]).phases;
    expect(phase.reasons[0]).toEqual({
      code: 'idle-too-long',
      message: 'The engine idled for 12 min; this phase allows at most 10 min of idling at a time.',
      fromMs: m(0),
      toMs: m(12),
    });
  });

  it('a stop breaks a stretch', () => {
    const idle = testPhase({ id: 'half', rules: { idleMaxMinutes: 10 } });
    const events = [
      start(m(0)),
      reading(m(0), 'half', 800, 'idle'),
      stop(m(8)),
      start(m(9)),
      reading(m(9), 'half', 800, 'idle'),
      stop(m(17)),
    ];
    expect(accountRun(events, [idle]).phases[0].reasons.map((r) => r.code)).toEqual([
      'short-of-time',
    ]);
  });

  it('run verdict: breached if any phase is, complete if all are, else incomplete', () => {
    const a = testPhase({ id: 'a', requiredMs: 2 * MIN });
    const b = testPhase({ id: 'b', requiredMs: 2 * MIN });
    const base = [start(m(0)), reading(m(0), 'a', 2000, 'half'), reading(m(2), 'b', 2000, 'half')];
    expect(accountRun([...base, stop(m(3))], [a, b]).verdict).toBe('incomplete');
    expect(accountRun([...base, stop(m(4))], [a, b]).verdict).toBe('complete');
    expect(
      accountRun([...base, reading(m(4), 'b', 3500, 'half'), stop(m(9))], [a, b]).verdict,
    ).toBe('breached');
    expect(accountRun([...base, stop(m(3))], [a, b]).overallProgress).toBe(0.75);
  });
});
