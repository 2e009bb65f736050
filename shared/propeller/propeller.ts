import { INCH_M, NAUTICAL_MILE_M, STATUTE_MILE_M } from '../units/definitions';

const SECONDS_PER_MINUTE = 60;

/**
 * Pitch speed divisors: knots = shaft rpm × pitch(in) / 1215.2231, mph = … / 1056.
 * Computed from the nautical mile (1852 m), the statute mile (63,360 in) and the inch
 * (0.0254 m) so they stay exact.
 */
export const PITCH_SPEED_KN_DIVISOR = NAUTICAL_MILE_M / INCH_M / SECONDS_PER_MINUTE;
export const PITCH_SPEED_MPH_DIVISOR = STATUTE_MILE_M / INCH_M / SECONDS_PER_MINUTE;

/** Propeller shaft rpm behind a reduction gear (gear ratio 2 means 2:1). */
export const shaftRpm = (engineRpm: number, gearRatio: number): number => engineRpm / gearRatio;

/** Speed the propeller would make if it screwed through the water like a bolt through a nut. */
export const pitchSpeedKn = (shaftRpmValue: number, pitchIn: number): number =>
  (shaftRpmValue * pitchIn) / PITCH_SPEED_KN_DIVISOR;

export const pitchSpeedMph = (shaftRpmValue: number, pitchIn: number): number =>
  (shaftRpmValue * pitchIn) / PITCH_SPEED_MPH_DIVISOR;

/** Slip = 1 − measured speed / pitch speed (D. Gerr, The Propeller Handbook, 1989, from memory). */
export function propellerSlip(measuredKn: number, pitchSpeed: number): number {
  if (pitchSpeed <= 0) throw new RangeError('Pitch speed must be more than zero to work out slip.');
  return 1 - measuredKn / pitchSpeed;
}

export interface PropellerSpeedCheck {
  shaftRpm: number;
  pitchSpeedKn: number;
  pitchSpeedMph: number;
  /** Share 0..1 (can go negative when the logged speed is above pitch speed: a sign of a bad log). */
  slip: number | null;
}

/** Everything the propeller check screen shows from one full-throttle reading. */
export function checkPropellerSpeed(input: {
  engineRpm: number;
  gearRatio: number;
  pitchIn: number;
  measuredKn?: number;
}): PropellerSpeedCheck {
  const shaft = shaftRpm(input.engineRpm, input.gearRatio);
  const speedKn = pitchSpeedKn(shaft, input.pitchIn);
  return {
    shaftRpm: shaft,
    pitchSpeedKn: speedKn,
    pitchSpeedMph: pitchSpeedMph(shaft, input.pitchIn),
    slip:
      input.measuredKn === undefined || speedKn <= 0
        ? null
        : propellerSlip(input.measuredKn, speedKn),
  };
}
