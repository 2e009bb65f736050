import { randomUUID } from 'node:crypto';
import type { ResolvedPhase } from '../../shared/programs/resolve-band.js';
import type { ThrottlePosition } from '../../shared/programs/throttle.js';
import type { Reading } from '../../shared/runs/run-event.schema.js';

/*
 * What the demo's skipper types at each reading: a steady speed inside the band, a short burst
 * of full throttle where the phase allows it, or the one burst held too long. Every figure here
 * is invented for the demo.
 */

export const MINUTE = 60_000;

export interface State {
  phase: number;
  inBandMs: number[];
  rpm: number;
  runMs: number;
}

const throttleFor = (rpm: number, ratedMax: number): ThrottlePosition =>
  rpm < 0.3 * ratedMax ? 'quarter' : rpm < 0.52 * ratedMax ? 'half' : 'three-quarter';

/** A speed inside the band, at least 300 rpm from the last one, so the speed keeps changing. */
function nextRpm(
  phase: ResolvedPhase,
  last: number,
  random: () => number,
  idleRpm: number,
): number {
  if (phase.throttleCeiling === 'idle') return Math.round(idleRpm + random() * 250);
  const low = Math.max(phase.band.rpmMin + 40, idleRpm + 600);
  const high = phase.band.rpmMax - 40;
  for (let tries = 0; tries < 20; tries++) {
    const rpm = Math.round((low + random() * (high - low)) / 10) * 10;
    if (Math.abs(rpm - last) >= 300 || high - low < 600) return rpm;
  }
  return last > (low + high) / 2 ? low : high;
}

export interface Context {
  phases: ResolvedPhase[];
  engineId: string;
  ratedMax: number;
  idleRpm: number;
  random: () => number;
  hourMeterStart: number;
}

function reading(
  ctx: Context,
  at: number,
  phase: ResolvedPhase,
  rpm: number,
  throttle: ThrottlePosition,
): Reading {
  return {
    kind: 'reading',
    id: randomUUID(),
    at,
    engineId: ctx.engineId,
    phaseId: phase.id,
    rpm,
    throttle,
    rpmSource: 'tachometer',
  };
}

/** Full-throttle moments still to come in an outing (wall-clock times). */
export interface FullThrottlePlan {
  /** Short bursts, earliest first. */
  bursts: number[];
  /** The one held too long: from when, for how long. */
  held?: { from: number; ms: number };
  heldDone: boolean;
}

/** The reading typed at `t` and how long it stands until the next one. */
export function nextReading(
  ctx: Context,
  state: State,
  plan: FullThrottlePlan,
  t: number,
): { event: Reading; step: number } {
  const phase = ctx.phases[state.phase];
  // Typed readings, one every 8½ to 10 minutes: inside the 10-minute hold of the accounting.
  const step = Math.round((8.6 + ctx.random() * 1.2) * MINUTE);
  if (plan.held && !plan.heldDone && t >= plan.held.from) {
    plan.heldDone = true;
    const rpm = Math.round(ctx.ratedMax * 0.985);
    return { event: reading(ctx, t, phase, rpm, 'full'), step: plan.held.ms };
  }
  if (
    plan.bursts.length > 0 &&
    t >= plan.bursts[0] &&
    phase.rules.fullThrottleMaxSeconds !== undefined
  ) {
    plan.bursts.shift();
    const rpm = Math.round(ctx.ratedMax * (0.93 + ctx.random() * 0.04));
    // 40 s: well inside the one-minute limit of the demo's programs.
    return { event: reading(ctx, t, phase, rpm, 'full'), step: 40_000 };
  }
  state.rpm = nextRpm(phase, state.rpm, ctx.random, ctx.idleRpm);
  const throttle = phase.throttleCeiling === 'idle' ? 'idle' : throttleFor(state.rpm, ctx.ratedMax);
  // A reading that would outlast the phase's remaining time stands only a minute beyond it, so
  // the phase advances about when it is done.
  const left = phase.requiredMs - state.inBandMs[state.phase];
  return {
    event: reading(ctx, t, phase, state.rpm, throttle),
    step: left > 0 && left + MINUTE < step ? left + MINUTE : step,
  };
}
