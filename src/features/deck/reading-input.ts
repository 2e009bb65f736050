import { engineRpmFromFrequency } from '../../../shared/engine-speed/engine-speed';
import type { SignalSource } from '../../../shared/engine-speed/signal-source.schema';
import { RPM_UPPER_BOUND } from '../../../shared/programs/phase-band.schema';

/*
 * What the skipper types on the keypad, turned into numbers with a message naming the field
 * when it cannot be. The stored reading is checked once more by the shared ReadingSchema.
 */

export type Parsed<T> = { ok: true; value: T } | { ok: false; field: string; message: string };

const NUMBER = /^-?\d+([.,]\d+)?$/;
const toNumber = (text: string) => Number(text.trim().replace(',', '.'));

export function parseRpm(text: string): Parsed<number> {
  const field = 'rpm';
  if (text.trim() === '') return { ok: false, field, message: 'Enter the engine speed (RPM).' };
  if (!NUMBER.test(text.trim()))
    return { ok: false, field, message: 'Enter the engine speed (RPM) as a number, like 2400.' };
  const rpm = toNumber(text);
  if (rpm < 0) return { ok: false, field, message: 'The engine speed (RPM) cannot be negative.' };
  if (rpm > RPM_UPPER_BOUND)
    return {
      ok: false,
      field,
      message: `The engine speed (RPM) must be at most ${RPM_UPPER_BOUND} rpm.`,
    };
  return { ok: true, value: Math.round(rpm) };
}

/** The tachometer signal source of an engine record, when it has what a conversion needs. */
export interface EngineSignal {
  tachSource?: string | null;
  poles?: number | null;
  pulleyRatio?: number | null;
}

export function signalSourceOf(engine: EngineSignal | undefined): SignalSource | null {
  if (!engine?.poles || engine.poles % 2 !== 0) return null;
  if (engine.tachSource === 'charging-coil') return { kind: 'charging-coil', poles: engine.poles };
  if (engine.tachSource === 'belt-alternator' && engine.pulleyRatio)
    return { kind: 'belt-alternator', poles: engine.poles, pulleyRatio: engine.pulleyRatio };
  return null;
}

export const signalWords = (source: SignalSource) =>
  source.kind === 'charging-coil'
    ? `${source.poles}-pole charging coil`
    : `${source.poles}-pole alternator, pulley ratio ${source.pulleyRatio}`;

/** A measured frequency turned into engine RPM through the engine's poles and pulley ratio. */
export function parseFrequency(
  text: string,
  source: SignalSource | null,
): Parsed<{ hz: number; rpm: number }> {
  const field = 'frequencyHz';
  if (source === null) {
    return {
      ok: false,
      field,
      message:
        'This engine has no poles recorded, so a frequency (Hz) cannot be turned into RPM. Enter RPM instead.',
    };
  }
  if (text.trim() === '')
    return { ok: false, field, message: 'Enter the measured frequency (Hz).' };
  if (!NUMBER.test(text.trim()))
    return {
      ok: false,
      field,
      message: 'Enter the measured frequency (Hz) as a number, like 240.',
    };
  const hz = toNumber(text);
  if (hz <= 0)
    return { ok: false, field, message: 'The measured frequency (Hz) must be more than zero.' };
  const rpm = Math.round(engineRpmFromFrequency(hz, source));
  if (rpm > RPM_UPPER_BOUND)
    return {
      ok: false,
      field,
      message: `${hz} Hz gives ${rpm} rpm, above any engine's speed: check the frequency (Hz).`,
    };
  return { ok: true, value: { hz, rpm } };
}

/**
 * More than 10 % above the top of the rated full-throttle range is asked about, not refused:
 * a slipped finger is likelier than an engine that fast. The 10 % is our own margin.
 */
export const FAR_ABOVE_RATED_SHARE = 1.1;

export const isFarAboveRated = (rpm: number, ratedRpmMax: number) =>
  rpm > ratedRpmMax * FAR_ABOVE_RATED_SHARE;

/** Steps of the RPM stepper: 100 rpm, about one tachometer division (common practice). */
export const RPM_STEP = 100;

/** Keypad input: digits appended, at most six of them, no leading zeros. */
export function pressKey(text: string, key: string): string {
  if (key === 'back') return text.slice(0, -1);
  if (key === 'clear') return '';
  if (key === '.') return text.includes('.') || text === '' ? text : `${text}.`;
  if (!/^\d$/.test(key)) return text;
  if (text.replace('.', '').length >= 6) return text;
  return text === '0' ? key : text + key;
}

export function stepRpm(text: string, delta: number): string {
  const parsed = parseRpm(text);
  const base = parsed.ok ? parsed.value : 0;
  return String(
    Math.min(RPM_UPPER_BOUND, Math.max(0, Math.round((base + delta) / RPM_STEP) * RPM_STEP)),
  );
}
