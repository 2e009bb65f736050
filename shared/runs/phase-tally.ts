import type { ResolvedPhase } from '../programs/resolve-band';
import type { ThrottlePosition } from '../programs/throttle';
import { durationWords, minutesToMs, ONE_HOUR_MS, secondsToMs } from './duration-words';
import { bandState, OVER_BAND_GRACE_MS, ruleBreaches, type RunReason } from './phase-rules';
import { maxTotalInWindow, SteadyTracker, stretchMs, StretchTracker } from './stretches';

/*
 * RE-RUN RULE: how time counts for a phase the workshop sent back.
 *
 * When the workshop returns a run it names the phases to run again; each such phase gets the
 * moment of the return (server time) as `countsFromMs`, the latest return winning. From then on:
 *
 * 1. Only engine time from that moment on counts toward the phase: in-band time, the time over
 *    and under, and every rule (full throttle, idling, steady speed, over the band). The phase
 *    is run again from nothing.
 * 2. Time logged on the phase before that moment is kept and shown as "set aside" (setAsideMs),
 *    never counted: a reading that holds across the moment counts only for its part after it.
 * 3. Phases not sent back keep everything they had: the return does not touch them.
 *
 * The phone, the review and the certificate all resolve the run's phases with the same
 * `countsFromMs` (frozenPhases), so they count the same time.
 */

export type Verdict = 'complete' | 'incomplete' | 'breached';

export interface PhaseAccount {
  phaseId: string;
  requiredMs: number;
  timeInBandMs: number;
  timeOverMs: number;
  timeUnderMs: number;
  longestFullThrottleMs: number;
  /** Most full throttle within any rolling hour. */
  maxFullThrottleInHourMs: number;
  /** min(1, time in band / required). */
  progressShare: number;
  /** Time logged before the phase was sent back to be run again: shown, not counted. */
  setAsideMs: number;
  /** When the phase was sent back (epoch ms); null when it never was. */
  countsFromMs: number | null;
  verdict: Verdict;
  reasons: RunReason[];
}

/** A rule the phase does not have never keeps a stretch. */
const limitMs = (value: number | undefined, toMs: (v: number) => number) =>
  value === undefined ? Number.POSITIVE_INFINITY : toMs(value);

/** Adds up one phase's segments as they come, in time order, then judges the phase. */
export class PhaseTally {
  private inBandMs = 0;
  private overMs = 0;
  private underMs = 0;
  private setAsideMs = 0;
  private firstMs: number | null = null;
  private lastMs = 0;
  private readonly burstsAllowed: boolean;
  // Every full-throttle stretch is kept: the rolling-hour total needs the short ones too.
  private readonly fullThrottle = new StretchTracker(0);
  private readonly overBand = new StretchTracker(OVER_BAND_GRACE_MS);
  private readonly idle: StretchTracker;
  private readonly steady: SteadyTracker;

  constructor(private readonly phase: ResolvedPhase) {
    this.burstsAllowed = phase.rules.fullThrottleMaxSeconds !== undefined;
    this.idle = new StretchTracker(limitMs(phase.rules.idleMaxMinutes, minutesToMs));
    this.steady = new SteadyTracker(limitMs(phase.rules.changeSpeedEveryMinutes, minutesToMs));
  }

  add(fromMs: number, toMs: number, rpm: number, throttle: ThrottlePosition): void {
    const countsFrom = this.phase.countsFromMs;
    if (countsFrom !== undefined && fromMs < countsFrom) {
      this.setAsideMs += Math.min(toMs, countsFrom) - fromMs;
      if (toMs <= countsFrom) return;
      fromMs = countsFrom;
    }
    const state = bandState(rpm, throttle, this.phase);
    const ms = toMs - fromMs;
    if (state === 'in-band') this.inBandMs += ms;
    else if (state === 'over') this.overMs += ms;
    else this.underMs += ms;
    this.firstMs ??= fromMs;
    this.lastMs = toMs;
    this.fullThrottle.add(fromMs, toMs, throttle === 'full');
    // Where bursts are allowed they are judged by the full-throttle rules, not as over-band.
    this.overBand.add(
      fromMs,
      toMs,
      state === 'over' && !(this.burstsAllowed && throttle === 'full'),
    );
    this.idle.add(fromMs, toMs, throttle === 'idle');
    // Idling is left to the idle rule: it is not a steady stretch, and it ends one.
    this.steady.add(fromMs, toMs, rpm, throttle !== 'idle');
  }

  finish(): PhaseAccount {
    for (const tracker of [this.fullThrottle, this.overBand, this.idle, this.steady])
      tracker.close();
    const full = this.fullThrottle.kept;
    const tooLongMs = limitMs(this.phase.rules.fullThrottleMaxSeconds, secondsToMs);
    const fullThrottleHour = maxTotalInWindow(full, ONE_HOUR_MS);
    const breaches = ruleBreaches(this.phase, {
      overBand: this.overBand.kept,
      fullThrottleTooLong: full.filter((s) => stretchMs(s) > tooLongMs),
      fullThrottleHour,
      steady: this.steady.kept,
      idle: this.idle.kept,
    });
    const done = this.inBandMs >= this.phase.requiredMs;
    return {
      phaseId: this.phase.id,
      requiredMs: this.phase.requiredMs,
      timeInBandMs: this.inBandMs,
      timeOverMs: this.overMs,
      timeUnderMs: this.underMs,
      longestFullThrottleMs: full.reduce((most, s) => Math.max(most, stretchMs(s)), 0),
      maxFullThrottleInHourMs: fullThrottleHour.totalMs,
      progressShare: Math.min(1, this.inBandMs / this.phase.requiredMs),
      setAsideMs: this.setAsideMs,
      countsFromMs: this.phase.countsFromMs ?? null,
      verdict: breaches.length > 0 ? 'breached' : done ? 'complete' : 'incomplete',
      reasons: done ? breaches : [...breaches, this.shortOfTime()],
    };
  }

  private shortOfTime(): RunReason {
    const required = durationWords(this.phase.requiredMs);
    if (this.firstMs === null) {
      return {
        code: 'short-of-time',
        message: `Not run yet: ${required} in band is required.`,
        fromMs: null,
        toMs: null,
      };
    }
    const left = durationWords(this.phase.requiredMs - this.inBandMs);
    return {
      code: 'short-of-time',
      message: `In band for ${durationWords(this.inBandMs)} of the ${required} required; ${left} to go.`,
      fromMs: this.firstMs,
      toMs: this.lastMs,
    };
  }
}
