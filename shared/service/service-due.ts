import { addMonths, differenceInCalendarDays, format, parseISO } from 'date-fns';
import {
  FIRST_SERVICE_DEFAULT,
  type CalendarDate,
  type ServiceInterval,
  type ServiceStart,
} from './service.schema';

export interface ServiceDue {
  /** Hour meter reading at which service falls due, if the interval counts hours. */
  dueAtHours: number | null;
  /** Calendar day on which service falls due, if the interval counts months. */
  dueOn: CalendarDate | null;
}

// Calendar dates are parsed and printed in the same (local) zone, so the zone never shows.
const addMonthsToDate = (date: CalendarDate, months: number): CalendarDate =>
  format(addMonths(parseISO(date), months), 'yyyy-MM-dd');

/** Service due from a start (commissioning or last service) by hours and/or months. */
export function serviceDue(start: ServiceStart, interval: ServiceInterval): ServiceDue {
  return {
    dueAtHours: interval.hours === undefined ? null : start.hourMeter + interval.hours,
    // date-fns clamps to the month's last day: 31 Jan + 1 month is 28/29 Feb.
    dueOn: interval.months === undefined ? null : addMonthsToDate(start.date, interval.months),
  };
}

export type ServiceState = 'not-due' | 'due-soon' | 'overdue';

export interface ServiceStatus extends ServiceDue {
  state: ServiceState;
  /** The limit giving the more urgent state; hours when both agree (an hour meter is read, a calendar is not). */
  trigger: 'hours' | 'date';
  hoursLeft: number | null;
  daysLeft: number | null;
}

/**
 * How early "due soon" shows. Our own choice for a reminder window, not a trade figure;
 * callers may pass their own.
 */
export const DUE_SOON_WINDOW = { hours: 5, days: 7 };

function stateFrom(left: number, window: number): ServiceState {
  if (left <= 0) return 'overdue';
  return left <= window ? 'due-soon' : 'not-due';
}

const STATE_RANK: Record<ServiceState, number> = { 'not-due': 0, 'due-soon': 1, overdue: 2 };

/** Service status now, by whichever limit (hours or date) comes first. */
export function serviceStatus(
  due: ServiceDue,
  now: { hourMeter: number; date: CalendarDate },
  window: { hours: number; days: number } = DUE_SOON_WINDOW,
): ServiceStatus {
  const hoursLeft = due.dueAtHours === null ? null : due.dueAtHours - now.hourMeter;
  const daysLeft =
    due.dueOn === null ? null : differenceInCalendarDays(parseISO(due.dueOn), parseISO(now.date));
  const byHours = hoursLeft === null ? null : stateFrom(hoursLeft, window.hours);
  const byDate = daysLeft === null ? null : stateFrom(daysLeft, window.days);
  let trigger: 'hours' | 'date' = byHours === null ? 'date' : 'hours';
  if (byHours !== null && byDate !== null && STATE_RANK[byDate] > STATE_RANK[byHours])
    trigger = 'date';
  const state = (trigger === 'hours' ? byHours : byDate) as ServiceState;
  return { ...due, state, trigger, hoursLeft, daysLeft };
}

/** First service from commissioning; by default 20 h or 1 month (common practice; BoatUS "Long Life – Outboard Maintenance"). */
export const firstServiceDue = (
  commissioning: ServiceStart,
  interval: ServiceInterval = FIRST_SERVICE_DEFAULT,
): ServiceDue => serviceDue(commissioning, interval);
