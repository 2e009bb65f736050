import { describe, expect, it } from 'vitest';
import { checkChargingVoltage, ChargingCheckInputSchema } from './charging-check';
import { compensateVoltage, temperatureShiftV } from './chemistry';

describe('temperature compensation', () => {
  it('14.4 V at 25 °C with −3 mV/°C/cell → 14.85 V at 0 °C and 14.22 V at 35 °C (computed)', () => {
    // AGM is −3 mV/°C per cell (Battery University BU-403).
    expect(compensateVoltage(14.4, 'agm', 0)).toBeCloseTo(14.85, 9);
    expect(compensateVoltage(14.4, 'agm', 35)).toBeCloseTo(14.22, 9);
  });

  it('flooded moves −5 mV/°C per cell × 6 cells (common practice; Battery University BU-403)', () => {
    expect(temperatureShiftV('flooded', 15)).toBeCloseTo(0.3, 9);
  });

  it('lithium iron phosphate has no compensation (common practice)', () => {
    expect(temperatureShiftV('lifepo4', -10)).toBe(0);
    expect(temperatureShiftV('lifepo4', 40)).toBe(0);
  });
});

describe('measured voltage against the absorption limit', () => {
  it('shows the limit: AGM tops out at 14.7 V at 25 °C (Battery University BU-403)', () => {
    const check = checkChargingVoltage({
      chemistry: 'agm',
      measuredV: 14.5,
      batteryTemperatureC: 25,
    });
    expect(check.status).toBe('ok');
    expect(check.limitV).toBeCloseTo(14.7, 9);
    expect(check.floorV).toBeCloseTo(13.5, 9); // AGM float bottom (Battery University BU-403)
    expect(check.notes).toEqual([]);
  });

  it('gel above 14.4 V at 25 °C is high (common practice)', () => {
    expect(
      checkChargingVoltage({ chemistry: 'gel', measuredV: 14.5, batteryTemperatureC: 25 }).status,
    ).toBe('high');
  });

  it('a cold flooded battery may take more: 14.9 V at 5 °C is within 14.8 + 0.6 V (common practice; BU-403)', () => {
    const check = checkChargingVoltage({
      chemistry: 'flooded',
      measuredV: 14.9,
      batteryTemperatureC: 5,
    });
    expect(check.limitV).toBeCloseTo(15.4, 9);
    expect(check.status).toBe('ok');
  });

  it('below the float floor is low: flooded 13.0 V at 25 °C (floor 13.2 V, common practice; BU-403)', () => {
    expect(
      checkChargingVoltage({ chemistry: 'flooded', measuredV: 13.0, batteryTemperatureC: 25 })
        .status,
    ).toBe('low');
  });

  it('LiFePO4 above 14.6 V is high whatever the temperature (common practice)', () => {
    expect(
      checkChargingVoltage({ chemistry: 'lifepo4', measuredV: 14.7, batteryTemperatureC: 0 })
        .status,
    ).toBe('high');
    expect(
      checkChargingVoltage({ chemistry: 'lifepo4', measuredV: 14.6, batteryTemperatureC: 0 })
        .limitV,
    ).toBe(14.6);
  });

  it('warns against charging LiFePO4 below 0 °C (common practice)', () => {
    const check = checkChargingVoltage({
      chemistry: 'lifepo4',
      measuredV: 14.2,
      batteryTemperatureC: -2,
    });
    expect(check.notes.map((n) => n.code)).toEqual(['too-cold-to-charge']);
    expect(check.notes[0].message).toBe(
      'The battery is at -2 °C: lithium iron phosphate must not be charged below 0 °C.',
    );
  });

  it('sustained above 15.0 V flags a regulator fault and reads high even when the cold limit is higher (common practice)', () => {
    const check = checkChargingVoltage({
      chemistry: 'flooded',
      measuredV: 15.2,
      batteryTemperatureC: 0,
      sustained: true,
    });
    expect(check.limitV).toBeCloseTo(15.55, 9); // 14.8 V + 5 mV × 6 × 25 °C
    expect(check.regulatorFault).toBe(true);
    expect(check.status).toBe('high');
    expect(check.notes[0].code).toBe('regulator-fault');
  });

  it('a passing spike over 15.0 V is not called a regulator fault', () => {
    const check = checkChargingVoltage({
      chemistry: 'flooded',
      measuredV: 15.2,
      batteryTemperatureC: 0,
    });
    expect(check.regulatorFault).toBe(false);
    expect(check.status).toBe('ok');
  });

  it('assumes 25 °C when no temperature is given, and says so', () => {
    const check = checkChargingVoltage({ chemistry: 'agm', measuredV: 14.4 });
    expect(check.temperatureC).toBe(25);
    expect(check.notes.map((n) => n.code)).toEqual(['temperature-assumed']);
  });

  it('schema rejects an unknown chemistry naming the field', () => {
    const result = ChargingCheckInputSchema.safeParse({ chemistry: 'nicad', measuredV: 14 });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['chemistry'],
      message: 'The battery chemistry (chemistry) must be one of flooded, agm, gel or lifepo4.',
    });
  });
});
