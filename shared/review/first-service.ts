import type { ServiceInterval } from '../service/service.schema';
import { DUE_SOON_WINDOW, type ServiceState, type ServiceStatus } from '../service/service-due';
import { addMonthsToDay, daysBetween } from './calendar';

/** Where the engine-hours figure came from: a logged hour meter, or commissioning plus logged running time. */
export type HoursSource = 'logged' | 'estimated';

export interface EngineHours {
  hours: number;
  source: HoursSource;
}

const MS_PER_HOUR = 3_600_000;

/**
 * Engine hours now. A hour meter read off the engine is the truth; without one the best figure
 * is the meter at commissioning plus the running time logged since (a floor: the engine may
 * have run without the app).
 */
export function engineHoursNow(
  commissioningHours: number,
  logged: { hourMeter: number } | null,
  runningMs: number,
): EngineHours {
  if (logged) return { hours: logged.hourMeter, source: 'logged' };
  return { hours: commissioningHours + runningMs / MS_PER_HOUR, source: 'estimated' };
}

export interface FirstServiceView extends ServiceStatus {
  hoursNow: number;
  hoursSource: HoursSource;
}

const RANK: Record<ServiceState, number> = { 'not-due': 0, 'due-soon': 1, overdue: 2 };
const stateFrom = (left: number, window: number): ServiceState =>
  left <= 0 ? 'overdue' : left <= window ? 'due-soon' : 'not-due';

/**
 * First service from commissioning, with its state on `today` (a calendar date in the workshop's
 * zone): the same rules as serviceDue + serviceStatus in shared/service (whichever limit comes
 * first; hours win a tie), on the board's fast calendar arithmetic.
 */
export function firstServiceView(
  commissioning: { hourMeter: number; date: string },
  interval: ServiceInterval,
  hours: EngineHours,
  today: string,
): FirstServiceView {
  const dueAtHours = interval.hours === undefined ? null : commissioning.hourMeter + interval.hours;
  const dueOn =
    interval.months === undefined ? null : addMonthsToDay(commissioning.date, interval.months);
  const hoursLeft = dueAtHours === null ? null : dueAtHours - hours.hours;
  const daysLeft = dueOn === null ? null : daysBetween(today, dueOn);
  const byHours = hoursLeft === null ? null : stateFrom(hoursLeft, DUE_SOON_WINDOW.hours);
  const byDate = daysLeft === null ? null : stateFrom(daysLeft, DUE_SOON_WINDOW.days);
  let trigger: 'hours' | 'date' = byHours === null ? 'date' : 'hours';
  if (byHours !== null && byDate !== null && RANK[byDate] > RANK[byHours]) trigger = 'date';
  const state = (trigger === 'hours' ? byHours : byDate) as ServiceState;
  return {
    dueAtHours,
    dueOn,
    state,
    trigger,
    hoursLeft,
    daysLeft,
    hoursNow: Math.round(hours.hours * 10) / 10,
    hoursSource: hours.source,
  };
}

/** Today's date (YYYY-MM-DD) in an IANA time zone; UTC when the zone is unknown. */
export function calendarDateIn(timeZone: string, at: Date): string {
  try {
    return new Intl.DateTimeFormat('en-CA', {
      timeZone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
    }).format(at);
  } catch {
    return at.toISOString().slice(0, 10);
  }
}
