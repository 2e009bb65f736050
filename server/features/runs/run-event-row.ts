import type { ThrottlePosition } from '../../../shared/programs/throttle.js';
import type { RunEvent } from '../../../shared/runs/run-event.schema.js';
import { placeholders } from '../../lib/native-sql.js';

/*
 * The run_event row, written and read in one place. The table keeps the whole event as JSON
 * (`body`) plus copies of the fields queries filter or read often (engine, kind, device time,
 * phase, rpm, throttle). Every raw insert and select of the hot paths goes through this module,
 * so the column order is written once; a test holds RUN_EVENT_COLUMNS to the entity.
 */

/** Column order of every raw insert into run_event. */
export const RUN_EVENT_COLUMNS = [
  'id',
  'runId',
  'workshopId',
  'engineId',
  'kind',
  'at',
  'receivedAt',
  'authorId',
  'phaseId',
  'rpm',
  'throttle',
  'body',
  'seq',
] as const;

export type RunEventRowValues = [
  id: string,
  runId: string,
  workshopId: string,
  engineId: string,
  kind: string,
  at: number,
  receivedAt: number,
  authorId: string,
  phaseId: string | null,
  rpm: number | null,
  throttle: string | null,
  body: string,
  seq: number,
];

/** What the server adds to a device's event when it stores it. */
export interface StoredEventFacts {
  runId: string;
  workshopId: string;
  receivedAt: number;
  authorId: string;
  seq: number;
}

/** The row values for an event, in RUN_EVENT_COLUMNS order. */
export function runEventRow(event: RunEvent, facts: StoredEventFacts): RunEventRowValues {
  const isReading = event.kind === 'reading';
  return [
    event.id,
    facts.runId,
    facts.workshopId,
    event.engineId,
    event.kind,
    event.at,
    facts.receivedAt,
    facts.authorId,
    'phaseId' in event ? (event.phaseId ?? null) : null,
    isReading ? event.rpm : null,
    isReading ? event.throttle : null,
    JSON.stringify(event),
    facts.seq,
  ];
}

const COLUMN_LIST = RUN_EVENT_COLUMNS.map((c) => `"${c}"`).join(', ');
const ROW_MARKS = `(${placeholders(RUN_EVENT_COLUMNS.length)})`;

/** INSERT of `rows` rows; OR IGNORE keeps a row already there (same id) and changes nothing. */
export function insertRunEventsSql(rows: number, orIgnore = false): string {
  const values = Array.from({ length: rows }, () => ROW_MARKS).join(', ');
  return `INSERT ${orIgnore ? 'OR IGNORE ' : ''}INTO "run_event" (${COLUMN_LIST}) VALUES ${values}`;
}

/**
 * Columns to read an event back with eventFromRow. A reading is made from its copied columns
 * alone; the JSON body is read (and parsed) only for the few events of other kinds.
 */
export const EVENT_COLUMNS = `"id", "kind", "at", "engineId", "phaseId", "rpm", "throttle", CASE WHEN "kind" = 'reading' THEN NULL ELSE "body" END`;

/** A raw row of EVENT_COLUMNS, in that order. */
export type EventColumnsRow = [
  id: string,
  kind: string,
  at: number,
  engineId: string,
  phaseId: string | null,
  rpm: number | null,
  throttle: string | null,
  body: string | null,
];

/** The event a row of EVENT_COLUMNS holds (columns after those are the caller's own). */
export function eventFromRow(row: readonly [...EventColumnsRow, ...unknown[]]): RunEvent {
  const [id, kind, at, engineId, phaseId, rpm, throttle, body] = row;
  if (kind !== 'reading') return JSON.parse(body ?? '{}') as RunEvent;
  return {
    kind: 'reading',
    id,
    at,
    engineId,
    phaseId: phaseId ?? '',
    rpm: rpm ?? 0,
    throttle: (throttle ?? 'idle') as ThrottlePosition,
  };
}
