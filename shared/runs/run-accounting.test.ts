import { describe, expect, it } from 'vitest';
import { accountRun } from './run-accounting';
import {
  advance,
  ENGINE,
  MIN,
  minutesAfterT0 as m,
  reading,
  start,
  stop,
  testPhase,
} from './test-events';

// Made-up phases and engine speeds to exercise the attribution rule (timeline.ts); the expected
// numbers follow from that rule, not from any trade figure.
const halfPhase = testPhase({
  id: 'half',
  band: { rpmMin: 1000, rpmMax: 3000 },
  throttleCeiling: 'half',
  requiredMs: 60 * MIN,
});
const phases = [halfPhase];

describe('attribution rule', () => {
  it('a reading holds until the next reading', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      reading(m(4), 'half', 3500, 'full'),
      stop(m(6)),
    ];
    const [phase] = accountRun(events, phases).phases;
    expect(phase.timeInBandMs).toBe(4 * MIN);
    expect(phase.timeOverMs).toBe(2 * MIN);
    expect(phase.timeUnderMs).toBe(0);
  });

  it("alerts and notes neither end a reading's hold nor count as time", () => {
    const alert = {
      kind: 'alert' as const,
      id: '00000000-0000-4000-8000-0000000000a1',
      at: m(2),
      engineId: ENGINE,
      code: 'over-ceiling',
      message: 'Over the ceiling',
    };
    const note = {
      kind: 'note' as const,
      id: '00000000-0000-4000-8000-0000000000a2',
      at: m(3),
      engineId: ENGINE,
      text: 'Chop picked up',
    };
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half'), alert, note, stop(m(6))];
    const [phase] = accountRun(events, phases).phases;
    expect(phase.timeInBandMs).toBe(6 * MIN);
  });

  it('a reading holds until the session stops', () => {
    const events = [
      start(m(0)),
      reading(m(1), 'half', 2000, 'half'),
      stop(m(5)),
      reading(m(7), 'half', 2000, 'half'),
    ];
    const account = accountRun(events, phases);
    expect(account.phases[0].timeInBandMs).toBe(4 * MIN);
    expect(account.sessionMs).toBe(5 * MIN);
  });

  it('a reading holds at most 10 minutes (our choice): a forgotten phone does not count', () => {
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half'), stop(m(180))];
    const account = accountRun(events, phases);
    expect(account.phases[0].timeInBandMs).toBe(10 * MIN);
    expect(account.sessionMs).toBe(180 * MIN);
  });

  it('the hold limit can be set by the caller', () => {
    const events = [start(m(0)), reading(m(0), 'half', 2000, 'half'), stop(m(30))];
    expect(accountRun(events, phases, { maxHoldMs: 20 * MIN }).phases[0].timeInBandMs).toBe(
      20 * MIN,
    );
  });

  it('time outside sessions never counts', () => {
    const events = [
      reading(m(0), 'half', 2000, 'half'),
      start(m(5)),
      stop(m(8)),
      reading(m(9), 'half', 2000, 'half'),
    ];
    const account = accountRun(events, phases);
    expect(account.phases[0].timeInBandMs).toBe(0);
    expect(account.sessionMs).toBe(3 * MIN);
  });

  it('a reading at the instant of a start holds; one at the instant of a stop does not', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      stop(m(3)),
      reading(m(3), 'half', 2000, 'half'),
    ];
    expect(accountRun(events, phases).phases[0].timeInBandMs).toBe(3 * MIN);
  });

  it('a stop and a start at the same instant leave the session running', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      stop(m(3)),
      start(m(3)),
      stop(m(8)),
    ];
    const account = accountRun(events, phases);
    expect(account.phases[0].timeInBandMs).toBe(8 * MIN);
    expect(account.sessionMs).toBe(8 * MIN);
  });

  it('a second start inside a session and a stop outside one are ignored', () => {
    const events = [
      stop(m(0)),
      start(m(1)),
      reading(m(1), 'half', 2000, 'half'),
      start(m(2)),
      stop(m(4)),
    ];
    expect(accountRun(events, phases).phases[0].timeInBandMs).toBe(3 * MIN);
  });

  it('time counts only toward the phase named on the reading', () => {
    const below = testPhase({
      id: 'below',
      band: { rpmMin: 0, rpmMax: 4500 },
      throttleCeiling: 'three-quarter',
    });
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      advance(m(5), 'below'),
      reading(m(6), 'below', 4000, 'three-quarter'),
      stop(m(9)),
    ];
    const account = accountRun(events, [halfPhase, below]);
    expect(account.phases.map((p) => p.timeInBandMs)).toEqual([5 * MIN, 3 * MIN]);
  });

  it('a phase-advance ends the hold of the reading before it', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 2000, 'half'),
      advance(m(2), 'later'),
      stop(m(9)),
    ];
    expect(accountRun(events, phases).phases[0].timeInBandMs).toBe(2 * MIN);
  });

  it('readings naming an unknown phase are kept apart as unassigned', () => {
    const events = [start(m(0)), reading(m(0), 'ghost', 2000, 'half'), stop(m(4))];
    const account = accountRun(events, phases);
    expect(account.unassignedMs).toBe(4 * MIN);
    expect(account.phases[0].timeInBandMs).toBe(0);
  });

  it('in band includes the band limits; under is below rpmMin; a lever above the ceiling is over', () => {
    const events = [
      start(m(0)),
      reading(m(0), 'half', 1000, 'quarter'),
      reading(m(1), 'half', 3000, 'half'),
      reading(m(2), 'half', 800, 'idle'),
      reading(m(3), 'half', 2500, 'three-quarter'),
      stop(m(4)),
    ];
    const [phase] = accountRun(events, phases).phases;
    expect([phase.timeInBandMs, phase.timeUnderMs, phase.timeOverMs]).toEqual([
      2 * MIN,
      1 * MIN,
      1 * MIN,
    ]);
  });

  it('only the chosen engine counts when twins share a log', () => {
    const events = [
      start(m(0)),
      start(m(0), 'engine-starboard'),
      reading(m(0), 'half', 2000, 'half'),
      reading(m(0), 'half', 2000, 'half', 'engine-starboard'),
      stop(m(5)),
      stop(m(2), 'engine-starboard'),
    ];
    expect(accountRun(events, phases, { engineId: ENGINE }).phases[0].timeInBandMs).toBe(5 * MIN);
    expect(
      accountRun(events, phases, { engineId: 'engine-starboard' }).phases[0].timeInBandMs,
    ).toBe(2 * MIN);
  });
});
