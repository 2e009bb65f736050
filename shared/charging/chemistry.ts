import { z } from 'zod';

export const BatteryChemistrySchema = z.enum(['flooded', 'agm', 'gel', 'lifepo4'], {
  error: 'The battery chemistry (chemistry) must be one of flooded, agm, gel or lifepo4.',
});
export type BatteryChemistry = z.infer<typeof BatteryChemistrySchema>;

export interface ChemistryLimits {
  label: string;
  /** Absorption voltage range for a 12 V battery at the reference temperature. */
  absorptionV: { min: number; max: number };
  floatV: { min: number; max: number } | null;
  /** Millivolts per °C per cell, negative: warmer batteries need less. null = no compensation. */
  compensationMvPerDegCPerCell: number | null;
}

/** Reference temperature of the table below, °C (Battery University BU-403). */
export const REFERENCE_TEMPERATURE_C = 25;

/** Cells in a 12 V lead-acid battery (2 V per cell nominal; common practice). */
export const LEAD_ACID_CELLS = 6;

/** 12 V nominal, 25 °C. Each row names its source beside it. */
export const CHEMISTRY_LIMITS: Record<BatteryChemistry, ChemistryLimits> = {
  // common practice; Battery University BU-403 (Cadex)
  flooded: {
    label: 'flooded lead-acid',
    absorptionV: { min: 14.4, max: 14.8 },
    floatV: { min: 13.2, max: 13.5 },
    compensationMvPerDegCPerCell: -5,
  },
  // Battery University BU-403
  agm: {
    label: 'AGM',
    absorptionV: { min: 14.4, max: 14.7 },
    floatV: { min: 13.5, max: 13.8 },
    compensationMvPerDegCPerCell: -3,
  },
  // common practice
  gel: {
    label: 'gel',
    absorptionV: { min: 14.1, max: 14.4 },
    floatV: { min: 13.5, max: 13.8 },
    compensationMvPerDegCPerCell: -3,
  },
  // common practice: 14.2–14.6 V (3.65 V per cell max); float 13.4–13.6 V or none; no compensation
  lifepo4: {
    label: 'lithium iron phosphate',
    absorptionV: { min: 14.2, max: 14.6 },
    floatV: { min: 13.4, max: 13.6 },
    compensationMvPerDegCPerCell: null,
  },
};

/** Sustained above about 15.0 V on a 12 V system means a regulator fault (common practice). */
export const REGULATOR_FAULT_V = 15.0;

/** Lithium iron phosphate must not be charged below 0 °C (common practice). */
export const LIFEPO4_MIN_CHARGE_TEMPERATURE_C = 0;

/**
 * Voltage shift for the battery temperature: mV/°C/cell × cells × (T − 25 °C).
 * Cold batteries need more voltage to absorb, warm ones less.
 */
export function temperatureShiftV(
  chemistry: BatteryChemistry,
  batteryTemperatureC: number,
): number {
  const perCell = CHEMISTRY_LIMITS[chemistry].compensationMvPerDegCPerCell;
  if (perCell === null) return 0;
  return (perCell * LEAD_ACID_CELLS * (batteryTemperatureC - REFERENCE_TEMPERATURE_C)) / 1000;
}

/** A 25 °C voltage moved to the battery's temperature. */
export const compensateVoltage = (
  voltsAt25C: number,
  chemistry: BatteryChemistry,
  batteryTemperatureC: number,
): number => voltsAt25C + temperatureShiftV(chemistry, batteryTemperatureC);
