import { describe, expect, it } from 'vitest';
import { ReadingSchema, RunEventSchema } from './run-event.schema';

const valid = {
  kind: 'reading',
  id: '6f1c7a3e-5b2d-4c1e-9a7b-2d3e4f5a6b7c',
  at: 1_746_867_600_000,
  engineId: 'engine-port',
  phaseId: 'below-half',
  rpm: 2800,
  throttle: 'half',
};

function firstIssue(input: unknown) {
  const issue = RunEventSchema.safeParse(input).error?.issues[0];
  return { field: issue?.path.join('.'), message: issue?.message };
}

describe('run event schemas', () => {
  it('accept a reading and the session and phase events', () => {
    expect(ReadingSchema.parse(valid)).toEqual(valid);
    const base = { id: valid.id, at: valid.at, engineId: valid.engineId };
    expect(RunEventSchema.parse({ ...base, kind: 'session-start' })).toEqual({
      ...base,
      kind: 'session-start',
    });
    expect(RunEventSchema.parse({ ...base, kind: 'session-stop' }).kind).toBe('session-stop');
    expect(
      RunEventSchema.parse({ ...base, kind: 'phase-advance', phaseId: 'below-half' }).kind,
    ).toBe('phase-advance');
  });

  it('reject negative rpm and rpm above 20000, naming the field', () => {
    expect(firstIssue({ ...valid, rpm: -1 })).toEqual({
      field: 'rpm',
      message: 'The engine speed (rpm) cannot be negative.',
    });
    expect(firstIssue({ ...valid, rpm: 20_001 })).toEqual({
      field: 'rpm',
      message: 'The engine speed (rpm) must be at most 20000 rpm.',
    });
    expect(ReadingSchema.safeParse({ ...valid, rpm: 20_000 }).success).toBe(true);
    expect(ReadingSchema.safeParse({ ...valid, rpm: 0 }).success).toBe(true);
  });

  it('reject an unknown throttle position', () => {
    expect(firstIssue({ ...valid, throttle: 'flank' })).toEqual({
      field: 'throttle',
      message:
        'The throttle position (throttle) must be one of idle, quarter, half, three-quarter or full.',
    });
  });

  it('reject an id that is not a UUID, and a fractional time', () => {
    expect(firstIssue({ ...valid, id: 'abc' }).field).toBe('id');
    expect(firstIssue({ ...valid, at: 1.5 })).toEqual({
      field: 'at',
      message: 'The event time (at) must be whole milliseconds.',
    });
  });

  it('reject a negative speed over ground', () => {
    expect(firstIssue({ ...valid, speedKn: -2 })).toEqual({
      field: 'speedKn',
      message: 'The speed over ground (speedKn) cannot be negative.',
    });
  });

  it('need the frequency when the rpm comes from one', () => {
    expect(firstIssue({ ...valid, rpmSource: 'frequency' })).toEqual({
      field: 'frequencyHz',
      message: 'Enter the measured frequency (frequencyHz) when the rpm comes from a frequency.',
    });
    expect(
      ReadingSchema.safeParse({ ...valid, rpmSource: 'frequency', frequencyHz: 280 }).success,
    ).toBe(true);
  });

  it('word a field without its own message in zod\'s English, not a bare "Invalid input"', () => {
    expect(firstIssue({ ...valid, lat: 'north' })).toEqual({
      field: 'lat',
      message: 'Invalid input: expected number, received string',
    });
  });

  it('reject an unknown event kind', () => {
    expect(firstIssue({ ...valid, kind: 'anchor-drop' })).toEqual({
      field: 'kind',
      message:
        'The event kind (kind) must be session-start, session-stop, reading, phase-advance, alert, note or void.',
    });
  });
});
