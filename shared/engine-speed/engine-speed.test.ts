import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  engineRpmFromAlternatorRpm,
  engineRpmFromFrequency,
  expectedFrequencyAtEngineRpm,
  frequencyAtRpm,
  polePairs,
  pulsesPerEngineRev,
  rpmFromFrequency,
  tachDialSetting,
  tachReadingRpm,
} from './engine-speed';
import { SignalSourceSchema, TachSetupSchema, type SignalSource } from './signal-source.schema';

// Standard synchronous-speed tables, n = 120 f / P (S. J. Chapman, Electric Machinery
// Fundamentals, 5th ed., McGraw-Hill 2012, from memory).
const SYNCHRONOUS_50_HZ = [
  [2, 3000],
  [4, 1500],
  [6, 1000],
  [8, 750],
  [10, 600],
  [12, 500],
] as const;
const SYNCHRONOUS_60_HZ = [
  [2, 3600],
  [4, 1800],
  [6, 1200],
  [8, 900],
  [10, 720],
  [12, 600],
] as const;

const coil12: SignalSource = { kind: 'charging-coil', poles: 12 };
// Alternator tachometer-signal application notes (common practice): 12 poles, pulley ratio 2.5.
const beltedAlternator: SignalSource = { kind: 'belt-alternator', poles: 12, pulleyRatio: 2.5 };

describe('rpm from AC frequency', () => {
  it('pole pairs are half the poles', () => {
    expect(polePairs(12)).toBe(6);
  });

  it.each(SYNCHRONOUS_50_HZ)('50 Hz, %i poles → %i rpm (Chapman, from memory)', (poles, rpm) => {
    expect(rpmFromFrequency(50, poles)).toBeCloseTo(rpm, 9);
    expect(frequencyAtRpm(rpm, poles)).toBeCloseTo(50, 9);
  });

  it.each(SYNCHRONOUS_60_HZ)('60 Hz, %i poles → %i rpm (Chapman, from memory)', (poles, rpm) => {
    expect(rpmFromFrequency(60, poles)).toBeCloseTo(rpm, 9);
    expect(frequencyAtRpm(rpm, poles)).toBeCloseTo(60, 9);
  });

  it('12-pole charging coil reads 10 × Hz (common practice, no single source)', () => {
    expect(engineRpmFromFrequency(120, coil12)).toBeCloseTo(1200, 9);
    expect(engineRpmFromFrequency(300, coil12)).toBeCloseTo(3000, 9);
  });

  it('frequency and rpm are inverses for any source', () => {
    const source = fc.oneof(
      fc.record({
        kind: fc.constant('charging-coil' as const),
        poles: fc.integer({ min: 1, max: 24 }).map((n) => n * 2),
      }),
      fc.record({
        kind: fc.constant('belt-alternator' as const),
        poles: fc.integer({ min: 1, max: 12 }).map((n) => n * 2),
        pulleyRatio: fc.double({ min: 0.5, max: 4, noNaN: true }),
      }),
    );
    fc.assert(
      fc.property(source, fc.double({ min: 100, max: 8000, noNaN: true }), (src, rpm) => {
        const hz = expectedFrequencyAtEngineRpm(rpm, src);
        expect(engineRpmFromFrequency(hz, src)).toBeCloseTo(rpm, 6);
      }),
    );
  });
});

describe('belt-driven alternator (application notes, common practice)', () => {
  it('engine rpm is alternator rpm over the pulley ratio', () => {
    expect(engineRpmFromAlternatorRpm(2500, 2.5)).toBe(1000);
  });

  it('12 poles at ratio 2.5 gives 15 pulses per engine revolution', () => {
    expect(pulsesPerEngineRev(beltedAlternator)).toBeCloseTo(15, 12);
  });

  it('250 Hz at 1000 engine rpm, and back', () => {
    expect(expectedFrequencyAtEngineRpm(1000, beltedAlternator)).toBeCloseTo(250, 9);
    expect(engineRpmFromFrequency(250, beltedAlternator)).toBeCloseTo(1000, 9);
  });
});

