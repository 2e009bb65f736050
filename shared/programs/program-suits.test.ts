import { describe, expect, it } from 'vitest';
import { programSuits, suitingFirst, type SuitableEngine } from './program-suits';
import type { EngineKind } from './program.schema';

// Engine kinds as the trade names them (common practice): outboards are mostly petrol four- or
// two-strokes, small inboards mostly diesels, sterndrives mostly petrol.
const fourStrokeOutboard: SuitableEngine = {
  installation: 'outboard',
  fuel: 'petrol',
  cycle: 'four-stroke',
};
const twoStrokeOutboard: SuitableEngine = { ...fourStrokeOutboard, cycle: 'two-stroke' };
const inboardDiesel: SuitableEngine = {
  installation: 'inboard',
  fuel: 'diesel',
  cycle: 'four-stroke',
};
const program = (engineKind: EngineKind, name: string = engineKind) => ({
  name,
  suits: { engineKind },
});

describe('programSuits', () => {
  it('suits the engine its kind names', () => {
    expect(programSuits(program('outboard-4-stroke'), fourStrokeOutboard)).toEqual({ suits: true });
    expect(programSuits(program('outboard-2-stroke'), twoStrokeOutboard)).toEqual({ suits: true });
    expect(programSuits(program('inboard-diesel'), inboardDiesel)).toEqual({ suits: true });
    expect(
      programSuits(program('sterndrive-petrol'), {
        ...fourStrokeOutboard,
        installation: 'sterndrive',
      }),
    ).toEqual({ suits: true });
  });

  it('says "any engine" suits every engine', () => {
    for (const engine of [fourStrokeOutboard, twoStrokeOutboard, inboardDiesel])
      expect(programSuits(program('any'), engine).suits).toBe(true);
  });

  it('names the cycle when a four-stroke program meets a two-stroke outboard', () => {
    expect(programSuits(program('outboard-4-stroke'), twoStrokeOutboard)).toEqual({
      suits: false,
      reasons: ['It is for four-stroke engines; this one is two-stroke.'],
    });
  });

  it('names every way an outboard program misses an inboard diesel', () => {
    expect(programSuits(program('outboard-2-stroke'), inboardDiesel)).toEqual({
      suits: false,
      reasons: [
        'It is for outboard engines; this one is inboard (shaft).',
        'It is for two-stroke engines; this one is four-stroke.',
      ],
    });
    expect(programSuits(program('sterndrive-petrol'), inboardDiesel)).toEqual({
      suits: false,
      reasons: [
        'It is for sterndrive engines; this one is inboard (shaft).',
        'It is for petrol engines; this one runs on diesel.',
      ],
    });
  });

  it('leaves open what a kind does not name: a two-stroke inboard diesel suits "inboard diesel"', () => {
    // Two-stroke marine diesels exist (from memory: older large-bore workboat engines).
    expect(
      programSuits(program('inboard-diesel'), { ...inboardDiesel, cycle: 'two-stroke' }),
    ).toEqual({ suits: true });
  });
});

describe('suitingFirst', () => {
  it('puts suiting programs first and keeps the order within each group', () => {
    const list = [
      program('inboard-diesel', 'Diesel A'),
      program('outboard-4-stroke', 'Outboard A'),
      program('outboard-2-stroke', 'Two-stroke A'),
      program('any', 'General'),
      program('outboard-4-stroke', 'Outboard B'),
    ];
    const ordered = suitingFirst(list, fourStrokeOutboard);
    expect(ordered.map((j) => j.program.name)).toEqual([
      'Outboard A',
      'General',
      'Outboard B',
      'Diesel A',
      'Two-stroke A',
    ]);
    expect(ordered.map((j) => j.suitability.suits)).toEqual([true, true, true, false, false]);
  });
});
