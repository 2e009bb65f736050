import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { all, create } from 'mathjs';
import {
  convertPower,
  convertSpeed,
  convertTemperature,
  convertVolume,
  knotsToKmh,
  litresToUsGallons,
} from './convert';
import { HORSEPOWER_W, NAUTICAL_MILE_M, STATUTE_MILE_M, US_GALLON_L } from './definitions';
import {
  POWER_UNITS,
  SPEED_UNITS,
  SpeedUnitSchema,
  TEMPERATURE_UNITS,
  UnitPreferencesSchema,
  VOLUME_UNITS,
  VolumeUnitSchema,
} from './units.schema';

// mathjs has no knot or nautical mile built in, so we define them here from the exact
// nautical mile (1852 m: International Hydrographic Conference, Monaco 1929; BIPM SI Brochure
// 8th ed. 2006, Table 8). Its gallon is the US gallon and its hp the mechanical horsepower.
const math = create(all);
math.createUnit('nmi', { definition: '1852 m' });
math.createUnit('kn', { definition: '1 nmi/h' });

const MATHJS_NAME = {
  kn: 'kn',
  'km/h': 'km/h',
  mph: 'mi/h',
  L: 'L',
  'US gal': 'gallon',
  kW: 'kW',
  hp: 'hp',
  '°C': 'degC',
  '°F': 'degF',
} as const;

const RELATIVE_TOLERANCE = 1e-6; // REFERENCES.md: cross-check with relative tolerance 1e-6

function expectClose(actual: number, expected: number) {
  const scale = Math.max(Math.abs(expected), 1e-9);
  expect(Math.abs(actual - expected) / scale).toBeLessThan(RELATIVE_TOLERANCE);
}

const viaMathjs = (value: number, from: keyof typeof MATHJS_NAME, to: keyof typeof MATHJS_NAME) =>
  math.unit(value, MATHJS_NAME[from]).toNumber(MATHJS_NAME[to]);

const sensibleValue = fc
  .double({ min: -1e6, max: 1e6, noNaN: true })
  .filter((v) => Math.abs(v) > 1e-3);

describe('exact definitions', () => {
  it('are the defined values', () => {
    expect(NAUTICAL_MILE_M).toBe(1852); // International Hydrographic Conference, Monaco 1929
    expect(US_GALLON_L).toBe(3.785411784); // NIST Handbook 44, Appendix C
    expect(HORSEPOWER_W).toBeCloseTo(745.69987158227, 10); // 745.69987158227022 W, NIST SP 811 (2008), Appendix B
    expect(STATUTE_MILE_M).toBeCloseTo(1609.344, 9); // 63,360 in × 0.0254 m (Yard and Pound Agreement 1959)
  });

  it('1 knot is 1.852 km/h exactly', () => {
    expect(knotsToKmh(1)).toBeCloseTo(1.852, 12); // from the nautical mile, 1852 m
  });

  it('1 US gallon is 3.785411784 L', () => {
    expect(litresToUsGallons(3.785411784)).toBeCloseTo(1, 12); // NIST Handbook 44, Appendix C
  });
});

describe('conversions agree with mathjs', () => {
  const pairs = <U extends string>(units: readonly U[]) =>
    units.flatMap((from) => units.map((to) => [from, to] as const));

  it.each(pairs(SPEED_UNITS))('speed %s → %s', (from, to) => {
    fc.assert(
      fc.property(sensibleValue, (v) =>
        expectClose(convertSpeed(v, from, to), viaMathjs(v, from, to)),
      ),
    );
  });

  it.each(pairs(VOLUME_UNITS))('volume %s → %s', (from, to) => {
    fc.assert(
      fc.property(sensibleValue, (v) =>
        expectClose(convertVolume(v, from, to), viaMathjs(v, from, to)),
      ),
    );
  });

  it.each(pairs(POWER_UNITS))('power %s → %s', (from, to) => {
    fc.assert(
      fc.property(sensibleValue, (v) =>
        expectClose(convertPower(v, from, to), viaMathjs(v, from, to)),
      ),
    );
  });

  it.each(pairs(TEMPERATURE_UNITS))('temperature %s → %s', (from, to) => {
    fc.assert(
      fc.property(fc.double({ min: -200, max: 1000, noNaN: true }), (v) => {
        const expected = viaMathjs(v, from, to);
        // Near zero a relative tolerance means nothing; compare absolutely there.
        if (Math.abs(expected) < 1)
          expect(convertTemperature(v, from, to)).toBeCloseTo(expected, 6);
        else expectClose(convertTemperature(v, from, to), expected);
      }),
    );
  });

  it('round trips return the starting value', () => {
    fc.assert(
      fc.property(
        sensibleValue,
        fc.constantFrom(...SPEED_UNITS),
        fc.constantFrom(...SPEED_UNITS),
        (v, a, b) => expectClose(convertSpeed(convertSpeed(v, a, b), b, a), v),
      ),
    );
  });
});

describe('unit names', () => {
  it('accepts the known ones', () => {
    expect(SpeedUnitSchema.parse('kn')).toBe('kn');
    expect(VolumeUnitSchema.parse('US gal')).toBe('US gal');
  });

  it('rejects an unknown unit with a sentence naming it and the allowed ones', () => {
    const result = SpeedUnitSchema.safeParse('furlongs/fortnight');
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toBe(
      'The speed unit "furlongs/fortnight" is not one we know; use one of kn, km/h, mph.',
    );
  });

  it('names the field in unit preferences', () => {
    const result = UnitPreferencesSchema.safeParse({ volume: 'imperial gal' });
    expect(result.error?.issues[0].path).toEqual(['volume']);
  });

  it('defaults preferences to kn, L, kW and °C', () => {
    expect(UnitPreferencesSchema.parse({})).toEqual({
      speed: 'kn',
      volume: 'L',
      power: 'kW',
      temperature: '°C',
    });
  });
});
