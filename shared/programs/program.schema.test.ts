import { describe, expect, it } from 'vitest';
import { ProgramSchema, PhaseSchema, type ProgramInput } from './program.schema';
import { PhaseBandSchema } from './phase-band.schema';

// Illustrative program used only to exercise validation; not a break-in recommendation.
const phase = (overrides: Record<string, unknown> = {}) => ({
  id: 'p1',
  name: 'Warm-up',
  performedBy: 'workshop',
  requiredMinutes: 10,
  throttleCeiling: 'idle',
  band: { kind: 'absolute', rpmMin: 600, rpmMax: 1500 },
  instructions: 'Run at idle.',
  ...overrides,
});

const program = (overrides: Partial<Record<keyof ProgramInput, unknown>> = {}) => ({
  name: 'Test program',
  suits: { engineKind: 'any' },
  phases: [phase(), phase({ id: 'p2', name: 'Second' }), phase({ id: 'p3', name: 'Third' })],
  firstService: { hours: 20 },
  source: 'common practice',
  ...overrides,
});

function firstIssue(input: unknown) {
  const result = ProgramSchema.safeParse(input);
  expect(result.success).toBe(false);
  const issue = result.error!.issues[0];
  return { field: issue.path.join('.'), message: issue.message };
}

describe('ProgramSchema', () => {
  it('accepts a valid program and fills defaults', () => {
    const parsed = ProgramSchema.parse(program());
    expect(parsed.notes).toBe('');
    expect(parsed.suits.label).toBe('');
    expect(parsed.phases[0].rules).toEqual({});
  });

  it('rejects an inverted band, naming phases.N.band.rpmMax', () => {
    const phases = [
      phase(),
      phase({ id: 'p2' }),
      phase({ id: 'p3', band: { kind: 'absolute', rpmMin: 3000, rpmMax: 2000 } }),
    ];
    expect(firstIssue(program({ phases }))).toEqual({
      field: 'phases.2.band.rpmMax',
      message: 'The highest rpm of the band (rpmMax) must be above its lowest rpm (rpmMin).',
    });
  });

  it('rejects a band whose limits meet (min = max)', () => {
    const phases = [phase({ band: { kind: 'absolute', rpmMin: 2000, rpmMax: 2000 } })];
    expect(firstIssue(program({ phases })).field).toBe('phases.0.band.rpmMax');
  });

  it('rejects a share band outside 0..1 and an inverted share band', () => {
    const above = [phase({ band: { kind: 'share-of-rated', shareMin: 0.5, shareMax: 1.2 } })];
    expect(firstIssue(program({ phases: above }))).toEqual({
      field: 'phases.0.band.shareMax',
      message:
        'The highest share of the band (shareMax) must be a share from 0 to 1; it is above 1.',
    });
    const inverted = [phase({ band: { kind: 'share-of-rated', shareMin: 0.75, shareMax: 0.5 } })];
    expect(firstIssue(program({ phases: inverted })).field).toBe('phases.0.band.shareMax');
    const negative = [phase({ band: { kind: 'share-of-rated', shareMin: -0.1, shareMax: 0.5 } })];
    expect(firstIssue(program({ phases: negative })).field).toBe('phases.0.band.shareMin');
  });

  it('allows bands of different phases to overlap', () => {
    const phases = [
      phase({ band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.5 } }),
      phase({ id: 'p2', band: { kind: 'share-of-rated', shareMin: 0, shareMax: 0.75 } }),
    ];
    expect(ProgramSchema.safeParse(program({ phases })).success).toBe(true);
  });

  it('rejects zero and negative durations', () => {
    expect(firstIssue(program({ phases: [phase({ requiredMinutes: 0 })] }))).toEqual({
      field: 'phases.0.requiredMinutes',
      message: 'The required run time in band (requiredMinutes) must be more than zero minutes.',
    });
    expect(firstIssue(program({ phases: [phase({ requiredMinutes: -5 })] })).field).toBe(
      'phases.0.requiredMinutes',
    );
    const rules = { fullThrottleMaxSeconds: 0 };
    expect(firstIssue(program({ phases: [phase({ rules })] })).field).toBe(
      'phases.0.rules.fullThrottleMaxSeconds',
    );
  });

  it('rejects an unknown band unit (kind)', () => {
    const phases = [phase({ band: { kind: 'percent', min: 10, max: 50 } })];
    expect(firstIssue(program({ phases }))).toEqual({
      field: 'phases.0.band.kind',
      message:
        'The band kind (kind) must be "absolute" (rpm) or "share-of-rated" (share of rated full-throttle rpm).',
    });
  });

  it('rejects an unknown throttle ceiling and performer', () => {
    expect(firstIssue(program({ phases: [phase({ throttleCeiling: 'wide-open' })] })).field).toBe(
      'phases.0.throttleCeiling',
    );
    expect(firstIssue(program({ phases: [phase({ performedBy: 'dealer' })] })).field).toBe(
      'phases.0.performedBy',
    );
  });

  it('rejects duplicate phase ids, naming the later one', () => {
    const phases = [phase(), phase({ id: 'p2' }), phase({ id: 'p1' })];
    expect(firstIssue(program({ phases }))).toEqual({
      field: 'phases.2.id',
      message:
        'The phase id (id) "p1" is already used by an earlier phase; each phase needs its own.',
    });
  });

  it('needs 1 to 30 phases', () => {
    expect(firstIssue(program({ phases: [] }))).toEqual({
      field: 'phases',
      message: 'A program needs at least one phase (phases).',
    });
    const many = Array.from({ length: 31 }, (_, i) => phase({ id: `p${i}` }));
    expect(firstIssue(program({ phases: many })).message).toBe(
      'A program can have at most 30 phases (phases).',
    );
  });

  it('needs a first-service interval in hours or months', () => {
    expect(firstIssue(program({ firstService: {} }))).toEqual({
      field: 'firstService',
      message: 'Give the service interval in engine hours, in months, or both.',
    });
  });

  it('rejects more than 60 minutes of full throttle per hour', () => {
    const rules = { fullThrottleMaxMinutesPerHour: 61 };
    expect(firstIssue(program({ phases: [phase({ rules })] })).field).toBe(
      'phases.0.rules.fullThrottleMaxMinutesPerHour',
    );
  });

  it('rejects an unknown engine kind', () => {
    expect(firstIssue(program({ suits: { engineKind: 'jet-ski' } })).field).toBe(
      'suits.engineKind',
    );
  });

  it('rejects blank names and instructions with a sentence', () => {
    expect(firstIssue(program({ phases: [phase({ instructions: '  ' })] }))).toEqual({
      field: 'phases.0.instructions',
      message: 'Enter the instructions (instructions).',
    });
  });
});

describe('PhaseSchema and PhaseBandSchema alone', () => {
  it('name the field relative to themselves', () => {
    const result = PhaseSchema.safeParse(
      phase({ band: { kind: 'absolute', rpmMin: 5, rpmMax: 30_000 } }),
    );
    expect(result.error?.issues[0].path).toEqual(['band', 'rpmMax']);
    expect(
      PhaseBandSchema.safeParse({ kind: 'absolute', rpmMin: -1, rpmMax: 100 }).error?.issues[0]
        .message,
    ).toBe('The lowest rpm of the band (rpmMin) cannot be negative.');
  });
});
