import { describe, expect, it } from 'vitest';
import { BUILT_IN_PROGRAM_KEYS, BUILT_IN_PROGRAMS } from './built-in-programs';
import { ProgramSchema } from './program.schema';
import { checkProgramForEngine } from './resolve-band';
import { throttleAboveCeiling } from './throttle';

const totalHours = (key: keyof typeof BUILT_IN_PROGRAMS) =>
  BUILT_IN_PROGRAMS[key].phases.reduce((sum, p) => sum + p.requiredMinutes, 0) / 60;

describe('built-in programs', () => {
  it('has stable keys', () => {
    expect(Object.keys(BUILT_IN_PROGRAMS)).toEqual([...BUILT_IN_PROGRAM_KEYS]);
    expect(BUILT_IN_PROGRAM_KEYS).toEqual([
      'four-stroke-outboard',
      'two-stroke-outboard',
      'small-inboard-diesel',
    ]);
  });

  it.each(BUILT_IN_PROGRAM_KEYS)(
    '%s is valid, says common practice and puts the manual first',
    (key) => {
      const program = BUILT_IN_PROGRAMS[key];
      expect(ProgramSchema.parse(program)).toEqual(program);
      expect(program.source).toMatch(/^Common practice/);
      expect(program.source).toContain('The maker\u2019s manual for your engine comes first');
    },
  );

  it.each(BUILT_IN_PROGRAM_KEYS)(
    '%s: first service 20 h or 1 month (common practice; BoatUS "Long Life – Outboard Maintenance")',
    (key) => {
      expect(BUILT_IN_PROGRAMS[key].firstService).toEqual({ hours: 20, months: 1 });
    },
  );

  it.each(BUILT_IN_PROGRAM_KEYS)('%s: the first phase is the workshop at idle', (key) => {
    const [first, ...rest] = BUILT_IN_PROGRAMS[key].phases;
    expect(first.performedBy).toBe('workshop');
    expect(first.throttleCeiling).toBe('idle');
    expect(rest.every((p) => p.performedBy === 'skipper')).toBe(true);
  });

  it.each(BUILT_IN_PROGRAM_KEYS)('%s: bands fit any engine (shares of rated rpm)', (key) => {
    expect(
      checkProgramForEngine(BUILT_IN_PROGRAMS[key], { ratedRpmMin: 2800, ratedRpmMax: 3000 }),
    ).toEqual({ ok: true });
  });

  it('four-stroke outboard: about 10 h, below half then below three-quarter (common practice)', () => {
    expect(totalHours('four-stroke-outboard')).toBe(10);
    const ceilings = BUILT_IN_PROGRAMS['four-stroke-outboard'].phases.map((p) => p.throttleCeiling);
    expect(ceilings).toEqual(['idle', 'half', 'three-quarter']);
    const last = BUILT_IN_PROGRAMS['four-stroke-outboard'].phases[2];
    expect(last.rules.fullThrottleMaxSeconds).toBeDefined();
    expect(last.rules.changeSpeedEveryMinutes).toBeDefined();
    expect(last.rules.idleMaxMinutes).toBeDefined();
  });

  it('two-stroke outboard carries the richer premix note, which varies by engine (common practice)', () => {
    const program = BUILT_IN_PROGRAMS['two-stroke-outboard'];
    expect(program.notes).toContain('25:1 instead of 50:1');
    expect(program.notes).toContain('varies by engine');
  });

  it('small inboard diesel: 20 h at 50–75 % load, full power ≤ 5 min, no long idling (common practice)', () => {
    const program = BUILT_IN_PROGRAMS['small-inboard-diesel'];
    expect(totalHours('small-inboard-diesel')).toBeGreaterThanOrEqual(20);
    const loaded = program.phases[1];
    expect(loaded.rules.fullThrottleMaxSeconds).toBe(300);
    expect(loaded.rules.idleMaxMinutes).toBeDefined();
    // 50–75 % load through the propeller law (power ∝ rpm³; common practice, from memory).
    expect(loaded.band).toMatchObject({ kind: 'share-of-rated' });
    if (loaded.band.kind === 'share-of-rated') {
      expect(loaded.band.shareMin ** 3).toBeCloseTo(0.5, 12);
      expect(loaded.band.shareMax ** 3).toBeCloseTo(0.75, 12);
    }
    expect(program.phases.map((p) => p.instructions).join(' ')).toContain(
      'glazes the cylinder walls',
    );
  });
});

describe('throttle ceiling', () => {
  it('ranks positions against ceilings', () => {
    expect(throttleAboveCeiling('quarter', 'idle')).toBe(true);
    expect(throttleAboveCeiling('half', 'half')).toBe(false);
    expect(throttleAboveCeiling('three-quarter', 'half')).toBe(true);
    expect(throttleAboveCeiling('full', 'three-quarter')).toBe(true);
    expect(throttleAboveCeiling('full', 'varied')).toBe(false);
    expect(throttleAboveCeiling('full', 'full')).toBe(false);
  });
});
