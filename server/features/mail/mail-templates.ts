import { positionLabel } from '../../../shared/engines/engine.schema.js';
import { loadConfig } from '../../lib/config.js';
import type { MailMessage } from '../../lib/mailer.js';
import type { CalendarFile } from './service-calendar.js';

/*
 * The words of every e-mail the app sends. Plain text: it reads the same in every mail program,
 * on a phone with a weak signal, and to a screen reader. Each names the vessel and the engine
 * (position, maker, model, serial), since a workshop's customers often have more than one, and
 * links to the page that acts on it.
 */

export const SIGNATURE = (workshop: string) =>
  `\n\n${workshop}\nSent by Ringseat, the break-in logbook.`;

/** Blocks of text, the missing ones left out, a blank line between. */
export const paragraphs = (...blocks: Array<string | null | undefined | false>) =>
  blocks.filter(Boolean).join('\n\n');

const bullets = (heading: string, lines: readonly string[]) =>
  lines.length > 0 ? `${heading}\n${lines.map((l) => `- ${l}`).join('\n')}` : null;

/**
 * An address in the app for an e-mail: the public origin when the server knows it (set by the
 * caller, else RINGSEAT_ORIGIN), otherwise the address the server listens on locally.
 */
export function appLink(path: string, origin?: string): string {
  const config = loadConfig();
  const base = origin ?? config.publicOrigin ?? `http://localhost:${config.port}`;
  return `${base.replace(/\/+$/, '')}${path}`;
}

export interface MailEngine {
  position: string;
  maker: string;
  model: string;
  serialNumber: string;
}

const positionWord = (position: string) =>
  (positionLabel[position as keyof typeof positionLabel] ?? position).toLowerCase();

/** "inboard engine (Brennholt B3-21 Marine)": short enough for a subject line. */
export const engineTitle = (e: MailEngine) =>
  `${positionWord(e.position)} engine (${e.maker} ${e.model})`;

/** The two lines that say which boat and which engine, serial included. */
const whichEngine = (vesselName: string, e: MailEngine) =>
  `Vessel: ${vesselName}\nEngine: ${positionWord(e.position)}, ${e.maker} ${e.model}, serial ${e.serialNumber}`;

export function inviteMail(input: {
  to: string;
  workshopName: string;
  inviterName: string;
  role: string;
  link: string;
  expiresOn: string;
  /** The vessels a skipper is linked to on acceptance, with their engines. */
  vessels?: Array<{ name: string; engines: MailEngine[] }>;
}): MailMessage {
  const what =
    input.role === 'skipper'
      ? 'log the break-in of your engine and send it to the workshop'
      : 'work with the team on break-in runs';
  const vessels = (input.vessels ?? []).map((v) =>
    v.engines.length === 0
      ? v.name
      : `${v.name}: ${v.engines.map((e) => `${positionWord(e.position)} engine, ${e.maker} ${e.model}, serial ${e.serialNumber}`).join('; ')}`,
  );
  return {
    to: [input.to],
    subject: `${input.workshopName} invites you to Ringseat`,
    text:
      paragraphs(
        `${input.inviterName} of ${input.workshopName} invites you to Ringseat as ${input.role}, to ${what}.`,
        bullets('You will see these vessels and engines:', vessels),
        `Open this link to choose your password (it works once, until ${input.expiresOn}):\n${input.link}`,
        `If you did not expect this invite, ignore this e-mail.`,
      ) + SIGNATURE(input.workshopName),
  };
}

interface DecisionMailInput {
  to: string[];
  replyTo?: string;
  workshopName: string;
  vesselName: string;
  engine: MailEngine;
  technicianName: string;
  /** The skipper's run page. */
  link: string;
}

export function certificateMail(
  input: DecisionMailInput & {
    number: string;
    firstServiceWords: string;
    pdf: Buffer;
    /** The first service as a calendar event, when it has a date. */
    calendar?: CalendarFile | null;
  },
): MailMessage {
  const title = engineTitle(input.engine);
  return {
    to: input.to,
    replyTo: input.replyTo,
    subject: `Break-in signed off: ${input.vesselName}, ${title} (certificate ${input.number})`,
    text:
      paragraphs(
        `${input.technicianName} of ${input.workshopName} has reviewed the break-in of the ${title} on ${input.vesselName} and signed it off.`,
        whichEngine(input.vesselName, input.engine),
        `Certificate number: ${input.number} (the PDF is attached; keep it with the engine's papers for the warranty).\n` +
          `First service: ${input.firstServiceWords}. Book it with the workshop.` +
          (input.calendar ? ' The attached calendar file puts the date in your calendar.' : ''),
        `See the run in Ringseat: ${input.link}`,
        `The engine maker's manual and warranty terms come first; where they ask for more, follow them.`,
      ) + SIGNATURE(input.workshopName),
    attachments: [
      {
        filename: `break-in-certificate-${input.number}.pdf`,
        content: input.pdf,
        contentType: 'application/pdf',
      },
      ...(input.calendar ? [input.calendar] : []),
    ],
  };
}

export function returnedMail(
  input: DecisionMailInput & {
    comments: string;
    reasons: string[];
    /** The phases the workshop sent back to be run again, by name. */
    rerunPhaseNames?: string[];
  },
): MailMessage {
  const title = engineTitle(input.engine);
  return {
    to: input.to,
    replyTo: input.replyTo,
    subject: `Break-in returned: ${input.vesselName}, ${title}`,
    text:
      paragraphs(
        `${input.technicianName} of ${input.workshopName} has reviewed the break-in of the ${title} on ${input.vesselName} and returned it to you.`,
        whichEngine(input.vesselName, input.engine),
        `The workshop's comments:\n${input.comments}`,
        bullets('Phases to run again:', input.rerunPhaseNames ?? []),
        bullets('What the log shows:', input.reasons),
        `Open the run in Ringseat to see why and carry on: ${input.link}\n` +
          `Logging is open again in the app: carry on with the phase and submit the run when it is done.\n` +
          `Before you run the engine: clip on the kill-switch lanyard, keep clear of exhaust fumes, and follow the engine maker's manual.`,
      ) + SIGNATURE(input.workshopName),
  };
}

export function serviceReminderMail(input: {
  to: string[];
  replyTo?: string;
  workshopName: string;
  vesselName: string;
  engine: MailEngine;
  overdue: boolean;
  dueWords: string;
  hoursWords: string;
  /** The engine page. */
  link: string;
}): MailMessage {
  const state = input.overdue ? 'is overdue' : 'is due soon';
  const title = engineTitle(input.engine);
  return {
    to: input.to,
    replyTo: input.replyTo,
    subject: `First service ${state}: ${input.vesselName}, ${title}`,
    text:
      paragraphs(
        `The first service of the ${title} on ${input.vesselName} ${state}.`,
        whichEngine(input.vesselName, input.engine),
        `Due: ${input.dueWords}.\nEngine hours now: ${input.hoursWords}.`,
        `Many makers' warranties depend on this service being done on time. Contact ${input.workshopName} to book it.`,
        `The engine in Ringseat: ${input.link}`,
      ) + SIGNATURE(input.workshopName),
  };
}
