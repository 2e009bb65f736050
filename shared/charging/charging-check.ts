import { z } from 'zod';
import {
  BatteryChemistrySchema,
  CHEMISTRY_LIMITS,
  compensateVoltage,
  LIFEPO4_MIN_CHARGE_TEMPERATURE_C,
  REFERENCE_TEMPERATURE_C,
  REGULATOR_FAULT_V,
} from './chemistry';

export const ChargingCheckInputSchema = z.object({
  chemistry: BatteryChemistrySchema,
  measuredV: z
    .number({ error: 'Enter the measured charging voltage (measuredV).' })
    .positive({ error: 'The measured charging voltage (measuredV) must be more than zero.' }),
  /** When unknown, the 25 °C reference is used and the result says so. */
  batteryTemperatureC: z
    .number({ error: 'The battery temperature (batteryTemperatureC) must be a number.' })
    .optional(),
  /** True when the voltage held for minutes at cruising rpm, not a passing spike. */
  sustained: z.boolean().default(false),
});
export type ChargingCheckInput = z.input<typeof ChargingCheckInputSchema>;

export type ChargingNoteCode = 'regulator-fault' | 'too-cold-to-charge' | 'temperature-assumed';

export interface ChargingCheck {
  status: 'ok' | 'high' | 'low';
  /** Highest acceptable voltage: the top of the absorption range at the battery temperature. */
  limitV: number;
  /**
   * Lowest voltage that still charges: the bottom of the float range at the battery temperature
   * (the bottom of absorption where the chemistry has no float).
   */
  floorV: number;
  measuredV: number;
  temperatureC: number;
  /** Sustained above 15.0 V: reported as 'high' even where a cold battery's limit is higher. */
  regulatorFault: boolean;
  notes: { code: ChargingNoteCode; message: string }[];
}

const volts = (v: number) => `${v.toFixed(2)} V`;

const isRegulatorFault = (input: ChargingCheckInput) =>
  input.sustained === true && input.measuredV > REGULATOR_FAULT_V;

function notesFor(input: ChargingCheckInput, temperatureC: number): ChargingCheck['notes'] {
  const notes: ChargingCheck['notes'] = [];
  if (isRegulatorFault(input)) {
    notes.push({
      code: 'regulator-fault',
      message: `The voltage stayed at ${volts(input.measuredV)}, above ${volts(REGULATOR_FAULT_V)}: the regulator is likely faulty and overcharging the battery.`,
    });
  }
  if (input.chemistry === 'lifepo4' && temperatureC < LIFEPO4_MIN_CHARGE_TEMPERATURE_C) {
    notes.push({
      code: 'too-cold-to-charge',
      message: `The battery is at ${temperatureC} °C: lithium iron phosphate must not be charged below ${LIFEPO4_MIN_CHARGE_TEMPERATURE_C} °C.`,
    });
  }
  if (input.batteryTemperatureC === undefined) {
    notes.push({
      code: 'temperature-assumed',
      message: `No battery temperature was given, so the limits are for ${REFERENCE_TEMPERATURE_C} °C.`,
    });
  }
  return notes;
}

/** Measured charging voltage against the chemistry's temperature-compensated limits. */
export function checkChargingVoltage(input: ChargingCheckInput): ChargingCheck {
  const limits = CHEMISTRY_LIMITS[input.chemistry];
  const temperatureC = input.batteryTemperatureC ?? REFERENCE_TEMPERATURE_C;
  const limitV = compensateVoltage(limits.absorptionV.max, input.chemistry, temperatureC);
  const floorV = compensateVoltage(
    (limits.floatV ?? limits.absorptionV).min,
    input.chemistry,
    temperatureC,
  );
  const regulatorFault = isRegulatorFault(input);
  const status =
    regulatorFault || input.measuredV > limitV ? 'high' : input.measuredV < floorV ? 'low' : 'ok';
  return {
    status,
    limitV,
    floorV,
    measuredV: input.measuredV,
    temperatureC,
    regulatorFault,
    notes: notesFor(input, temperatureC),
  };
}
