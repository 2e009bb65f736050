import type { SignalSource } from '../../../shared/engine-speed/signal-source.schema';
import type { ThrottlePosition } from '../../../shared/programs/throttle';
import type { ReadingEntry } from './deck-store';
import type { ReadingDetailsValues } from './reading-details.schema';
import { isFarAboveRated, parseFrequency, parseRpm } from './reading-input';

/** An engine the pad can log for right now. */
export interface PadEngine {
  runId: string;
  engineId: string;
  label: string;
  phaseId: string;
  signal: SignalSource | null;
  ratedRpmMax: number;
}

export interface PadInput {
  mode: 'rpm' | 'hz';
  text: string;
  throttle: ThrottlePosition | null;
  details: ReadingDetailsValues | null;
  gps: { speedKn: number | null; lat: number | null; lon: number | null } | null;
  /** The skipper confirmed a speed far above the rated range. */
  confirmed: boolean;
}

export type PadResult =
  | { kind: 'ready'; entries: ReadingEntry[]; rpms: number[] }
  | { kind: 'invalid'; field: string; message: string }
  | { kind: 'confirm'; message: string };

function engineRpm(engine: PadEngine, input: PadInput, prefix: string) {
  if (input.mode === 'rpm') {
    const parsed = parseRpm(input.text);
    return parsed.ok
      ? { ok: true as const, rpm: parsed.value }
      : { ...parsed, message: prefix + parsed.message };
  }
  const parsed = parseFrequency(input.text, engine.signal);
  return parsed.ok
    ? { ok: true as const, rpm: parsed.value.rpm, hz: parsed.value.hz }
    : { ...parsed, message: prefix + parsed.message };
}

function extras(input: PadInput) {
  const { details, gps } = input;
  const speed =
    gps && gps.speedKn !== null
      ? {
          speedKn: gps.speedKn,
          speedSource: 'gps' as const,
          ...(gps.lat !== null && gps.lon !== null ? { lat: gps.lat, lon: gps.lon } : {}),
        }
      : details?.speedKn !== undefined && details !== null
        ? { speedKn: details.speedKn, speedSource: 'typed' as const }
        : {};
  return {
    ...speed,
    ...(details?.fuelLph !== undefined ? { fuelLph: details.fuelLph } : {}),
    ...(details?.hourMeter !== undefined ? { hourMeter: details.hourMeter } : {}),
    ...(details?.note ? { note: details.note } : {}),
  };
}

/** One reading per chosen engine, or the first problem in words that name the field. */
export function buildEntries(engines: PadEngine[], input: PadInput): PadResult {
  if (engines.length === 0)
    return { kind: 'invalid', field: 'engines', message: 'Choose the engine the reading is for.' };
  if (input.throttle === null)
    return {
      kind: 'invalid',
      field: 'throttle',
      message: 'Choose the throttle position (throttle).',
    };
  const entries: ReadingEntry[] = [];
  const far: string[] = [];
  for (const engine of engines) {
    const speed = engineRpm(engine, input, engines.length > 1 ? `${engine.label}: ` : '');
    if (!speed.ok) return { kind: 'invalid', field: speed.field, message: speed.message };
    if (isFarAboveRated(speed.rpm, engine.ratedRpmMax))
      far.push(
        `${speed.rpm} rpm is far above the rated top of ${engine.ratedRpmMax} rpm for ${engine.label}`,
      );
    const source =
      'hz' in speed
        ? { rpmSource: 'frequency' as const, frequencyHz: speed.hz }
        : { rpmSource: 'tachometer' as const };
    entries.push({
      runId: engine.runId,
      engineId: engine.engineId,
      reading: {
        phaseId: engine.phaseId,
        rpm: speed.rpm,
        throttle: input.throttle,
        ...source,
        ...extras(input),
      },
    });
  }
  if (far.length > 0 && !input.confirmed)
    return { kind: 'confirm', message: `${far.join('; ')}. Is that right?` };
  return { kind: 'ready', entries, rpms: entries.map((e) => e.reading.rpm) };
}
