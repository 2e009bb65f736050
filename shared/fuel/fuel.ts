import { z } from 'zod';
import { HORSEPOWER_W, POUND_KG, US_GALLON_L } from '../units/definitions';
import { litresToUsGallons } from '../units/convert';

/**
 * Typical densities, kg/L: petrol about 0.72–0.775, diesel about 0.82–0.845
 * (EN 228 / EN 590 ranges, from memory). Density is always a parameter; these only prefill forms.
 */
export const FUEL_DENSITY_KG_PER_L = {
  petrol: { min: 0.72, max: 0.775 },
  diesel: { min: 0.82, max: 0.845 },
} as const;

export const FuelFlowReadingSchema = z.object({
  litresPerHour: z
    .number({ error: 'Enter the fuel flow in litres per hour (litresPerHour).' })
    .nonnegative({
      error: 'The fuel flow (litresPerHour) cannot be negative.',
    }),
  speedKn: z.number({ error: 'Enter the speed in knots (speedKn).' }).nonnegative({
    error: 'The speed (speedKn) cannot be negative.',
  }),
});
export type FuelFlowReading = z.infer<typeof FuelFlowReadingSchema>;

export interface FuelEconomy {
  litresPerHour: number;
  usGallonsPerHour: number;
  /** null when the boat is not moving: per-mile figures mean nothing at rest. */
  litresPerNauticalMile: number | null;
  usGallonsPerNauticalMile: number | null;
  nauticalMilesPerLitre: number | null;
}

/** Fuel used per hour and per nautical mile at one reading. */
export function fuelEconomy(reading: FuelFlowReading): FuelEconomy {
  const { litresPerHour, speedKn } = reading;
  const moving = speedKn > 0;
  const perMile = moving ? litresPerHour / speedKn : null;
  return {
    litresPerHour,
    usGallonsPerHour: litresToUsGallons(litresPerHour),
    litresPerNauticalMile: perMile,
    usGallonsPerNauticalMile: perMile === null ? null : litresToUsGallons(perMile),
    nauticalMilesPerLitre: moving && litresPerHour > 0 ? speedKn / litresPerHour : null,
  };
}

export const TankRangeInputSchema = FuelFlowReadingSchema.extend({
  tankLitres: z.number({ error: 'Enter the tank size in litres (tankLitres).' }).positive({
    error: 'The tank size (tankLitres) must be more than zero.',
  }),
  reserveShare: z
    .number({ error: 'Enter the reserve as a share of the tank (reserveShare), like 0.33.' })
    .min(0, { error: 'The reserve (reserveShare) cannot be below 0.' })
    .lt(1, { error: 'The reserve (reserveShare) must be below 1: some fuel must be usable.' }),
});
export type TankRangeInput = z.infer<typeof TankRangeInputSchema>;

/** Range on a tank, keeping a reserve share untouched. */
export function tankRange(input: TankRangeInput): {
  usableLitres: number;
  hours: number | null;
  nauticalMiles: number | null;
} {
  const usableLitres = input.tankLitres * (1 - input.reserveShare);
  if (input.litresPerHour <= 0) return { usableLitres, hours: null, nauticalMiles: null };
  const hours = usableLitres / input.litresPerHour;
  return { usableLitres, hours, nauticalMiles: hours * input.speedKn };
}

/** Fuel weight per US gallon from density: kg/L × L/gal ÷ kg/lb. */
export const fuelPoundsPerUsGallon = (densityKgPerL: number): number =>
  (densityKgPerL * US_GALLON_L) / POUND_KG;

/**
 * gal/h = BSFC (lb/hp·h) × hp / fuel weight (lb/gal)
 * ("Calculating Fuel Consumption", Boating magazine; constants are common practice).
 */
export const usGallonsPerHourFromBsfc = (
  bsfcLbPerHpH: number,
  horsepower: number,
  fuelLbPerUsGallon: number,
): number => (bsfcLbPerHpH * horsepower) / fuelLbPerUsGallon;

/** The metric form: L/h = BSFC (g/kWh) × kW / (density kg/L × 1000 g/kg). */
export const litresPerHourFromBsfc = (
  bsfcGPerKWh: number,
  kilowatts: number,
  densityKgPerL: number,
): number => (bsfcGPerKWh * kilowatts) / (densityKgPerL * 1000);

/** lb/hp·h → g/kWh through the pound and horsepower definitions. */
export const bsfcToGramsPerKWh = (bsfcLbPerHpH: number): number =>
  (bsfcLbPerHpH * POUND_KG * 1000) / (HORSEPOWER_W / 1000);
