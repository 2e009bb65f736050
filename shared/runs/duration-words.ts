const SECOND = 1000;
const MINUTE = 60 * SECOND;
const HOUR = 60 * MINUTE;

/** "1 h 05 min", "2 min 30 s", "45 s": how a skipper says a duration, rounded to the second. */
export function durationWords(ms: number): string {
  const totalSeconds = Math.round(Math.max(0, ms) / SECOND);
  const hours = Math.floor(totalSeconds / 3600);
  const minutes = Math.floor((totalSeconds % 3600) / 60);
  const seconds = totalSeconds % 60;
  if (hours > 0) return `${hours} h ${String(minutes).padStart(2, '0')} min`;
  if (minutes > 0) return seconds > 0 ? `${minutes} min ${seconds} s` : `${minutes} min`;
  return `${seconds} s`;
}

export const minutesToMs = (minutes: number): number => minutes * MINUTE;
export const secondsToMs = (seconds: number): number => seconds * SECOND;
export const ONE_HOUR_MS = HOUR;
