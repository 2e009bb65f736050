import { describe, expect, it } from 'vitest';
import { ENGINE_FIELDS, EngineInputSchema } from './engine.schema';

// A rated range of 5000–6000 rpm and a 12-pole coil, as makers print them for four-stroke outboards (common practice).
const valid = {
  vesselId: '6d3a4f8e-2b1c-4e5d-9f7a-0b1c2d3e4f5a',
  position: 'single',
  installation: 'outboard',
  maker: 'Kestrel',
  model: 'K25',
  serialNumber: 'kt-1',
  fuel: 'petrol',
  cycle: 'four-stroke',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  tachSource: 'charging-coil',
  poles: 12,
};
const issues = (input: object) =>
  EngineInputSchema.safeParse(input).error?.issues.map((i) => [i.path.join('.'), i.message]) ?? [];

describe('EngineInputSchema', () => {
  it('fills the optional fields with null and upper-cases the serial', () => {
    const engine = EngineInputSchema.parse(valid);
    expect(engine).toMatchObject({
      serialNumber: 'KT-1',
      ratedPowerKw: null,
      gearRatio: null,
      propPitchIn: null,
      hourMeterAtCommissioning: null,
      commissionedOn: null,
    });
    expect(ENGINE_FIELDS).toHaveLength(20);
  });

  it('wants the rated range low to high and no wider than makers print them (common practice: up to about 1000 rpm)', () => {
    expect(issues({ ...valid, ratedRpmMin: 6000, ratedRpmMax: 6000 })).toEqual([
      ['ratedRpmMax', 'Rated RPM high end must be above the low end.'],
    ]);
    expect(issues({ ...valid, ratedRpmMin: 3000, ratedRpmMax: 5500 })[0][1]).toContain(
      '2500 rpm wide',
    );
    expect(issues({ ...valid, ratedRpmMin: 4000, ratedRpmMax: 6000 })).toEqual([]);
  });

  it('wants an even number of poles (poles come in pairs) and a pulley ratio for a belt-driven alternator', () => {
    expect(issues({ ...valid, poles: 7 })).toEqual([
      ['poles', 'Poles come in pairs: enter an even number.'],
    ]);
    expect(issues({ ...valid, tachSource: 'belt-alternator' })).toEqual([
      ['pulleyRatio', 'A belt-driven alternator needs its pulley ratio.'],
    ]);
    expect(issues({ ...valid, poles: null })).toEqual([
      ['poles', 'Enter the number of poles of the coil or alternator.'],
    ]);
  });

  it('names each field when a number is not a number', () => {
    expect(
      issues({ ...valid, propBlades: Number.NaN, propPitchIn: Number.NaN, ratedPowerKw: -1 }),
    ).toEqual([
      ['ratedPowerKw', 'Rated power must be above 0.'],
      ['propBlades', 'Propeller blades must be a number.'],
      ['propPitchIn', 'Propeller pitch must be a number.'],
    ]);
  });
});
