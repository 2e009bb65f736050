import type { FirstServiceView } from '../review/first-service';
import { dayWords, firstServiceWords } from '../review/certificate-words';
import type { ServiceInterval } from './service.schema';
import type { EngineServiceView, NextServiceView, ServiceRecordView } from './service-views';

/*
 * How the service due was worked out, in sentences a skipper or a technician can check by hand:
 * where it is counted from, the interval and where it comes from, the limits, the engine hours
 * now and where that figure comes from, and what that makes the state.
 */

const hours = (h: number) => `${h.toFixed(1)} h`;

/** "20 h or 1 month", "100 h or 12 months", "20 h". */
export function intervalWords(interval: ServiceInterval): string {
  const parts = [
    interval.hours === undefined ? null : `${interval.hours} h`,
    interval.months === undefined
      ? null
      : `${interval.months} ${interval.months === 1 ? 'month' : 'months'}`,
  ].filter(Boolean);
  return parts.join(' or ');
}

function leftWords(status: FirstServiceView): string {
  const parts = [
    status.hoursLeft === null ? null : `${hours(Math.max(0, status.hoursLeft))} of running`,
    status.daysLeft === null
      ? null
      : `${Math.max(0, status.daysLeft)} ${status.daysLeft === 1 ? 'day' : 'days'}`,
  ].filter(Boolean);
  return parts.join(' or ');
}

/** The state in words, with which limit decides it. */
export function stateWords(status: FirstServiceView): string {
  if (status.state === 'overdue')
    return status.trigger === 'hours'
      ? 'Overdue: the engine hours have reached the limit.'
      : 'Overdue: the date has been reached.';
  if (status.state === 'due-soon') return `Due soon: ${leftWords(status)} left.`;
  return `Not due yet: ${leftWords(status)} left, whichever runs out first.`;
}

function hoursNowWords(status: FirstServiceView, fromService = false): string {
  if (fromService)
    return `Engine hours now: ${hours(status.hoursNow)}, the hour meter read at the first service (nothing newer is logged).`;
  return status.hoursSource === 'logged'
    ? `Engine hours now: ${hours(status.hoursNow)}, the newest hour meter reading logged on a break-in outing.`
    : `Engine hours now: about ${hours(status.hoursNow)}, estimated as the hour meter at commissioning plus the running time logged in the app since (running without the app is not counted).`;
}

type FirstServiceFacts = Pick<
  EngineServiceView,
  'commissioning' | 'interval' | 'intervalFrom' | 'firstService'
>;

function firstServiceWorkings(view: FirstServiceFacts): string[] {
  const { commissioning, firstService } = view;
  if (!commissioning || !firstService)
    return [
      'The hour meter and the date at commissioning are not both recorded for this engine, so the first service cannot be worked out. Add them to the engine record.',
    ];
  const interval = intervalWords(view.interval);
  return [
    `Commissioned on ${dayWords(commissioning.date)} with ${hours(commissioning.hourMeter)} on the hour meter.`,
    view.intervalFrom
      ? `The break-in program "${view.intervalFrom.programName}" sets the first service at ${interval} after commissioning, whichever comes first.`
      : `No break-in program is assigned yet, so the usual interval counts: ${interval} after commissioning, whichever comes first (common practice).`,
    `So the first service is due ${firstServiceWords(firstService)}.`,
    hoursNowWords(firstService),
    stateWords(firstService),
  ];
}

function nextServiceWorkings(done: ServiceRecordView, next: NextServiceView): string[] {
  return [
    `First service done on ${dayWords(done.date)} at ${hours(done.hourMeter)} on the hour meter, by ${done.doneBy}.`,
    `The next service is counted from it: every ${intervalWords(next.interval)}, whichever comes first (common practice), so it is due ${firstServiceWords(next)}.`,
    hoursNowWords(next, next.hoursFromService),
    stateWords(next),
  ];
}

/** Every sentence of the working, for the engine page and the skipper's run page. */
export function serviceWorkings(
  view: FirstServiceFacts & Pick<EngineServiceView, 'firstServiceDone' | 'nextService'>,
): string[] {
  if (view.firstServiceDone && view.nextService)
    return nextServiceWorkings(view.firstServiceDone, view.nextService);
  return firstServiceWorkings(view);
}
