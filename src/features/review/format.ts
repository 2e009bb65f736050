import { format } from 'date-fns';
import { durationWords } from '../../../shared/runs/duration-words';
import { isDateTime } from '../../../shared/runs/event-time';

const UNKNOWN = 'unknown time';

/** "26 Nov 2026, 14:52" in the viewer's zone; "unknown time" for a time no date can hold. */
export function formatMoment(value: number | string): string {
  const date = new Date(value);
  return isDateTime(date.getTime()) ? format(date, 'd MMM yyyy, HH:mm') : UNKNOWN;
}

/** "14:52" when both ends fall on one day, else the full moment. */
export function formatSpan(fromMs: number, toMs: number): string {
  if (!isDateTime(fromMs) || !isDateTime(toMs))
    return `${formatMoment(fromMs)} – ${formatMoment(toMs)}`;
  const from = formatMoment(fromMs);
  const sameDay = format(fromMs, 'yyyy-MM-dd') === format(toMs, 'yyyy-MM-dd');
  return `${from} – ${sameDay ? format(toMs, 'HH:mm') : formatMoment(toMs)}`;
}

export const formatDuration = durationWords;

/** Running minutes on the chart axis as "3 h 05" or "42 min". */
export function formatRunMinutes(minutes: number): string {
  const total = Math.round(minutes);
  const h = Math.floor(total / 60);
  const m = total % 60;
  return h > 0 ? `${h} h ${String(m).padStart(2, '0')}` : `${m} min`;
}
