import { describe, expect, it } from 'vitest';
import {
  checkProgramForEngine,
  EngineRatingSchema,
  resolvePhaseBand,
  resolveProgramPhases,
} from './resolve-band';
import type { Phase } from './program.schema';

// Illustrative engine rating; the expectations are arithmetic.
const engine = { ratedRpmMin: 5000, ratedRpmMax: 6000 };

const phase = (band: Phase['band'], name = 'A phase'): Phase => ({
  id: name,
  name,
  performedBy: 'skipper',
  requiredMinutes: 60,
  throttleCeiling: 'half',
  band,
  rules: {},
  instructions: 'Words.',
});

describe('resolvePhaseBand', () => {
  it('keeps an absolute band', () => {
    expect(
      resolvePhaseBand(phase({ kind: 'absolute', rpmMin: 800, rpmMax: 3000 }), engine),
    ).toEqual({ rpmMin: 800, rpmMax: 3000 });
  });

  it('takes a share of the top of the rated range', () => {
    expect(
      resolvePhaseBand(phase({ kind: 'share-of-rated', shareMin: 0.25, shareMax: 0.75 }), engine),
    ).toEqual({
      rpmMin: 1500,
      rpmMax: 4500,
    });
  });

  it('rounds to whole rpm', () => {
    expect(
      resolvePhaseBand(phase({ kind: 'share-of-rated', shareMin: 0, shareMax: Math.cbrt(0.5) }), {
        ratedRpmMin: 3200,
        ratedRpmMax: 3600,
      }),
    ).toEqual({
      rpmMin: 0,
      rpmMax: 2857,
    });
  });

  it('resolves a program into phases in rpm and milliseconds', () => {
    const [resolved] = resolveProgramPhases(
      { phases: [phase({ kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 })] },
      engine,
    );
    expect(resolved.band).toEqual({ rpmMin: 0, rpmMax: 3000 });
    expect(resolved.requiredMs).toBe(3_600_000);
    expect(resolved).not.toHaveProperty('requiredMinutes');
  });
});

describe('checkProgramForEngine', () => {
  it('accepts bands inside the rating', () => {
    const program = {
      phases: [
        phase({ kind: 'absolute', rpmMin: 0, rpmMax: 6000 }),
        phase({ kind: 'share-of-rated', shareMin: 0, shareMax: 1 }),
      ],
    };
    expect(checkProgramForEngine(program, engine)).toEqual({ ok: true });
  });

  it('rejects a ceiling above the rated max, naming phases.N.band.rpmMax', () => {
    const program = {
      phases: [
        phase({ kind: 'absolute', rpmMin: 0, rpmMax: 3000 }, 'Low'),
        phase({ kind: 'absolute', rpmMin: 3000, rpmMax: 6500 }, 'Bursts'),
      ],
    };
    expect(checkProgramForEngine(program, engine)).toEqual({
      ok: false,
      issues: [
        {
          field: 'phases.1.band.rpmMax',
          message:
            'Phase 2 ("Bursts") allows up to 6500 rpm (rpmMax), above this engine\'s rated maximum of 6000 rpm.',
        },
      ],
    });
  });
});

describe('EngineRatingSchema', () => {
  it('rejects an inverted rated range, naming ratedRpmMax', () => {
    const result = EngineRatingSchema.safeParse({ ratedRpmMin: 6000, ratedRpmMax: 5000 });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['ratedRpmMax'],
      message:
        'The highest rated full-throttle rpm (ratedRpmMax) must be above the lowest (ratedRpmMin).',
    });
  });
});
