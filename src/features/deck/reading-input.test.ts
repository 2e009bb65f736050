import { describe, expect, it } from 'vitest';
import {
  isFarAboveRated,
  parseFrequency,
  parseRpm,
  pressKey,
  signalSourceOf,
  stepRpm,
} from './reading-input';

describe('RPM typed on the keypad', () => {
  it('takes whole numbers and rounds decimals', () => {
    expect(parseRpm('2400')).toEqual({ ok: true, value: 2400 });
    expect(parseRpm('2400,6')).toEqual({ ok: true, value: 2401 });
  });

  it('names the field when the entry is empty, not a number or negative', () => {
    expect(parseRpm('')).toMatchObject({
      ok: false,
      field: 'rpm',
      message: 'Enter the engine speed (RPM).',
    });
    expect(parseRpm('24OO')).toMatchObject({
      ok: false,
      field: 'rpm',
      message: 'Enter the engine speed (RPM) as a number, like 2400.',
    });
    expect(parseRpm('-300')).toMatchObject({
      ok: false,
      field: 'rpm',
      message: 'The engine speed (RPM) cannot be negative.',
    });
    expect(parseRpm('25000')).toMatchObject({ ok: false, field: 'rpm' });
  });

  it('asks to confirm more than 10 % above the rated maximum (our own margin)', () => {
    // Rated 5000–6000 rpm: a demo outboard's range.
    expect(isFarAboveRated(6500, 6000)).toBe(false);
    expect(isFarAboveRated(6700, 6000)).toBe(true);
  });

  it('keypad and stepper build the number', () => {
    expect(['2', '4', '0', '0'].reduce(pressKey, '')).toBe('2400');
    expect(pressKey('2400', 'back')).toBe('240');
    expect(pressKey('0', '7')).toBe('7');
    expect(pressKey('123456', '7')).toBe('123456');
    expect(stepRpm('2400', 100)).toBe('2500');
    expect(stepRpm('50', -100)).toBe('0');
    expect(stepRpm('', 100)).toBe('100');
  });
});

describe('RPM from a measured frequency', () => {
  const coil = signalSourceOf({ tachSource: 'charging-coil', poles: 12 });
  const belt = signalSourceOf({ tachSource: 'belt-alternator', poles: 12, pulleyRatio: 2.5 });

  it('12-pole charging coil: rpm = 10 × Hz (common practice, no single source)', () => {
    expect(parseFrequency('120', coil)).toEqual({ ok: true, value: { hz: 120, rpm: 1200 } });
    expect(parseFrequency('300', coil)).toEqual({ ok: true, value: { hz: 300, rpm: 3000 } });
  });

  it('belt-driven 12-pole alternator, pulley ratio 2.5: 250 Hz at 1000 engine rpm (alternator tachometer-signal application notes, common practice)', () => {
    expect(parseFrequency('250', belt)).toEqual({ ok: true, value: { hz: 250, rpm: 1000 } });
  });

  it('refuses zero, text, and engines without poles, naming the field', () => {
    expect(parseFrequency('0', coil)).toMatchObject({
      ok: false,
      field: 'frequencyHz',
      message: 'The measured frequency (Hz) must be more than zero.',
    });
    expect(parseFrequency('abc', coil)).toMatchObject({ ok: false, field: 'frequencyHz' });
    expect(parseFrequency('', coil)).toMatchObject({
      ok: false,
      message: 'Enter the measured frequency (Hz).',
    });
    expect(
      parseFrequency('120', signalSourceOf({ tachSource: 'none', poles: null })),
    ).toMatchObject({ ok: false, field: 'frequencyHz' });
    expect(
      signalSourceOf({ tachSource: 'belt-alternator', poles: 12, pulleyRatio: null }),
    ).toBeNull();
  });
});