describe('tachometer convention (common practice: poles on some units, pulses per rev on others)', () => {
  it('a 12-pole coil dials 12 on a poles tachometer and 6 on a pulses-per-rev one', () => {
    expect(tachDialSetting(coil12, 'poles')).toBe(12);
    expect(tachDialSetting(coil12, 'pulses-per-rev')).toBe(6);
  });

  it('a full-wave signal doubles the count on both labels', () => {
    expect(tachDialSetting(coil12, 'poles', 'full-wave')).toBe(24);
    expect(tachDialSetting(coil12, 'pulses-per-rev', 'full-wave')).toBe(12);
    expect(pulsesPerEngineRev(coil12, 'full-wave')).toBe(12);
  });

  it('the belted alternator dials 30 poles or 15 pulses per rev', () => {
    expect(tachDialSetting(beltedAlternator, 'poles')).toBeCloseTo(30, 12);
    expect(tachDialSetting(beltedAlternator, 'pulses-per-rev')).toBeCloseTo(15, 12);
  });

  it.each(['poles', 'pulses-per-rev'] as const)(
    'a correctly set %s tachometer shows engine rpm',
    (convention) => {
      for (const wave of ['half-wave', 'full-wave'] as const) {
        const pulseHz =
          expectedFrequencyAtEngineRpm(1000, beltedAlternator) * (wave === 'full-wave' ? 2 : 1);
        const dial = tachDialSetting(beltedAlternator, convention, wave);
        expect(tachReadingRpm(pulseHz, convention, dial)).toBeCloseTo(1000, 9);
      }
    },
  );

  it('mixing up the labels shows half or double the true rpm', () => {
    // 12-pole coil at 3000 rpm gives 300 Hz (common practice, no single source).
    expect(tachReadingRpm(300, 'pulses-per-rev', 12)).toBeCloseTo(1500, 9);
    expect(tachReadingRpm(300, 'poles', 6)).toBeCloseTo(6000, 9);
  });
});

describe('SignalSourceSchema', () => {
  const messageAt = (input: unknown) => {
    const result = SignalSourceSchema.safeParse(input);
    const issue = result.error?.issues[0];
    return { path: issue?.path.join('.'), message: issue?.message };
  };

  it('accepts a coil and a belted alternator', () => {
    expect(SignalSourceSchema.parse(coil12)).toEqual(coil12);
    expect(SignalSourceSchema.parse(beltedAlternator)).toEqual(beltedAlternator);
  });

  it('rejects odd poles, naming the field', () => {
    expect(messageAt({ kind: 'charging-coil', poles: 7 })).toEqual({
      path: 'poles',
      message: 'The number of poles (poles) must be even: poles come in pairs.',
    });
  });

  it('rejects zero or negative poles', () => {
    expect(messageAt({ kind: 'charging-coil', poles: 0 }).message).toBe(
      'The number of poles (poles) must be more than zero.',
    );
    expect(messageAt({ kind: 'charging-coil', poles: -4 }).path).toBe('poles');
  });

  it('rejects a zero pulley ratio and a missing one', () => {
    expect(messageAt({ kind: 'belt-alternator', poles: 12, pulleyRatio: 0 })).toEqual({
      path: 'pulleyRatio',
      message: 'The pulley ratio (pulleyRatio) must be more than zero.',
    });
    expect(messageAt({ kind: 'belt-alternator', poles: 12 }).path).toBe('pulleyRatio');
  });

  it('rejects an unknown source kind', () => {
    expect(messageAt({ kind: 'magneto', poles: 2 }).message).toBe(
      'The signal source (kind) must be "charging-coil" or "belt-alternator".',
    );
  });

  it('defaults the tachometer wave to half-wave and names a bad convention', () => {
    expect(TachSetupSchema.parse({ source: coil12, convention: 'poles' }).wave).toBe('half-wave');
    const bad = TachSetupSchema.safeParse({ source: coil12, convention: 'ppr' });
    expect(bad.error?.issues[0].path).toEqual(['convention']);
  });
});
