import {
  HORSEPOWER_W,
  KM_PER_H_M_PER_S,
  KNOT_M_PER_S,
  MPH_M_PER_S,
  US_GALLON_L,
} from './definitions';
import type { PowerUnit, SpeedUnit, TemperatureUnit, VolumeUnit } from './units.schema';

// Each table gives the size of one unit in a common base (m/s, litres, watts).
const SPEED_IN_M_PER_S: Record<SpeedUnit, number> = {
  kn: KNOT_M_PER_S,
  'km/h': KM_PER_H_M_PER_S,
  mph: MPH_M_PER_S,
};

const VOLUME_IN_L: Record<VolumeUnit, number> = { L: 1, 'US gal': US_GALLON_L };

const POWER_IN_W: Record<PowerUnit, number> = { kW: 1000, hp: HORSEPOWER_W };

function scale<U extends string>(table: Record<U, number>, value: number, from: U, to: U): number {
  // Same-unit conversions return the value untouched, so a round trip never drifts.
  if (from === to) return value;
  return (value * table[from]) / table[to];
}

export const convertSpeed = (value: number, from: SpeedUnit, to: SpeedUnit): number =>
  scale(SPEED_IN_M_PER_S, value, from, to);

export const convertVolume = (value: number, from: VolumeUnit, to: VolumeUnit): number =>
  scale(VOLUME_IN_L, value, from, to);

export const convertPower = (value: number, from: PowerUnit, to: PowerUnit): number =>
  scale(POWER_IN_W, value, from, to);

/** °F = °C × 9/5 + 32 (definition of the Fahrenheit scale; NIST SP 811 (2008), Appendix B). */
export function convertTemperature(
  value: number,
  from: TemperatureUnit,
  to: TemperatureUnit,
): number {
  if (from === to) return value;
  return from === '°C' ? (value * 9) / 5 + 32 : ((value - 32) * 5) / 9;
}

export const knotsToKmh = (kn: number) => convertSpeed(kn, 'kn', 'km/h');
export const knotsToMph = (kn: number) => convertSpeed(kn, 'kn', 'mph');
export const litresToUsGallons = (litres: number) => convertVolume(litres, 'L', 'US gal');
export const usGallonsToLitres = (gallons: number) => convertVolume(gallons, 'US gal', 'L');
export const kilowattsToHorsepower = (kw: number) => convertPower(kw, 'kW', 'hp');
export const horsepowerToKilowatts = (hp: number) => convertPower(hp, 'hp', 'kW');
export const celsiusToFahrenheit = (c: number) => convertTemperature(c, '°C', '°F');
export const fahrenheitToCelsius = (f: number) => convertTemperature(f, '°F', '°C');
