import type { ThrottleCeiling } from '../programs/throttle';
import { durationWords } from '../runs/duration-words';
import type { CertificateContent } from './certificate-content';

/** "30 Nov 2026" in the workshop's zone; the date alone for a calendar day (YYYY-MM-DD). */
export function dayWords(value: string, timeZone = 'UTC'): string {
  const date = /^\d{4}-\d{2}-\d{2}$/.test(value) ? new Date(`${value}T12:00:00Z`) : new Date(value);
  const zone = /^\d{4}-\d{2}-\d{2}$/.test(value) ? 'UTC' : timeZone;
  try {
    return new Intl.DateTimeFormat('en-GB', {
      timeZone: zone,
      day: 'numeric',
      month: 'short',
      year: 'numeric',
    }).format(date);
  } catch {
    return date.toISOString().slice(0, 10);
  }
}

/** "30 Nov 2026, 17:30" in the workshop's zone. */
export function momentWords(iso: string, timeZone = 'UTC'): string {
  try {
    return new Intl.DateTimeFormat('en-GB', {
      timeZone,
      day: 'numeric',
      month: 'short',
      year: 'numeric',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    }).format(new Date(iso));
  } catch {
    return iso.slice(0, 16).replace('T', ' ');
  }
}

export const CEILING_WORDS: Record<ThrottleCeiling, string> = {
  idle: 'idle only',
  half: 'half throttle or less',
  'three-quarter': 'three-quarter throttle or less',
  full: 'up to full throttle',
  varied: 'varied throttle',
};

/** "at 22.0 h on the hour meter or on 27 Dec 2026, whichever comes first". */
export function firstServiceWords(due: {
  dueAtHours: number | null;
  dueOn: string | null;
}): string {
  const hours =
    due.dueAtHours === null ? null : `at ${due.dueAtHours.toFixed(1)} h on the hour meter`;
  const date = due.dueOn === null ? null : `on ${dayWords(due.dueOn)}`;
  if (hours && date) return `${hours} or ${date}, whichever comes first`;
  return hours ?? date ?? 'not set';
}

export const minutesWords = (minutes: number) => durationWords(minutes * 60_000);

/** The plain statement every certificate carries. */
export function certificateStatement(
  c: Pick<CertificateContent, 'workshop' | 'technician'>,
): string {
  return (
    `This certificate records the break-in as it was logged in Ringseat and judged against the program shown, ` +
    `reviewed and signed off by ${c.technician.name} of ${c.workshop.name}. The engine maker's manual, its warranty terms ` +
    `and local rules come first; where they ask for more, they apply.`
  );
}
