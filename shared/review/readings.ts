import type { ResolvedPhase } from '../programs/resolve-band';
import { bandState, type BandState } from '../runs/phase-rules';
import type { Reading } from '../runs/run-event.schema';
import { isoTime } from '../runs/event-time';
import type { CsvCell } from './csv';
import type { VoidedMark } from './views';

/** One reading as the review page's table and the CSV export show it. */
export interface ReadingRow {
  id: string;
  /** Device time, epoch ms. */
  at: number;
  /** Server time of arrival, epoch ms. */
  receivedAt: number;
  phaseId: string;
  phaseName: string;
  rpm: number;
  throttle: Reading['throttle'];
  /** Against the phase's band; null when the reading names a phase the program lacks. */
  band: BandState | null;
  rpmSource: Reading['rpmSource'] | null;
  frequencyHz: number | null;
  speedKn: number | null;
  speedSource: Reading['speedSource'] | null;
  fuelLph: number | null;
  hourMeter: number | null;
  coolantOk: boolean | null;
  lat: number | null;
  lon: number | null;
  note: string | null;
  /** Set when the reading was taken back: it counts for nothing (shared/runs/voids.ts). */
  voided: VoidedMark | null;
}

export function readingRow(
  reading: Reading,
  receivedAt: number,
  phase: ResolvedPhase | undefined,
  voided: VoidedMark | null = null,
): ReadingRow {
  return {
    id: reading.id,
    at: reading.at,
    receivedAt,
    phaseId: reading.phaseId,
    phaseName: phase?.name ?? reading.phaseId,
    rpm: reading.rpm,
    throttle: reading.throttle,
    band: phase ? bandState(reading.rpm, reading.throttle, phase) : null,
    rpmSource: reading.rpmSource ?? null,
    frequencyHz: reading.frequencyHz ?? null,
    speedKn: reading.speedKn ?? null,
    speedSource: reading.speedSource ?? null,
    fuelLph: reading.fuelLph ?? null,
    hourMeter: reading.hourMeter ?? null,
    coolantOk: reading.coolantOk ?? null,
    lat: reading.lat ?? null,
    lon: reading.lon ?? null,
    note: reading.note ?? null,
    voided,
  };
}

export const BAND_WORDS: Record<BandState, string> = {
  'in-band': 'in band',
  over: 'over',
  under: 'under',
};

/** Column headings of the readings export; units in the heading so every cell is a bare number. */
export const READING_CSV_HEADER: readonly string[] = [
  'device time (UTC)',
  'received (UTC)',
  'phase',
  'rpm',
  'throttle',
  'band',
  'rpm source',
  'frequency (Hz)',
  'speed (kn)',
  'speed source',
  'fuel (L/h)',
  'hour meter (h)',
  'cooling water ok',
  'latitude',
  'longitude',
  'note',
  'reading id',
  'voided (reason, by)',
];

/** A time no date can hold (kept from before times were bounded) is an empty cell. */
const iso = (ms: number) => isoTime(ms) ?? '';

export function readingCsvCells(row: ReadingRow): CsvCell[] {
  return [
    iso(row.at),
    iso(row.receivedAt),
    row.phaseName,
    row.rpm,
    row.throttle,
    row.band ? BAND_WORDS[row.band] : '',
    row.rpmSource,
    row.frequencyHz,
    row.speedKn,
    row.speedSource,
    row.fuelLph,
    row.hourMeter,
    row.coolantOk,
    row.lat,
    row.lon,
    row.note,
    row.id,
    row.voided ? `${row.voided.reason} (${row.voided.byName})` : '',
  ];
}
