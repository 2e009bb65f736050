import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { dayWords, firstServiceWords } from '../../../shared/review/certificate-words.js';
import type { EngineServiceView } from '../../../shared/service/service-views.js';
import { ConflictError } from '../../lib/errors.js';
import { appLink, engineTitle } from '../mail/mail-templates.js';
import { firstServiceCalendar, type CalendarFile } from '../mail/service-calendar.js';

/**
 * The first service of an engine as a calendar file, or why there is none: it is done already,
 * it cannot be worked out, or it counts engine hours only and so has no day to put in a calendar.
 */
export function firstServiceIcs(
  user: SessionUser,
  view: EngineServiceView,
  now: Date,
  origin?: string,
): CalendarFile {
  if (view.firstServiceDone)
    throw new ConflictError(
      `The first service of this engine is recorded as done on ${dayWords(view.firstServiceDone.date)}: there is nothing left to put in a calendar.`,
    );
  const due = view.firstService;
  if (!due) throw new ConflictError(view.reason ?? 'The first service cannot be worked out.');
  if (!due.dueOn)
    throw new ConflictError(
      `The first service is counted in engine hours only (${firstServiceWords(due)}), so it has no date for a calendar.`,
    );
  return firstServiceCalendar({
    engineId: view.engine.id,
    vesselName: view.engine.vesselName,
    engineTitle: engineTitle(view.engine),
    serialNumber: view.engine.serialNumber,
    workshopName: user.workshopName,
    dueOn: due.dueOn,
    dueWords: firstServiceWords(due),
    hoursWords: `${due.hoursNow.toFixed(1)} h (${due.hoursSource === 'logged' ? 'last logged hour meter' : 'estimated from logged running time'})`,
    // Staff act on the engine page; a skipper's engines are on their start page.
    link: appLink(user.role === 'skipper' ? '/' : `/engines/${view.engine.id}`, origin),
    stamp: now,
  });
}
