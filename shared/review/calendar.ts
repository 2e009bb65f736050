/*
 * Calendar-day arithmetic on YYYY-MM-DD strings with plain integer maths. The runs board works
 * out the first service of every run on each visit (2,000 runs in a large workshop), where the
 * general date library costs tens of milliseconds; these give the same answers (checked against
 * shared/service in calendar.test.ts) for a fraction of it.
 */

const DAY_MS = 86_400_000;

function parts(date: string): [number, number, number] {
  return [Number(date.slice(0, 4)), Number(date.slice(5, 7)), Number(date.slice(8, 10))];
}

const daysInMonth = (year: number, month: number) =>
  new Date(Date.UTC(year, month, 0)).getUTCDate();

/** The same day `months` later, clamped to the end of a shorter month (31 Jan + 1 month = 28/29 Feb). */
export function addMonthsToDay(date: string, months: number): string {
  const [y, m, d] = parts(date);
  const index = y * 12 + (m - 1) + months;
  const year = Math.floor(index / 12);
  const month = (index % 12) + 1;
  const day = Math.min(d, daysInMonth(year, month));
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** Whole calendar days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  const [y1, m1, d1] = parts(from);
  const [y2, m2, d2] = parts(to);
  return Math.round((Date.UTC(y2, m2 - 1, d2) - Date.UTC(y1, m1 - 1, d1)) / DAY_MS);
}
