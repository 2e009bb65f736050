import { describe, expect, it } from 'vitest';
import type { RunEvent } from '../../../shared/runs/run-event.schema';
import { canWorkOn, engineSnapshot } from './engine-snapshot';
import { runPhases } from './run-phases';
import { MIN, T0, testRun } from './test-fixtures';

// The built-in four-stroke program on a demo engine rated 5000–6000 rpm: dock run (workshop,
// 10 min), below half (skipper, 110 min, 0–3000 rpm), below three-quarter (skipper, 480 min).
const at = (minutes: number) => T0 + minutes * MIN;
let n = 0;
const id = () => `00000000-0000-4000-8000-${(++n).toString(16).padStart(12, '0')}`;

function returned(rerunPhaseIds: string[], atMinutes: number) {
  const rerunFrom = Object.fromEntries(rerunPhaseIds.map((p) => [p, at(atMinutes)]));
  return testRun('port', {
    state: 'returned',
    rerunFrom,
    lastDecision: {
      decision: 'returned',
      comments: 'Run it again.',
      rerunPhaseIds,
      reviewerName: 'Ivo',
      decidedAt: new Date(at(atMinutes)).toISOString(),
    },
  });
}

const engineId = testRun('port').engine.id;
const base = { engineId } as const;
const reading = (m: number, phaseId: string, rpm: number): RunEvent => ({
  ...base,
  kind: 'reading',
  id: id(),
  at: at(m),
  phaseId,
  rpm,
  throttle: 'half',
});
// Logged before the return: the skipper had reached the last phase.
const before: RunEvent[] = [
  { ...base, kind: 'session-start', id: id(), at: at(0) },
  { ...base, kind: 'phase-advance', id: id(), at: at(0), phaseId: 'below-half' },
  reading(0, 'below-half', 2400),
  reading(5, 'below-half', 2800),
  { ...base, kind: 'phase-advance', id: id(), at: at(10), phaseId: 'below-three-quarter' },
  reading(10, 'below-three-quarter', 3500),
  { ...base, kind: 'session-stop', id: id(), at: at(15) },
];

describe('a returned run on deck', () => {
  it('carries the moment of the return on the phases sent back, and only on those', () => {
    const phases = runPhases(returned(['below-half'], 60));
    expect(phases.map((p) => p.countsFromMs)).toEqual([undefined, at(60), undefined]);
  });

  it('starts on the first phase sent back, with the time logged before set aside', () => {
    const snap = engineSnapshot(returned(['below-half'], 60), before, at(61), 'skipper');
    expect(snap.phase?.id).toBe('below-half');
    expect(snap.live.phaseDoneMs).toBe(0);
    expect(snap.account.phases[1].setAsideMs).toBe(10 * MIN);
    expect(snap.rows.map((r) => r.rerun)).toEqual(['stands', 'again', 'stands']);
  });

  it('moves on only to a later phase that was sent back, never to one that stands', () => {
    const one = engineSnapshot(returned(['below-half'], 60), before, at(61), 'skipper');
    expect(one.nextPhase).toBeNull();
    const both = returned(['dock-run', 'below-three-quarter'], 60);
    const snap = engineSnapshot(both, before, at(61), 'technician');
    expect(snap.phase?.id).toBe('dock-run');
    expect(snap.nextPhase?.id).toBe('below-three-quarter');
  });

  it('a workshop phase sent back holds a skipper, not the workshop', () => {
    const run = returned(['dock-run'], 60);
    expect(canWorkOn(engineSnapshot(run, before, at(61), 'skipper'), 'skipper')).toBe(false);
    expect(canWorkOn(engineSnapshot(run, before, at(61), 'technician'), 'technician')).toBe(true);
  });
});

describe('a voided reading on deck', () => {
  it('is left out of the timer and is no longer the last reading', () => {
    const run = testRun('port');
    const over = reading(5, 'below-half', 3600);
    const events: RunEvent[] = [...before.slice(0, 3), over];
    const taken: RunEvent = {
      ...base,
      kind: 'void',
      id: id(),
      at: at(6),
      targetId: over.id,
      reason: 'Typed 3600 for 2600.',
    };
    const kept = engineSnapshot(run, events, at(7), 'skipper');
    expect(kept.live.state).toBe('over');
    const voided = engineSnapshot(run, [...events, taken], at(7), 'skipper');
    expect(voided.lastReading?.rpm).toBe(2400);
    // The reading before holds on (up to the 10-minute hold, timeline.ts) once the slip is gone.
    expect(voided.live.state).toBe('in-band');
    expect(voided.live.phaseDoneMs).toBe(7 * MIN);
  });
});
