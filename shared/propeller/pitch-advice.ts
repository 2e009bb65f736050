import { z } from 'zod';

export const PropulsionSchema = z.enum(['outboard', 'inboard'], {
  error: 'The drive (propulsion) must be "outboard" or "inboard".',
});
export type Propulsion = z.infer<typeof PropulsionSchema>;

/**
 * Full-throttle rpm change per inch of pitch: about 150–200 rpm on outboards, about 100 on
 * inboards (common practice, propeller-shop guides).
 */
export const RPM_PER_INCH_OF_PITCH: Record<Propulsion, { low: number; high: number }> = {
  outboard: { low: 150, high: 200 },
  inboard: { low: 100, high: 100 },
};

export const FullThrottleCheckSchema = z
  .object({
    fullThrottleRpm: z
      .number({ error: 'Enter the full-throttle rpm (fullThrottleRpm).' })
      .positive({
        error: 'The full-throttle rpm (fullThrottleRpm) must be more than zero.',
      }),
    ratedRpmMin: z.number({ error: 'Enter the lowest rated rpm (ratedRpmMin).' }).positive({
      error: 'The lowest rated rpm (ratedRpmMin) must be more than zero.',
    }),
    ratedRpmMax: z.number({ error: 'Enter the highest rated rpm (ratedRpmMax).' }).positive({
      error: 'The highest rated rpm (ratedRpmMax) must be more than zero.',
    }),
    pitchIn: z.number({ error: 'Enter the propeller pitch in inches (pitchIn).' }).positive({
      error: 'The propeller pitch (pitchIn) must be more than zero.',
    }),
    propulsion: PropulsionSchema,
  })
  .refine((v) => v.ratedRpmMin < v.ratedRpmMax, {
    error: 'The highest rated rpm (ratedRpmMax) must be above the lowest (ratedRpmMin).',
    path: ['ratedRpmMax'],
  });
export type FullThrottleCheck = z.infer<typeof FullThrottleCheckSchema>;

export type RatedRangeVerdict = 'below-range' | 'in-range' | 'above-range';

export interface PitchAdvice {
  verdict: RatedRangeVerdict;
  /** Middle of the rated range: where the propeller should put full-throttle rpm (common practice). */
  targetRpm: number;
  /** Positive when the engine turns faster than the target. */
  rpmFromTarget: number;
  /** Pitch change in inches by the rpm-per-inch rule, smallest and largest; positive means more pitch. */
  pitchChangeIn: { least: number; most: number };
  /** new pitch ≈ old × measured rpm / target rpm (common practice). */
  proportionalPitchIn: number;
  advice: string;
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/** new pitch ≈ old pitch × measured rpm / target rpm (common practice). */
export const proportionalPitch = (
  pitchIn: number,
  measuredRpm: number,
  targetRpm: number,
): number => (pitchIn * measuredRpm) / targetRpm;

function adviceWords(
  verdict: RatedRangeVerdict,
  change: PitchAdvice['pitchChangeIn'],
  check: FullThrottleCheck,
): string {
  const range = `${check.ratedRpmMin}–${check.ratedRpmMax} rpm`;
  if (verdict === 'in-range')
    return `Full-throttle rpm is inside the rated range (${range}); keep this propeller.`;
  const least = round1(Math.abs(change.least));
  const most = round1(Math.abs(change.most));
  const inches = least === most ? `about ${least} in` : `about ${least}–${most} in`;
  return verdict === 'above-range'
    ? `The engine over-revs above the rated range (${range}): try ${inches} more pitch.`
    : `The engine cannot reach the rated range (${range}) and is overloaded: try ${inches} less pitch.`;
}

/** Full-throttle rpm against the rated range, with the usual pitch advice. */
export function adviseOnPitch(check: FullThrottleCheck): PitchAdvice {
  const { fullThrottleRpm, ratedRpmMin, ratedRpmMax, pitchIn, propulsion } = check;
  const verdict: RatedRangeVerdict =
    fullThrottleRpm < ratedRpmMin
      ? 'below-range'
      : fullThrottleRpm > ratedRpmMax
        ? 'above-range'
        : 'in-range';
  const targetRpm = (ratedRpmMin + ratedRpmMax) / 2;
  const rpmFromTarget = fullThrottleRpm - targetRpm;
  const perInch = RPM_PER_INCH_OF_PITCH[propulsion];
  // Fewer rpm per inch means more inches for the same rpm, so `most` divides by `low`.
  const pitchChangeIn = { least: rpmFromTarget / perInch.high, most: rpmFromTarget / perInch.low };
  return {
    verdict,
    targetRpm,
    rpmFromTarget,
    pitchChangeIn,
    proportionalPitchIn: proportionalPitch(pitchIn, fullThrottleRpm, targetRpm),
    advice: adviceWords(verdict, pitchChangeIn, check),
  };
}
