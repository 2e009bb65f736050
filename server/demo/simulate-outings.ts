import { randomUUID } from 'node:crypto';
import type { ResolvedPhase } from '../../shared/programs/resolve-band.js';
import type { ThrottlePosition } from '../../shared/programs/throttle.js';
import type { Reading, RunEvent } from '../../shared/runs/run-event.schema.js';
import { repeatableRandom } from '../lib/repeatable-random.js';

/*
 * Demo outings, simulated through a program's phases so the board, the chart and the verdict
 * have something real to show. Every figure here (idle speeds, spacing of readings, burst
 * lengths) is invented for the demo; the pseudo-random numbers repeat from a fixed start, so
 * every new demo database holds the same run.
 */

const MINUTE = 60_000;

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

interface State {
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

interface Context {
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

/** Simulates one outing from `state`, pushing events; phases advance as each one's time in band is done. */
function simulateOuting(ctx: Context, state: State, outing: Outing, out: RunEvent[]): void {
  const end = outing.start + outing.minutes * MINUTE;
  const bursts = [...(outing.burstsAt ?? [])].map((m) => outing.start + m * MINUTE);
  const held = outing.heldFullThrottle;
  let heldDone = false;
  out.push({ kind: 'session-start', id: randomUUID(), at: outing.start, engineId: ctx.engineId });
  let t = outing.start;
  let last: Reading | null = null;
  while (t < end - MINUTE) {
    const phase = ctx.phases[state.phase];
    // Typed readings, one every 8½ to 10 minutes: inside the 10-minute hold of the accounting.
    let step = Math.round((8.6 + ctx.random() * 1.2) * MINUTE);
    let event: Reading;
    if (held && !heldDone && t >= outing.start + held.at * MINUTE) {
      heldDone = true;
      event = reading(ctx, t, phase, Math.round(ctx.ratedMax * 0.985), 'full');
      step = held.minutes * MINUTE;
    } else if (
      bursts.length > 0 &&
      t >= bursts[0] &&
      phase.rules.fullThrottleMaxSeconds !== undefined
    ) {
      bursts.shift();
      event = reading(
        ctx,
        t,
        phase,
        Math.round(ctx.ratedMax * (0.93 + ctx.random() * 0.04)),
        'full',
      );
      step = 40_000; // well inside the one-minute limit of the demo's programs
    } else {
      state.rpm = nextRpm(phase, state.rpm, ctx.random, ctx.idleRpm);
      event = reading(
        ctx,
        t,
        phase,
        state.rpm,
        phase.throttleCeiling === 'idle' ? 'idle' : throttleFor(state.rpm, ctx.ratedMax),
      );
      const left = phase.requiredMs - state.inBandMs[state.phase];
      if (left > 0 && left + MINUTE < step) step = left + MINUTE;
    }
    step = Math.min(step, end - t);
    out.push(event);
    last = event;
    const inBand = event.throttle !== 'full';
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

/**
 * The second engine of a twin installation, run together with the first: the same moments and
 * levers, each speed a few rpm apart (no two tachometers agree exactly), kept inside the band.
 */
export function twinOf(
  events: SimulatedEvent[],
  engineId: string,
  phases: ResolvedPhase[],
  randomStart: number,
): SimulatedEvent[] {
  const random = repeatableRandom(randomStart);
  const bands = new Map(phases.map((p) => [p.id, p.band]));
  return events.map(({ event, ...rest }) => {
    const copy = { ...event, id: randomUUID(), engineId } as RunEvent;
    if (copy.kind === 'reading' && copy.throttle !== 'full') {
      const band = bands.get(copy.phaseId)!;
      copy.rpm = Math.min(
        band.rpmMax - 10,
        Math.max(band.rpmMin + 10, copy.rpm + Math.round((random() - 0.5) * 60)),
      );
    }
    return { event: copy, ...rest };
  });
}
