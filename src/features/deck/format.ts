import type { ThrottleCeiling, ThrottlePosition } from '../../../shared/programs/throttle';

// Small formatters of the deck. Kept here (no date library) so the deck route stays light.

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * "1:05:09" for timers: hours, minutes, seconds; never negative. Time done rounds down and time
 * left rounds up, so the two always add up to the phase's requirement.
 */
export function clockText(ms: number, round: 'down' | 'up' = 'down'): string {
  const seconds = Math.max(0, ms) / 1000;
  const total = round === 'up' ? Math.ceil(seconds) : Math.floor(seconds);
  return `${Math.floor(total / 3600)}:${pad(Math.floor((total % 3600) / 60))}:${pad(total % 60)}`;
}

/** Spoken form of a timer for screen readers: "1 hour 5 minutes". */
export function clockWords(ms: number): string {
  const minutes = Math.floor(Math.max(0, ms) / 60_000);
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  const h = hours > 0 ? `${hours} hour${hours === 1 ? '' : 's'} ` : '';
  return `${h}${rest} minute${rest === 1 ? '' : 's'}`;
}

/** "3 min", "45 s": a short span, rounded up so "ease back within" never promises too much. */
export function shortSpan(ms: number): string {
  const seconds = Math.max(0, Math.ceil(ms / 1000));
  return seconds >= 120 ? `${Math.ceil(seconds / 60)} min` : `${seconds} s`;
}

export const percent = (share: number) => `${Math.floor(Math.min(1, Math.max(0, share)) * 100)} %`;

export const THROTTLE_LABEL: Record<ThrottlePosition, string> = {
  idle: 'Idle',
  quarter: '¼',
  half: '½',
  'three-quarter': '¾',
  full: 'Full',
};

export const THROTTLE_WORDS: Record<ThrottlePosition, string> = {
  idle: 'idle',
  quarter: 'quarter throttle',
  half: 'half throttle',
  'three-quarter': 'three-quarter throttle',
  full: 'full throttle',
};

const CEILING_WORDS: Record<ThrottleCeiling, string> = {
  idle: 'Idle only',
  half: 'Up to ½ throttle',
  'three-quarter': 'Up to ¾ throttle',
  full: 'Up to full throttle',
  varied: 'Varied throttle',
};

export const ceilingText = (ceiling: ThrottleCeiling) => CEILING_WORDS[ceiling];

export const rpmRangeText = (band: { rpmMin: number; rpmMax: number }) =>
  `${Math.round(band.rpmMin)}–${Math.round(band.rpmMax)} rpm`;

export const capitalise = (text: string) => (text ? text[0].toUpperCase() + text.slice(1) : text);

/** "14:05": a moment of today's outing, in the phone's own zone. */
export const timeText = (ms: number) =>
  new Date(ms).toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });

/** "12 May 2026" from an ISO time; the raw text when it is not one. */
export function dateText(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}
