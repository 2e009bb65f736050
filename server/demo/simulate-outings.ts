import { randomUUID } from 'node:crypto';
import type { ResolvedPhase } from '../../shared/programs/resolve-band.js';
import type { Reading, RunEvent } from '../../shared/runs/run-event.schema.js';
import { repeatableRandom } from '../lib/repeatable-random.js';
import {
  MINUTE,
  nextReading,
  type Context,
  type FullThrottlePlan,
  type State,
} from './demo-readings.js';

/*
 * Demo outings, simulated through a program's phases so the board, the chart and the verdict
 * have something real to show. Every figure here (idle speeds, spacing of readings, burst
 * lengths) is invented for the demo; the pseudo-random numbers repeat from a fixed start, so
 * every new demo database holds the same run.
 */

export interface Outing {
  /** Wall-clock start, epoch ms. */
  start: number;
  minutes: number;
  by: 'workshop' | 'skipper';
  /** A short full-throttle burst this many minutes into the outing, where the phase allows bursts. */
  burstsAt?: number[];
  /** Full throttle held for `minutes` from `at` minutes in: the demo's one broken rule. */
  heldFullThrottle?: { at: number; minutes: number };
  /** The hour meter is read off the engine at the end of the outing. */
  readHourMeter?: boolean;
  note?: string;
}

export interface SimulatedEvent {
  event: RunEvent;
  by: 'workshop' | 'skipper';
  /** Wall-clock end of the outing: when the device had signal again to send it. */
  outingEnd: number;
}

/** Simulates one outing from `state`, pushing events; phases advance as each one's time in band is done. */
function simulateOuting(ctx: Context, state: State, outing: Outing, out: RunEvent[]): void {
  const end = outing.start + outing.minutes * MINUTE;
  const held = outing.heldFullThrottle;
  const plan: FullThrottlePlan = {
    bursts: [...(outing.burstsAt ?? [])].map((m) => outing.start + m * MINUTE),
    held: held && { from: outing.start + held.at * MINUTE, ms: held.minutes * MINUTE },
    heldDone: false,
  };
  out.push({ kind: 'session-start', id: randomUUID(), at: outing.start, engineId: ctx.engineId });
  let t = outing.start;
  let last: Reading | null = null;
  while (t < end - MINUTE) {
    const phase = ctx.phases[state.phase];
    const next = nextReading(ctx, state, plan, t);
    const step = Math.min(next.step, end - t);
    out.push(next.event);
    last = next.event;
    const inBand = next.event.throttle !== 'full';
    if (inBand) state.inBandMs[state.phase] += step;
    state.runMs += step;
    t += step;
    if (state.inBandMs[state.phase] >= phase.requiredMs && state.phase < ctx.phases.length - 1) {
      state.phase++;
      out.push({
        kind: 'phase-advance',
        id: randomUUID(),
        at: t,
        engineId: ctx.engineId,
        phaseId: ctx.phases[state.phase].id,
      });
    }
  }
  if (last && outing.readHourMeter)
    last.hourMeter = Math.round((ctx.hourMeterStart + state.runMs / 3_600_000) * 10) / 10;
  if (outing.note)
    out.push({ kind: 'note', id: randomUUID(), at: t, engineId: ctx.engineId, text: outing.note });
  out.push({ kind: 'session-stop', id: randomUUID(), at: t, engineId: ctx.engineId });
}

/** Every event of a run's outings, in the order they happened. */
export function simulateOutings(
  input: {
    phases: ResolvedPhase[];
    engineId: string;
    ratedMax: number;
    idleRpm: number;
    hourMeterStart: number;
    randomStart: number;
  },
  outings: Outing[],
): SimulatedEvent[] {
  const ctx: Context = { ...input, random: repeatableRandom(input.randomStart) };
  const state: State = { phase: 0, inBandMs: input.phases.map(() => 0), rpm: 0, runMs: 0 };
  const all: SimulatedEvent[] = [];
  for (const outing of outings) {
    const events: RunEvent[] = [];
    simulateOuting(ctx, state, outing, events);
    const outingEnd = outing.start + outing.minutes * MINUTE;
    for (const event of events) all.push({ event, by: outing.by, outingEnd });
  }
  return all;
}
