import type { ResolvedPhase } from '../programs/resolve-band';
import { throttleAboveCeiling, type ThrottlePosition } from '../programs/throttle';
import { durationWords, minutesToMs, secondsToMs } from './duration-words';
import { stretchMs, type SteadyStretch, type Stretch, type WindowTotal } from './stretches';

export type BandState = 'in-band' | 'over' | 'under';

export type ReasonCode =
  | 'over-band'
  | 'full-throttle-too-long'
  | 'full-throttle-too-often'
  | 'no-speed-change'
  | 'idle-too-long'
  | 'short-of-time';

export interface RunReason {
  code: ReasonCode;
  /** Plain words for the skipper and the workshop. */
  message: string;
  /** The stretch the reason is about; null when there is none (a phase never run). */
  fromMs: number | null;
  toMs: number | null;
}

/** In band: rpmMin ≤ rpm ≤ rpmMax with the lever at or below the ceiling. Over wins over under. */
export function bandState(
  rpm: number,
  throttle: ThrottlePosition,
  phase: Pick<ResolvedPhase, 'band' | 'throttleCeiling'>,
): BandState {
  if (rpm > phase.band.rpmMax || throttleAboveCeiling(throttle, phase.throttleCeiling))
    return 'over';
  return rpm < phase.band.rpmMin ? 'under' : 'in-band';
}

/**
 * A short overshoot (a wave lifting the propeller, a slip of the lever) is recorded as time
 * over but not called a breach. One minute is our own allowance, not a trade figure.
 */
export const OVER_BAND_GRACE_MS = 60_000;

/** The stretches a phase's rules are judged on, already cut to those over each limit. */
export interface PhaseStretches {
  overBand: Stretch[];
  fullThrottleTooLong: Stretch[];
  fullThrottleHour: WindowTotal;
  steady: SteadyStretch[];
  idle: Stretch[];
}

const reason = (code: ReasonCode, message: string, s: Stretch): RunReason => ({
  code,
  message,
  fromMs: s.fromMs,
  toMs: s.toMs,
});

const held = (s: Stretch) => durationWords(stretchMs(s));

/** The band's top in words: "up to 3000 rpm at half throttle or less". */
function bandTopWords(phase: ResolvedPhase): string {
  const rpm = `up to ${phase.band.rpmMax} rpm`;
  if (phase.throttleCeiling === 'idle') return `${rpm}, at idle`;
  if (phase.throttleCeiling === 'half' || phase.throttleCeiling === 'three-quarter') {
    return `${rpm} at ${phase.throttleCeiling} throttle or less`;
  }
  return rpm;
}

function fullThrottleReasons(phase: ResolvedPhase, found: PhaseStretches): RunReason[] {
  const { fullThrottleMaxSeconds, fullThrottleMaxMinutesPerHour } = phase.rules;
  const atATime = durationWords(secondsToMs(fullThrottleMaxSeconds ?? 0));
  const reasons = found.fullThrottleTooLong.map((s) =>
    reason(
      'full-throttle-too-long',
      `Full throttle was held for ${held(s)}; this phase allows at most ${atATime} at a time.`,
      s,
    ),
  );
  const hour = found.fullThrottleHour;
  if (
    fullThrottleMaxMinutesPerHour !== undefined &&
    hour.totalMs > minutesToMs(fullThrottleMaxMinutesPerHour)
  ) {
    const most = durationWords(minutesToMs(fullThrottleMaxMinutesPerHour));
    const message = `Full throttle added up to ${durationWords(hour.totalMs)} within one hour; this phase allows at most ${most} in any hour.`;
    reasons.push(reason('full-throttle-too-often', message, hour));
  }
  return reasons;
}

const byTimeThenCode = (a: RunReason, b: RunReason) =>
  (a.fromMs ?? 0) - (b.fromMs ?? 0) || (a.code < b.code ? -1 : a.code > b.code ? 1 : 0);

/** Every broken rule of one phase, in words, earliest first. */
export function ruleBreaches(phase: ResolvedPhase, found: PhaseStretches): RunReason[] {
  const top = bandTopWords(phase);
  const every = durationWords(minutesToMs(phase.rules.changeSpeedEveryMinutes ?? 0));
  const idleMost = durationWords(minutesToMs(phase.rules.idleMaxMinutes ?? 0));
  return [
    ...found.overBand.map((s) =>
      reason('over-band', `The engine ran above this phase's band (${top}) for ${held(s)}.`, s),
    ),
    ...fullThrottleReasons(phase, found),
    ...found.steady.map((s) =>
      reason(
        'no-speed-change',
        `The engine stayed near ${s.rpm} rpm for ${held(s)} without a change of speed; this phase asks for a change at least every ${every}.`,
        s,
      ),
    ),
    ...found.idle.map((s) =>
      reason(
        'idle-too-long',
        `The engine idled for ${held(s)}; this phase allows at most ${idleMost} of idling at a time.`,
        s,
      ),
    ),
  ].sort(byTimeThenCode);
}
