import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  checkPropellerSpeed,
  PITCH_SPEED_KN_DIVISOR,
  PITCH_SPEED_MPH_DIVISOR,
  pitchSpeedKn,
  propellerSlip,
  shaftRpm,
} from './propeller';
import { adviseOnPitch, FullThrottleCheckSchema, proportionalPitch } from './pitch-advice';

describe('pitch speed', () => {
  it('divisor is 1852 / 0.0254 / 60 = 1215.2231 (nautical mile, Monaco 1929; inch, 1959 agreement)', () => {
    expect(PITCH_SPEED_KN_DIVISOR).toBeCloseTo(1215.2231, 4);
  });

  it('mph divisor is 63,360 / 60 = 1056 (same definitions)', () => {
    expect(PITCH_SPEED_MPH_DIVISOR).toBeCloseTo(1056, 9);
  });

  it('5500 rpm, 2:1, 21 in → 47.52 kn; slip 15.8 % at 40 kn (computed from the formula)', () => {
    const check = checkPropellerSpeed({
      engineRpm: 5500,
      gearRatio: 2,
      pitchIn: 21,
      measuredKn: 40,
    });
    expect(check.shaftRpm).toBe(2750);
    expect(check.pitchSpeedKn).toBeCloseTo(47.52, 2);
    expect(check.slip).toBeCloseTo(0.158, 3);
  });

  it('3000 rpm, 2:1, 19 in → 23.45 kn; slip 6.2 % at 22 kn (computed from the formula)', () => {
    const check = checkPropellerSpeed({
      engineRpm: 3000,
      gearRatio: 2,
      pitchIn: 19,
      measuredKn: 22,
    });
    expect(check.pitchSpeedKn).toBeCloseTo(23.45, 2);
    expect(check.slip).toBeCloseTo(0.062, 3);
  });

  it('mph and knots agree through the unit definitions', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 6000, noNaN: true }),
        fc.double({ min: 5, max: 30, noNaN: true }),
        (rpm, pitch) => {
          const check = checkPropellerSpeed({ engineRpm: rpm, gearRatio: 1, pitchIn: pitch });
          expect(check.pitchSpeedMph / check.pitchSpeedKn).toBeCloseTo(1852 / 1609.344, 9); // nautical mile / statute mile
        },
      ),
    );
  });

  it('slip is null without a measured speed, and zero when speed equals pitch speed', () => {
    expect(checkPropellerSpeed({ engineRpm: 3000, gearRatio: 2, pitchIn: 19 }).slip).toBeNull();
    const v = pitchSpeedKn(shaftRpm(3000, 2), 19);
    expect(propellerSlip(v, v)).toBe(0);
  });

  it('refuses slip against zero pitch speed', () => {
    expect(() => propellerSlip(5, 0)).toThrow(RangeError);
  });
});

describe('full-throttle rpm against the rated range', () => {
  // Illustrative inputs, not trade figures; the expected numbers follow from the cited rules.
  const base = {
    ratedRpmMin: 5000,
    ratedRpmMax: 6000,
    pitchIn: 19,
    propulsion: 'outboard' as const,
  };

  it('proportional estimate: 19 in × 5000 / 6000 = 15.83 in (common practice)', () => {
    expect(proportionalPitch(19, 5000, 6000)).toBeCloseTo(15.83, 2);
  });

  it('above range → more pitch, by 150–200 rpm per inch on outboards (common practice)', () => {
    const advice = adviseOnPitch({ ...base, fullThrottleRpm: 6400 });
    expect(advice.verdict).toBe('above-range');
    expect(advice.targetRpm).toBe(5500);
    expect(advice.rpmFromTarget).toBe(900);
    expect(advice.pitchChangeIn.least).toBeCloseTo(4.5, 9); // 900 / 200
    expect(advice.pitchChangeIn.most).toBeCloseTo(6, 9); // 900 / 150
    expect(advice.advice).toBe(
      'The engine over-revs above the rated range (5000–6000 rpm): try about 4.5–6 in more pitch.',
    );
  });

  it('below range → less pitch; inboards about 100 rpm per inch (common practice)', () => {
    const advice = adviseOnPitch({
      ...base,
      propulsion: 'inboard',
      ratedRpmMin: 3400,
      ratedRpmMax: 3600,
      fullThrottleRpm: 3200,
    });
    expect(advice.verdict).toBe('below-range');
    expect(advice.pitchChangeIn).toEqual({ least: -3, most: -3 }); // 300 rpm / 100 per inch
    expect(advice.advice).toBe(
      'The engine cannot reach the rated range (3400–3600 rpm) and is overloaded: try about 3 in less pitch.',
    );
    expect(advice.proportionalPitchIn).toBeCloseTo((19 * 3200) / 3500, 9);
  });

  it('in range → keep the propeller; the range limits themselves count as in range', () => {
    expect(adviseOnPitch({ ...base, fullThrottleRpm: 5000 }).verdict).toBe('in-range');
    expect(adviseOnPitch({ ...base, fullThrottleRpm: 6000 }).verdict).toBe('in-range');
    expect(adviseOnPitch({ ...base, fullThrottleRpm: 5600 }).advice).toBe(
      'Full-throttle rpm is inside the rated range (5000–6000 rpm); keep this propeller.',
    );
  });

  it('schema names an inverted rated range', () => {
    const result = FullThrottleCheckSchema.safeParse({
      ...base,
      ratedRpmMin: 6000,
      ratedRpmMax: 5000,
      fullThrottleRpm: 5500,
    });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['ratedRpmMax'],
      message: 'The highest rated rpm (ratedRpmMax) must be above the lowest (ratedRpmMin).',
    });
  });

  it('schema rejects an unknown drive', () => {
    const result = FullThrottleCheckSchema.safeParse({
      ...base,
      propulsion: 'jet',
      fullThrottleRpm: 5500,
    });
    expect(result.error?.issues[0].path).toEqual(['propulsion']);
  });
});
