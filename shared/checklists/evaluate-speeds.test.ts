import { describe, expect, it } from 'vitest';
import { ChecklistInputSchema, type FullThrottleEntry, type IdleEntry } from './checklist.schema';
import { evaluateFullThrottle, evaluateIdle } from './evaluate-speeds';
import type { ChecklistEngine } from './evaluation';

const idle = (values: Partial<IdleEntry>): IdleEntry =>
  ChecklistInputSchema.parse({ idleInGear: values }).idleInGear;
const wot = (values: Partial<FullThrottleEntry>): FullThrottleEntry =>
  ChecklistInputSchema.parse({ fullThrottle: values }).fullThrottle;

// A rated full-throttle range of 5000–6000 rpm, as makers print it for four-stroke outboards (common practice).
const outboard: ChecklistEngine = {
  installation: 'outboard',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2,
  propPitchIn: 21,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
};

describe('idle RPM in gear', () => {
  // The idle range is whatever the maker's manual gives; 650–750 rpm here is a technician's typed
  // figure for the test, not a trade value: the check is only a comparison with it.
  const spec = { specMinRpm: 650, specMaxRpm: 750 };

  it('passes inside the maker’s range and fails outside it, naming the range', () => {
    expect(evaluateIdle(idle({ ...spec, idleRpm: 700 })).verdict).toBe('pass');
    const low = evaluateIdle(idle({ ...spec, idleRpm: 600 }));
    expect(low.verdict).toBe('fail');
    expect(low.reasons[0]).toBe(
      "Idle in gear is 600 rpm, below the maker's 650–750 rpm: the engine may stall when shifted or at the dock.",
    );
    expect(evaluateIdle(idle({ ...spec, idleRpm: 800 })).reasons[0]).toContain('above');
  });

  it('asks for the maker’s range before judging', () => {
    expect(evaluateIdle(idle({ idleRpm: 700 })).reasons[0]).toContain("maker's idle RPM range");
  });

  it('refuses a maker’s range that runs backwards, naming the field', () => {
    const result = ChecklistInputSchema.safeParse({
      idleInGear: { specMinRpm: 750, specMaxRpm: 650 },
    });
    expect(result.error?.issues[0].path).toEqual(['idleInGear', 'specMaxRpm']);
  });
});

describe('full-throttle RPM', () => {
  it('passes inside the rated range and gives pitch speed and slip', () => {
    // 5500 rpm, gear 2:1, pitch 21 in → 47.52 kn; slip 15.8 % at 40 kn (REFERENCES, computed from 1215.2231).
    const result = evaluateFullThrottle(wot({ rpm: 5500, speedKn: 40 }), outboard);
    expect(result.verdict).toBe('pass');
    expect(result.figures).toContainEqual({ label: 'Pitch speed', value: '47.5 kn' });
    expect(result.figures).toContainEqual({ label: 'Propeller slip', value: '15.8 %' });
    expect(result.reasons[0]).toContain('keep this propeller');
  });

  it('advises more pitch when the engine over-revs', () => {
    // 900 rpm over the middle (5500): 150–200 rpm per inch on outboards → 4.5–6 in more (propeller-shop guides, common practice).
    const result = evaluateFullThrottle(wot({ rpm: 6400 }), { ...outboard, propPitchIn: 19 });
    expect(result.verdict).toBe('fail');
    expect(result.reasons[0]).toBe(
      'The engine over-revs above the rated range (5000–6000 rpm): try about 4.5–6 in more pitch.',
    );
  });

  it('advises less pitch when the engine cannot reach the range, with the proportional estimate', () => {
    // new pitch ≈ 19 in × 5000 / 6000 = 15.83 in (common practice); the middle of 5500–6500 is 6000.
    const result = evaluateFullThrottle(wot({ rpm: 5000 }), {
      ...outboard,
      ratedRpmMin: 5500,
      ratedRpmMax: 6500,
      propPitchIn: 19,
    });
    expect(result.verdict).toBe('fail');
    expect(result.reasons[0]).toContain('less pitch');
    expect(result.figures).toContainEqual({ label: 'Pitch by proportion', value: '15.8 in' });
  });

  it('uses about 100 rpm per inch on inboards, and slip from the shaft speed', () => {
    // 3000 rpm, gear 2:1, pitch 19 in → 23.45 kn; slip 6.2 % at 22 kn (REFERENCES, computed).
    // Inboards: about 100 rpm per inch (common practice): 500 rpm under a 3500 middle → about 5 in less.
    const inboard: ChecklistEngine = {
      ...outboard,
      installation: 'inboard',
      ratedRpmMin: 3400,
      ratedRpmMax: 3600,
      propPitchIn: 19,
    };
    const result = evaluateFullThrottle(wot({ rpm: 3000, speedKn: 22 }), inboard);
    expect(result.reasons[0]).toBe(
      'The engine cannot reach the rated range (3400–3600 rpm) and is overloaded: try about 5 in less pitch.',
    );
    expect(result.figures).toContainEqual({ label: 'Propeller slip', value: '6.2 %' });
  });

  it('judges the range alone when the engine record has no pitch', () => {
    const result = evaluateFullThrottle(wot({ rpm: 6100 }), { ...outboard, propPitchIn: null });
    expect(result.verdict).toBe('fail');
    expect(result.reasons).toEqual([
      'Full throttle is 6100 rpm, above the rated range (5000–6000 rpm).',
      'Add the propeller pitch to the engine record to get pitch advice.',
    ]);
  });
});
