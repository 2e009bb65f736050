import { describe, expect, it } from 'vitest';
import type { RunEvent } from '../../../shared/runs/run-event.schema';
import { alertsToLog, engineSnapshot } from './engine-snapshot';
import { MIN, T0, testRun } from './test-fixtures';

// The built-in four-stroke program on a demo engine rated 5000–6000 rpm: dock run (workshop,
// idle, 10 min), below half (skipper, 0–3000 rpm, change speed every 15 min), below ¾.
const run = testRun('port');
const engineId = run.engine.id;
let n = 0;
const id = () => `00000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;
const at = (minutes: number) => T0 + minutes * MIN;
const start = (m: number): RunEvent => ({ kind: 'session-start', id: id(), at: at(m), engineId });
const advance = (m: number, phaseId: string): RunEvent => ({
  kind: 'phase-advance',
  id: id(),
  at: at(m),
  engineId,
  phaseId,
});
const reading = (
  m: number,
  phaseId: string,
  rpm: number,
  throttle: 'idle' | 'half' | 'full' | 'three-quarter',
): RunEvent => ({
  kind: 'reading',
  id: id(),
  at: at(m),
  engineId,
  phaseId,
  rpm,
  throttle,
});

describe('one engine on deck', () => {
  it("before anything: on the workshop's dock run, which a skipper waits for", () => {
    const snap = engineSnapshot(run, [], T0, 'skipper');
    expect(snap.phase?.id).toBe('dock-run');
    expect(snap.waitingForWorkshop).toBe(true);
    expect(engineSnapshot(run, [], T0, 'technician').waitingForWorkshop).toBe(false);
    expect(snap.rows.map((r) => r.status)).toEqual(['current', 'to-come', 'to-come']);
  });

  it('after the dock run: done, and the next phase is proposed', () => {
    const events = [start(0), reading(0, 'dock-run', 800, 'idle')];
    const snap = engineSnapshot(run, events, at(10), 'skipper');
    expect(snap.phaseComplete).toBe(true);
    expect(snap.nextPhase?.id).toBe('below-half');
    expect(snap.waitingForWorkshop).toBe(false);
    expect(snap.rows[0].status).toBe('done');
  });

  it('counts time in band from stored times, the same after a reload', () => {
    const events = [start(0), advance(0, 'below-half'), reading(0, 'below-half', 2400, 'half')];
    const snap = engineSnapshot(run, events, at(4), 'skipper');
    expect(snap.live.state).toBe('in-band');
    expect(snap.live.phaseDoneMs).toBe(4 * MIN);
    expect(snap.rows.map((r) => r.status)).toEqual(['waiting-for-workshop', 'current', 'to-come']);
    expect(engineSnapshot(run, events, at(4), 'skipper').live).toEqual(snap.live);
  });

  it('over the band: a reminder during the one-minute grace (our own allowance), then an alert', () => {
    const events = [
      start(0),
      advance(0, 'below-half'),
      reading(0, 'below-half', 2400, 'half'),
      reading(2, 'below-half', 3500, 'half'),
    ];
    const early = engineSnapshot(run, events, at(2.5), 'skipper');
    expect(early.live.state).toBe('over');
    expect(early.alerts).toEqual([]);
    expect(early.reminders.map((r) => r.code)).toContain('over-band-grace');
    const late = engineSnapshot(run, events, at(3.5), 'skipper');
    expect(late.alerts.map((a) => a.code)).toEqual(['over-band']);
    expect(late.alerts[0].sinceMs).toBe(at(2));
    expect(alertsToLog(late)).toHaveLength(1);
    const logged: RunEvent = {
      kind: 'alert',
      id: id(),
      at: at(3.5),
      engineId,
      code: 'over-band',
      message: 'x',
      phaseId: 'below-half',
    };
    expect(alertsToLog(engineSnapshot(run, [...events, logged], at(4), 'skipper'))).toEqual([]);
  });

  it("reminds to vary speed before the 15-minute rule (program's reading of common practice) is broken", () => {
    const events = [
      start(0),
      advance(0, 'below-half'),
      reading(0, 'below-half', 2400, 'half'),
      reading(5, 'below-half', 2450, 'half'),
      reading(10, 'below-half', 2400, 'half'),
    ];
    expect(engineSnapshot(run, events, at(11), 'skipper').reminders).toEqual([]);
    const soon = engineSnapshot(run, events, at(13), 'skipper');
    expect(soon.reminders).toEqual([
      expect.objectContaining({ code: 'change-speed-soon', leftMs: 2 * MIN }),
    ]);
    const changed = [...events, reading(13, 'below-half', 2800, 'half')];
    expect(engineSnapshot(run, changed, at(14), 'skipper').reminders).toEqual([]);
  });

  it('full throttle in a phase that allows short bursts: counts down, then alerts past 60 s', () => {
    const events = [
      start(0),
      advance(0, 'below-three-quarter'),
      reading(0, 'below-three-quarter', 4000, 'three-quarter'),
      reading(1, 'below-three-quarter', 5800, 'full'),
    ];
    const during = engineSnapshot(run, events, at(1) + 30_000, 'skipper');
    expect(during.reminders).toEqual([
      expect.objectContaining({ code: 'full-throttle-limit', leftMs: 30_000 }),
    ]);
    expect(
      engineSnapshot(run, events, at(2) + 5_000, 'skipper').alerts.map((a) => a.code),
    ).toContain('full-throttle-too-long');
  });
});
