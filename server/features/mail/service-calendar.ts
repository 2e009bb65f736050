import ical, { ICalCalendarMethod } from 'ical-generator';

/** The first service as one all-day calendar event (RFC 5545), for the engine page and the sign-off e-mail. */
export interface FirstServiceEvent {
  engineId: string;
  vesselName: string;
  /** "inboard engine (Brennholt B3-21 Marine)". */
  engineTitle: string;
  serialNumber: string;
  workshopName: string;
  /** The calendar day it falls due, YYYY-MM-DD. */
  dueOn: string;
  /** "at 22.0 h on the hour meter or on 27 Dec 2026, whichever comes first". */
  dueWords: string;
  /** "25.3 h (last logged hour meter)". */
  hoursWords: string;
  /** The page that acts on it. */
  link: string;
  /** When the file is made (DTSTAMP); now when absent. */
  stamp?: Date;
}

export interface CalendarFile {
  filename: string;
  content: Buffer;
  contentType: string;
}

const DAY_MS = 86_400_000;

const slug = (text: string) =>
  text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '') || 'engine';

/**
 * An all-day event on the due day. The dates are given as UTC midnights with no time zone, which
 * ical-generator writes as plain DATE values (VALUE=DATE), so the day is the same in every zone.
 * The end is the next day: RFC 5545 (3.6.1) counts an all-day DTEND as exclusive. The UID is the
 * engine's, so importing a newer file moves the event instead of adding a second one.
 */
export function firstServiceCalendar(event: FirstServiceEvent): CalendarFile {
  const start = new Date(`${event.dueOn}T00:00:00Z`);
  const summary = `First service: ${event.vesselName}, ${event.engineTitle}`;
  const calendar = ical({
    prodId: { company: 'Ringseat', product: 'Ringseat', language: 'EN' },
    method: ICalCalendarMethod.PUBLISH,
    name: summary,
  });
  calendar.createEvent({
    id: `first-service-${event.engineId}@ringseat`,
    start,
    end: new Date(start.getTime() + DAY_MS),
    allDay: true,
    stamp: event.stamp ?? new Date(),
    summary,
    description:
      `First service of the ${event.engineTitle} on ${event.vesselName} (serial ${event.serialNumber}).\n` +
      `Due ${event.dueWords}.\n` +
      `Engine hours when this file was made: ${event.hoursWords}.\n` +
      `Book it with ${event.workshopName}: ${event.link}\n` +
      `The engine maker's manual and warranty terms come first.`,
    url: event.link,
  });
  return {
    filename: `first-service-${slug(event.vesselName)}-${slug(event.serialNumber)}.ics`,
    content: Buffer.from(calendar.toString(), 'utf8'),
    contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
  };
}
