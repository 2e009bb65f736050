import { describe, expect, it } from 'vitest';
import { ChecklistInputSchema, type ChargingEntry } from './checklist.schema';
import { evaluateCharging } from './evaluate-charging';

const entry = (values: Partial<ChargingEntry>): ChargingEntry =>
  // 3000 rpm stands for "cruising RPM" as the technician types it; the limits do not depend on it.
  ChecklistInputSchema.parse({ charging: { atRpm: 3000, ...values } }).charging;

describe('charging voltage at cruising RPM', () => {
  it('passes AGM at 14.4 V and 25 °C (absorption 14.4–14.7 V, Battery University BU-403)', () => {
    const result = evaluateCharging(
      entry({ chemistry: 'agm', measuredV: 14.4, batteryTemperatureC: 25 }),
    );
    expect(result.verdict).toBe('pass');
    // Floor is the bottom of float, 13.5 V (BU-403); limit the top of absorption, 14.7 V.
    expect(result.figures).toContainEqual({
      label: 'Acceptable range',
      value: '13.50 V – 14.70 V',
    });
  });

  it('flags overcharging above the AGM limit of 14.7 V at 25 °C (BU-403)', () => {
    const result = evaluateCharging(
      entry({ chemistry: 'agm', measuredV: 14.9, batteryTemperatureC: 25 }),
    );
    expect(result.verdict).toBe('fail');
    expect(result.reasons[0]).toBe(
      '14.90 V is above 14.70 V, the most for the AGM battery at 25 °C: the battery is being overcharged.',
    );
  });

  it('moves the limit with battery temperature (−3 mV/°C per cell, six cells; BU-403)', () => {
    // Limit 14.7 V + 0.003 × 6 × 25 = 15.15 V and floor 13.5 V + 0.45 = 13.95 V at 0 °C (computed).
    const cold = evaluateCharging(
      entry({ chemistry: 'agm', measuredV: 14.9, batteryTemperatureC: 0 }),
    );
    expect(cold.verdict).toBe('pass');
    expect(cold.figures[1].value).toBe('13.95 V – 15.15 V');
  });

  it('calls a sustained voltage above 15.0 V a regulator fault (common practice)', () => {
    const result = evaluateCharging(
      entry({ chemistry: 'agm', measuredV: 15.1, batteryTemperatureC: 0, sustained: true }),
    );
    expect(result.verdict).toBe('fail');
    expect(result.reasons.join(' ')).toContain('regulator is likely faulty and overcharging');
  });

  it('fails a voltage below the flooded float range of 13.2 V (common practice; BU-403)', () => {
    const result = evaluateCharging(
      entry({ chemistry: 'flooded', measuredV: 12.6, batteryTemperatureC: 25 }),
    );
    expect(result.verdict).toBe('fail');
    expect(result.reasons[0]).toContain('not being charged');
  });

  it('fails charging lithium iron phosphate below 0 °C (common practice)', () => {
    const result = evaluateCharging(
      entry({ chemistry: 'lifepo4', measuredV: 14.2, batteryTemperatureC: -5 }),
    );
    expect(result.verdict).toBe('fail');
    expect(result.reasons.join(' ')).toContain('must not be charged below 0 °C');
  });

  it('says when the 25 °C reference was assumed (BU-403 reference temperature)', () => {
    const result = evaluateCharging(entry({ chemistry: 'gel', measuredV: 14.2 }));
    expect(result.verdict).toBe('pass');
    expect(result.reasons).toContain(
      'No battery temperature was given, so the limits are for 25 °C.',
    );
  });

  it('stays open until chemistry, voltage and RPM are entered', () => {
    expect(evaluateCharging(entry({ measuredV: 14.2 })).reasons).toEqual([
      'Choose the battery chemistry.',
    ]);
    expect(evaluateCharging(entry({ chemistry: 'agm' })).verdict).toBe('open');
    expect(
      evaluateCharging(
        ChecklistInputSchema.parse({ charging: { chemistry: 'agm', measuredV: 14.2 } }).charging,
      ).reasons[0],
    ).toContain('cruising RPM');
  });
});
