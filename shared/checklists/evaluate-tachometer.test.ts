import { describe, expect, it } from 'vitest';
import { ChecklistInputSchema, type TachometerEntry } from './checklist.schema';
import { evaluateTachometer, TACH_TOLERANCE } from './evaluate-tachometer';
import type { ChecklistEngine } from './evaluation';

const entry = (values: Partial<TachometerEntry>): TachometerEntry =>
  ChecklistInputSchema.parse({ tachometer: values }).tachometer;

const base: ChecklistEngine = {
  installation: 'outboard',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2,
  propPitchIn: 19,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
};
// Belt-driven alternator, 12 poles, pulley ratio 2.5 (alternator tachometer-signal application notes, common practice).
const belted: ChecklistEngine = {
  ...base,
  installation: 'inboard',
  tachSource: 'belt-alternator',
  poles: 12,
  pulleyRatio: 2.5,
};

describe('tachometer calibration', () => {
  it('uses a ±3 % tolerance (common practice)', () => {
    expect(TACH_TOLERANCE).toBe(0.03);
  });

  it('passes a tachometer within the tolerance of the speed from the coil frequency', () => {
    // 12-pole charging coil: rpm = 10 × Hz, 300 Hz → 3000 rpm (common practice, no single source).
    const result = evaluateTachometer(entry({ measuredHz: 300, tachReadingRpm: 3050 }), base);
    expect(result.verdict).toBe('pass');
    expect(result.figures).toContainEqual({
      label: 'True engine speed (from 300 Hz)',
      value: '3000 rpm',
    });
    expect(result.figures).toContainEqual({ label: 'Tachometer error', value: '+1.7 %' });
  });

  it('fails a tachometer 5 % high and says by how much', () => {
    // 300 Hz on a 12-pole coil is 3000 rpm (common practice); 3150 is 5 % over.
    const result = evaluateTachometer(entry({ measuredHz: 300, tachReadingRpm: 3150 }), base);
    expect(result.verdict).toBe('fail');
    expect(result.reasons[0]).toBe(
      'The tachometer reads +5.0 % off the true speed; it should be within ±3 %.',
    );
  });

  it('spots a dial set in the wrong convention and gives both settings', () => {
    // 12-pole coil at 3000 rpm gives 300 Hz; a poles dial takes 12, a pulses-per-rev dial 6 (common practice).
    const result = evaluateTachometer(entry({ measuredHz: 300, tachReadingRpm: 6000 }), base);
    expect(result.verdict).toBe('fail');
    expect(result.reasons[1]).toContain('about double');
    expect(result.reasons[1]).toContain(
      'set 12 on a dial labelled in poles, or 6 on one labelled in pulses per revolution',
    );
  });

  it('works through a belt-driven alternator', () => {
    // 12 poles, ratio 2.5: 250 Hz at 1000 engine rpm (alternator application notes, common practice).
    const result = evaluateTachometer(entry({ measuredHz: 250, tachReadingRpm: 1020 }), belted);
    expect(result.verdict).toBe('pass');
    expect(result.figures[0].value).toBe('1000 rpm');
  });

  it('cannot turn a frequency into RPM without a coil or alternator on the engine record', () => {
    const result = evaluateTachometer(entry({ measuredHz: 300, tachReadingRpm: 3000 }), {
      ...base,
      tachSource: 'ignition',
      poles: null,
    });
    expect(result.verdict).toBe('open');
    expect(result.reasons[0]).toContain('hand-held tachometer');
  });

  it('accepts a hand-held tachometer reading as the true speed', () => {
    // The hand-held and helm readings are the technician's own; 50 rpm in 3000 is 1.7 %, inside ±3 % (common practice).
    const result = evaluateTachometer(entry({ referenceRpm: 3000, tachReadingRpm: 2950 }), {
      ...base,
      tachSource: 'none',
      poles: null,
    });
    expect(result.verdict).toBe('pass');
    expect(result.figures[0].label).toBe('True engine speed (by hand-held tachometer)');
  });

  it('stays open until both readings are there, and asks for a reason when not applicable', () => {
    expect(evaluateTachometer(entry({ measuredHz: 300 }), base).reasons[0]).toBe(
      'Enter what the helm tachometer showed at the same moment.',
    );
    expect(evaluateTachometer(entry({ tachReadingRpm: 3000 }), base).verdict).toBe('open');
    expect(evaluateTachometer(entry({ notApplicable: true }), base).reasons[0]).toBe(
      'Marked not applicable: say why in the note.',
    );
    expect(
      evaluateTachometer(
        entry({ notApplicable: true, note: 'Tiller engine, no tachometer fitted' }),
        base,
      ).verdict,
    ).toBe('not-applicable');
  });
});
