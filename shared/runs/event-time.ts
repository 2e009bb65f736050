/*
 * Bounds on the times a device stamps on what it logs. A phone's clock can be off (flagged to the
 * workshop past a day), but a time years away is a broken clock or a broken client, and one such
 * time must never break a view of the run. See DEVELOPERS.md, "Sync rules".
 */

const DAY_MS = 24 * 60 * 60 * 1000;

/** How far ahead of the server's clock an entry may be stamped: two days. */
export const EVENT_TIME_AHEAD_MS = 2 * DAY_MS;

/** How far behind: a year and a day, longer than any break-in kept on a phone. */
export const EVENT_TIME_BEHIND_MS = 366 * DAY_MS;

/**
 * Why the server refuses an entry stamped `at` when its own clock says `now`, or null. Checked
 * when an entry arrives, not in the event schema: a device must still read back an entry that an
 * older server stored, whatever its time.
 */
export function eventTimeRefusal(at: number, now: number): string | null {
  if (at > now + EVENT_TIME_AHEAD_MS)
    return `The time of this entry (at) is more than two days ahead of the server's clock; check the date and time on the phone.`;
  if (at < now - EVENT_TIME_BEHIND_MS)
    return `The time of this entry (at) is more than a year behind the server's clock; check the date and time on the phone.`;
  return null;
}

/** The largest magnitude a JavaScript date can hold (ECMA-262, Time Values and Time Range). */
const DATE_LIMIT_MS = 8_640_000_000_000_000;

/** Whether `ms` is a time a date can hold, so formatting it cannot throw. */
export const isDateTime = (ms: number): boolean =>
  Number.isFinite(ms) && Math.abs(ms) <= DATE_LIMIT_MS;

/** ISO text for a time, or null for one no date can hold (a bad time kept from long ago). */
export const isoTime = (ms: number | null): string | null =>
  ms !== null && isDateTime(ms) ? new Date(ms).toISOString() : null;
