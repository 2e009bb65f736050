import type { ResolvedPhase } from '../programs/resolve-band';
import type { ThrottlePosition } from '../programs/throttle';
import type { RunEvent } from './run-event.schema';

/*
 * Builders for test scenarios. Engines, phases and times here are made up to exercise the
 * accounting rules; they are not break-in advice. No test library is imported here, so the
 * file keeps to the rules of shared/ (zod and date-fns only).
 */

export const MIN = 60_000;
export const SEC = 1000;
export const T0 = Date.UTC(2025, 4, 10, 9, 0, 0);
export const ENGINE = 'engine-port';

let counter = 0;
/** A UUID-shaped id; the hex counter keeps ids unique and in creation order. */
export function nextId(): string {
  counter += 1;
  return `00000000-0000-4000-8000-${counter.toString(16).padStart(12, '0')}`;
}

export const start = (at: number, engineId = ENGINE): RunEvent => ({
  kind: 'session-start',
  id: nextId(),
  at,
  engineId,
});
export const stop = (at: number, engineId = ENGINE): RunEvent => ({
  kind: 'session-stop',
  id: nextId(),
  at,
  engineId,
});
export const advance = (at: number, phaseId: string, engineId = ENGINE): RunEvent => ({
  kind: 'phase-advance',
  id: nextId(),
  at,
  engineId,
  phaseId,
});
export const reading = (
  at: number,
  phaseId: string,
  rpm: number,
  throttle: ThrottlePosition,
  engineId = ENGINE,
): RunEvent => ({ kind: 'reading', id: nextId(), at, engineId, phaseId, rpm, throttle });

export const minutesAfterT0 = (m: number) => T0 + m * MIN;

export function testPhase(
  overrides: Partial<ResolvedPhase> & Pick<ResolvedPhase, 'id'>,
): ResolvedPhase {
  return {
    name: overrides.id,
    performedBy: 'skipper',
    throttleCeiling: 'half',
    band: { rpmMin: 1000, rpmMax: 3000 },
    requiredMs: 60 * MIN,
    rules: {},
    instructions: 'Test phase.',
    ...overrides,
  };
}

/** Phases that give every rule something to judge, for property tests. */
export const PROPERTY_PHASES: ResolvedPhase[] = [
  testPhase({
    id: 'a',
    band: { rpmMin: 1000, rpmMax: 3000 },
    throttleCeiling: 'half',
    requiredMs: 30 * MIN,
    rules: { changeSpeedEveryMinutes: 15, idleMaxMinutes: 10 },
  }),
  testPhase({
    id: 'b',
    band: { rpmMin: 0, rpmMax: 4500 },
    throttleCeiling: 'three-quarter',
    requiredMs: 60 * MIN,
    rules: {
      fullThrottleMaxSeconds: 60,
      fullThrottleMaxMinutesPerHour: 5,
      changeSpeedEveryMinutes: 15,
    },
  }),
  testPhase({
    id: 'c',
    band: { rpmMin: 2500, rpmMax: 3000 },
    throttleCeiling: 'varied',
    requiredMs: 20 * MIN,
    rules: { fullThrottleMaxSeconds: 300 },
  }),
];

/** One step of a generated event stream: how long after the last event, and what. */
export interface EventStep {
  dtMs: number;
  kind: 'session-start' | 'session-stop' | 'reading' | 'phase-advance';
  id: string;
  rpm: number;
  throttle: ThrottlePosition;
  phaseId: string;
}

/** Turns steps into events in recording order; a negative step is a device clock set back. */
export function eventsFromSteps(steps: readonly EventStep[]): RunEvent[] {
  let at = T0;
  return steps.map((step) => {
    at = Math.max(0, at + step.dtMs);
    const base = { id: step.id, at, engineId: ENGINE };
    if (step.kind === 'reading')
      return {
        ...base,
        kind: 'reading',
        phaseId: step.phaseId,
        rpm: step.rpm,
        throttle: step.throttle,
      };
    if (step.kind === 'phase-advance')
      return { ...base, kind: 'phase-advance', phaseId: step.phaseId };
    return { ...base, kind: step.kind as 'session-start' | 'session-stop' };
  });
}

/** A deterministic shuffle from a starting number (mulberry32), so a failing case can be replayed. */
export function shuffled<T>(items: readonly T[], randomStart: number): T[] {
  let state = randomStart >>> 0;
  const random = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const copy = items.slice();
  for (let i = copy.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [copy[i], copy[j]] = [copy[j], copy[i]];
  }
  return copy;
}
