import type { ThrottlePosition } from '../programs/throttle';
import type { Reading, RunEvent } from './run-event.schema';

/*
 * ATTRIBUTION RULE: how readings turn into engine time.
 *
 * 1. Events are taken in (at, id) order with copies dropped (see orderEvents).
 * 2. Sessions: time counts only between a session-start and a session-stop. A stop and a
 *    start at the same instant leave the session running, so splitting an outing in two at
 *    any moment changes nothing. A second start inside a session, or a stop outside one, is
 *    ignored.
 * 3. A reading taken inside a session holds from its own time until the first of: the next
 *    reading, the session's stop, a phase-advance, or maxHold after it (default 10 minutes).
 *    Readings taken outside a session count for nothing.
 * 4. The time a reading holds counts only toward the phase named on the reading.
 * 5. Events at the same instant act together: a reading at the instant of a session-start
 *    holds; a reading at the instant of a session-stop does not. Among readings at one
 *    instant the last by id holds.
 *
 * Why 10 minutes of hold: on deck readings are logged every few seconds (live) or every few
 * minutes (typed), so 10 minutes spans any honest gap, while a phone forgotten in a pocket
 * with the session open stops counting after 10 minutes instead of running up hours. This is
 * our own choice, not a trade figure; callers can pass another.
 */
export const DEFAULT_MAX_HOLD_MS = 10 * 60_000;

/** A stretch of engine time attributed to one reading. */
export interface Segment {
  fromMs: number;
  toMs: number;
  phaseId: string;
  rpm: number;
  throttle: ThrottlePosition;
}

export interface SessionSpan {
  fromMs: number;
  toMs: number;
}

/** What is left once every segment has been handed out. */
export interface TimelineEnd {
  sessions: SessionSpan[];
  /** Set when a session is still open at the end (or at `untilMs`). */
  openSessionFromMs: number | null;
  /** The reading still holding at the end, with the moment its hold runs out. */
  heldAtEnd: { reading: Reading; holdEndsMs: number } | null;
}

export interface Timeline extends TimelineEnd {
  segments: Segment[];
}

export interface TimelineOptions {
  maxHoldMs?: number;
  /** Look no further than this instant: events after it are ignored, open spans end here. */
  untilMs?: number;
}

/** Receives each segment as it is found, in time order: [fromMs, toMs) on `reading`. */
export type SegmentVisitor = (reading: Reading, toMs: number) => void;

/** What happens at one instant; reused from instant to instant so the walk allocates nothing. */
interface Instant {
  start: boolean;
  stop: boolean;
  advance: boolean;
  reading: Reading | null;
}

/** Reads every event at the instant of ordered[from]; returns the index after them. */
function readInstant(ordered: readonly RunEvent[], from: number, instant: Instant): number {
  const at = ordered[from].at;
  instant.start = instant.stop = instant.advance = false;
  instant.reading = null;
  let i = from;
  for (; i < ordered.length && ordered[i].at === at; i++) {
    const event = ordered[i];
    if (event.kind === 'reading') instant.reading = event;
    else if (event.kind === 'session-start') instant.start = true;
    else if (event.kind === 'session-stop') instant.stop = true;
    else if (event.kind === 'phase-advance') instant.advance = true;
  }
  return i;
}

/**
 * Walks events already in (at, id) order and hands each segment to `visit`. Segments are not
 * stored, so a long run costs no more memory than its events (and no garbage collection).
 */
export function walkTimeline(
  ordered: readonly RunEvent[],
  options: TimelineOptions,
  visit: SegmentVisitor,
): TimelineEnd {
  const maxHoldMs = options.maxHoldMs ?? DEFAULT_MAX_HOLD_MS;
  const untilMs = options.untilMs ?? Number.POSITIVE_INFINITY;
  const sessions: SessionSpan[] = [];
  const instant: Instant = { start: false, stop: false, advance: false, reading: null };
  let openFrom: number | null = null;
  let held: Reading | null = null;
  let lastEndMs = Number.NEGATIVE_INFINITY;
  const release = (reading: Reading, endMs: number) => {
    const toMs = Math.min(endMs, reading.at + maxHoldMs, untilMs);
    if (toMs > reading.at) visit(reading, (lastEndMs = toMs));
  };
  for (let i = 0; i < ordered.length && ordered[i].at <= untilMs;) {
    const at = ordered[i].at;
    i = readInstant(ordered, i, instant); // rule 5: events at one instant act together
    const closes = openFrom !== null && instant.stop && !instant.start;
    if (held !== null && (instant.reading !== null || instant.advance || closes)) {
      release(held, at);
      held = null;
    }
    if (closes) {
      sessions.push({ fromMs: openFrom as number, toMs: at });
      openFrom = null;
    } else if (openFrom === null && instant.start) {
      openFrom = at;
    }
    if (instant.reading !== null && openFrom !== null) held = instant.reading;
  }
  if (held !== null) release(held, Number.POSITIVE_INFINITY);
  // With no end in sight a session left open ends where its last reading stops holding:
  // a forgotten phone does not count as running.
  if (openFrom !== null)
    sessions.push({
      fromMs: openFrom,
      toMs: Number.isFinite(untilMs) ? untilMs : Math.max(openFrom, lastEndMs),
    });
  return {
    sessions,
    openSessionFromMs: openFrom,
    heldAtEnd: held === null ? null : { reading: held, holdEndsMs: held.at + maxHoldMs },
  };
}

/** The whole timeline with its segments, for charts and tests. */
export function buildTimeline(
  ordered: readonly RunEvent[],
  options: TimelineOptions = {},
): Timeline {
  const segments: Segment[] = [];
  const end = walkTimeline(ordered, options, (reading, toMs) =>
    segments.push({
      fromMs: reading.at,
      toMs,
      phaseId: reading.phaseId,
      rpm: reading.rpm,
      throttle: reading.throttle,
    }),
  );
  return { ...end, segments };
}
