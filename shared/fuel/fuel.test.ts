import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  bsfcToGramsPerKWh,
  fuelEconomy,
  fuelPoundsPerUsGallon,
  litresPerHourFromBsfc,
  TankRangeInputSchema,
  tankRange,
  usGallonsPerHourFromBsfc,
} from './fuel';
import { horsepowerToKilowatts, usGallonsToLitres } from '../units/convert';

describe('BSFC estimate ("Calculating Fuel Consumption", Boating magazine; constants common practice)', () => {
  it('petrol, BSFC 0.50 and 6.1 lb/gal, 300 hp → 24.59 gal/h', () => {
    expect(usGallonsPerHourFromBsfc(0.5, 300, 6.1)).toBeCloseTo(24.59, 2);
  });

  it('diesel, BSFC 0.40 and 7.2 lb/gal, 300 hp → 16.67 gal/h', () => {
    expect(usGallonsPerHourFromBsfc(0.4, 300, 7.2)).toBeCloseTo(16.67, 2);
  });

  it('BSFC 0.40 / 0.50 lb/hp·h → 243.3 / 304.1 g/kWh (unit conversion)', () => {
    expect(bsfcToGramsPerKWh(0.4)).toBeCloseTo(243.3, 1);
    expect(bsfcToGramsPerKWh(0.5)).toBeCloseTo(304.1, 1);
  });

  it('the metric form agrees with the US form for any density', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 0.7, noNaN: true }),
        fc.double({ min: 2, max: 1000, noNaN: true }),
        fc.double({ min: 0.7, max: 0.9, noNaN: true }),
        (bsfc, hp, density) => {
          const gph = usGallonsPerHourFromBsfc(bsfc, hp, fuelPoundsPerUsGallon(density));
          const lph = litresPerHourFromBsfc(
            bsfcToGramsPerKWh(bsfc),
            horsepowerToKilowatts(hp),
            density,
          );
          expect(lph / usGallonsToLitres(gph)).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it('density 0.72–0.775 kg/L petrol weighs about 6.0–6.5 lb/gal (EN 228, from memory; unit conversion)', () => {
    expect(fuelPoundsPerUsGallon(0.72)).toBeCloseTo(6.009, 3);
    expect(fuelPoundsPerUsGallon(0.775)).toBeCloseTo(6.468, 3);
  });
});

describe('flow per hour and per nautical mile', () => {
  // Illustrative inputs, not trade figures; the expectations are arithmetic.
  it('20 L/h at 10 kn is 2 L per nautical mile', () => {
    const economy = fuelEconomy({ litresPerHour: 20, speedKn: 10 });
    expect(economy.litresPerNauticalMile).toBe(2);
    expect(economy.nauticalMilesPerLitre).toBe(0.5);
    expect(economy.usGallonsPerHour).toBeCloseTo(20 / 3.785411784, 12); // NIST Handbook 44, Appendix C
    expect(economy.usGallonsPerNauticalMile).toBeCloseTo(2 / 3.785411784, 12);
  });

  it('per-mile figures are null at rest', () => {
    expect(fuelEconomy({ litresPerHour: 2, speedKn: 0 })).toMatchObject({
      litresPerNauticalMile: null,
      usGallonsPerNauticalMile: null,
      nauticalMilesPerLitre: null,
    });
  });
});

describe('range on a tank', () => {
  it('keeps the reserve: 200 L, a third in reserve, 20 L/h at 10 kn', () => {
    const range = tankRange({
      tankLitres: 200,
      reserveShare: 1 / 3,
      litresPerHour: 20,
      speedKn: 10,
    });
    expect(range.usableLitres).toBeCloseTo(133.333, 3);
    expect(range.hours).toBeCloseTo(6.6667, 4);
    expect(range.nauticalMiles).toBeCloseTo(66.667, 3);
  });

  it('has no hours or miles when nothing is burning', () => {
    expect(tankRange({ tankLitres: 100, reserveShare: 0, litresPerHour: 0, speedKn: 0 })).toEqual({
      usableLitres: 100,
      hours: null,
      nauticalMiles: null,
    });
  });

  it('rejects a reserve of the whole tank, naming the field', () => {
    const result = TankRangeInputSchema.safeParse({
      tankLitres: 100,
      reserveShare: 1,
      litresPerHour: 10,
      speedKn: 5,
    });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['reserveShare'],
      message: 'The reserve (reserveShare) must be below 1: some fuel must be usable.',
    });
  });

  it('rejects negative flow, naming the field', () => {
    const result = TankRangeInputSchema.safeParse({
      tankLitres: 100,
      reserveShare: 0.2,
      litresPerHour: -1,
      speedKn: 5,
    });
    expect(result.error?.issues[0].path).toEqual(['litresPerHour']);
  });
});
