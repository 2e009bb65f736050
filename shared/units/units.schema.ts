import { z } from 'zod';

export const SPEED_UNITS = ['kn', 'km/h', 'mph'] as const;
export const VOLUME_UNITS = ['L', 'US gal'] as const;
export const POWER_UNITS = ['kW', 'hp'] as const;
export const TEMPERATURE_UNITS = ['°C', '°F'] as const;

const unknownUnit = (what: string, allowed: readonly string[]) => (issue: { input?: unknown }) =>
  `The ${what} unit ${JSON.stringify(issue.input)} is not one we know; use one of ${allowed.join(', ')}.`;

export const SpeedUnitSchema = z.enum(SPEED_UNITS, { error: unknownUnit('speed', SPEED_UNITS) });
export type SpeedUnit = z.infer<typeof SpeedUnitSchema>;

export const VolumeUnitSchema = z.enum(VOLUME_UNITS, {
  error: unknownUnit('volume', VOLUME_UNITS),
});
export type VolumeUnit = z.infer<typeof VolumeUnitSchema>;

export const PowerUnitSchema = z.enum(POWER_UNITS, { error: unknownUnit('power', POWER_UNITS) });
export type PowerUnit = z.infer<typeof PowerUnitSchema>;

export const TemperatureUnitSchema = z.enum(TEMPERATURE_UNITS, {
  error: unknownUnit('temperature', TEMPERATURE_UNITS),
});
export type TemperatureUnit = z.infer<typeof TemperatureUnitSchema>;

/** A workshop's or skipper's display preferences; stored values are always kn, L, kW and °C. */
export const UnitPreferencesSchema = z.object({
  speed: SpeedUnitSchema.default('kn'),
  volume: VolumeUnitSchema.default('L'),
  power: PowerUnitSchema.default('kW'),
  temperature: TemperatureUnitSchema.default('°C'),
});
export type UnitPreferences = z.infer<typeof UnitPreferencesSchema>;
