import { checkChargingVoltage } from '../charging/charging-check';
import { CHEMISTRY_LIMITS } from '../charging/chemistry';
import type { ChargingEntry } from './checklist.schema';
import { notApplicable, open, rpmText, voltText, type ItemJudgement } from './evaluation';

/** Charging voltage at cruising RPM against the battery chemistry's temperature-compensated limits. */
export function evaluateCharging(entry: ChargingEntry): ItemJudgement {
  const skipped = notApplicable(entry);
  if (skipped) return skipped;
  if (entry.chemistry === null) return open('Choose the battery chemistry.');
  if (entry.measuredV === null) return open('Enter the voltage measured at the battery terminals.');
  if (entry.atRpm === null)
    return open('Enter the engine RPM at which the voltage was measured (cruising RPM).');

  const check = checkChargingVoltage({
    chemistry: entry.chemistry,
    measuredV: entry.measuredV,
    batteryTemperatureC: entry.batteryTemperatureC ?? undefined,
    sustained: entry.sustained,
  });
  const battery = `the ${CHEMISTRY_LIMITS[entry.chemistry].label} battery at ${check.temperatureC} °C`;
  const figures = [
    { label: 'Measured', value: `${voltText(check.measuredV)} at ${rpmText(entry.atRpm)}` },
    { label: 'Acceptable range', value: `${voltText(check.floorV)} – ${voltText(check.limitV)}` },
  ];
  const reasons: string[] = [];
  if (check.status === 'high' && !check.regulatorFault) {
    reasons.push(
      `${voltText(check.measuredV)} is above ${voltText(check.limitV)}, the most for ${battery}: the battery is being overcharged.`,
    );
  } else if (check.status === 'low') {
    reasons.push(
      `${voltText(check.measuredV)} is below ${voltText(check.floorV)}, the least that charges ${battery}: the battery is not being charged.`,
    );
  } else if (check.status === 'ok') {
    reasons.push(`${voltText(check.measuredV)} is within the range for ${battery}.`);
  }
  reasons.push(...check.notes.map((n) => n.message));
  const tooCold = check.notes.some((n) => n.code === 'too-cold-to-charge');
  return { verdict: check.status === 'ok' && !tooCold ? 'pass' : 'fail', reasons, figures };
}
