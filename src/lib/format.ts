import { format, isValid, parseISO } from 'date-fns';

/** "12 May 2026"; the raw text when it is not a date the app understands. */
export function formatDate(iso: string): string {
  const date = parseISO(iso);
  return isValid(date) ? format(date, 'd MMM yyyy') : iso;
}

/** "12 May 2026, 14:05" in the device's time zone; the raw text when it is not a date. */
export function formatDateTime(iso: string): string {
  const date = parseISO(iso);
  return isValid(date) ? format(date, 'd MMM yyyy, HH:mm') : iso;
}

/** RPM without grouping separators, as tachometers and makers' tables print them. */
export const formatRpmRange = (min: number, max: number) => `${Math.round(min)}–${Math.round(max)}`;

export const formatHours = (hours: number) => hours.toFixed(1);

export const capitalise = (text: string) => (text ? text[0].toUpperCase() + text.slice(1) : text);
