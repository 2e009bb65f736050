import type { MailMessage } from '../../lib/mailer.js';

/*
 * The words of every e-mail the app sends. Plain text: it reads the same in every mail program,
 * on a phone with a weak signal, and to a screen reader.
 */

const SIGNATURE = (workshop: string) => `\n\n${workshop}\nSent by Ringseat, the break-in logbook.`;

export function inviteMail(input: {
  to: string;
  workshopName: string;
  inviterName: string;
  role: string;
  link: string;
  expiresOn: string;
}): MailMessage {
  const what =
    input.role === 'skipper'
      ? 'log the break-in of your engine and send it to the workshop'
      : 'work with the team on break-in runs';
  return {
    to: [input.to],
    subject: `${input.workshopName} invites you to Ringseat`,
    text:
      `${input.inviterName} of ${input.workshopName} invites you to Ringseat as ${input.role}, to ${what}.\n\n` +
      `Open this link to choose your password (it works once, until ${input.expiresOn}):\n${input.link}\n\n` +
      `If you did not expect this invite, ignore this e-mail.` +
      SIGNATURE(input.workshopName),
  };
}

export function certificateMail(input: {
  to: string[];
  replyTo?: string;
  workshopName: string;
  vesselName: string;
  engineTitle: string;
  number: string;
  technicianName: string;
  firstServiceWords: string;
  pdf: Buffer;
}): MailMessage {
  return {
    to: input.to,
    replyTo: input.replyTo,
    subject: `Break-in signed off: ${input.vesselName}, ${input.engineTitle} (certificate ${input.number})`,
    text:
      `${input.technicianName} of ${input.workshopName} has reviewed the break-in of the ${input.engineTitle} on ${input.vesselName} and signed it off.\n\n` +
      `Certificate number: ${input.number} (the PDF is attached; keep it with the engine's papers for the warranty).\n` +
      `First service: ${input.firstServiceWords}. Book it with the workshop.\n\n` +
      `The engine maker's manual and warranty terms come first; where they ask for more, follow them.` +
      SIGNATURE(input.workshopName),
    attachments: [
      {
        filename: `break-in-certificate-${input.number}.pdf`,
        content: input.pdf,
        contentType: 'application/pdf',
      },
    ],
  };
}

export function returnedMail(input: {
  to: string[];
  replyTo?: string;
  workshopName: string;
  vesselName: string;
  engineTitle: string;
  technicianName: string;
  comments: string;
  reasons: string[];
}): MailMessage {
  const reasons =
    input.reasons.length > 0
      ? `What the log shows:\n${input.reasons.map((r) => `- ${r}`).join('\n')}\n\n`
      : '';
  return {
    to: input.to,
    replyTo: input.replyTo,
    subject: `Break-in returned: ${input.vesselName}, ${input.engineTitle}`,
    text:
      `${input.technicianName} of ${input.workshopName} has reviewed the break-in of the ${input.engineTitle} on ${input.vesselName} and returned it to you.\n\n` +
      `The workshop's comments:\n${input.comments}\n\n` +
      reasons +
      `Logging is open again in the app: carry on with the phase and submit the run when it is done.\n` +
      `Before you run the engine: clip on the kill-switch lanyard, keep clear of exhaust fumes, and follow the engine maker's manual.` +
      SIGNATURE(input.workshopName),
  };
}

export function serviceReminderMail(input: {
  to: string[];
  replyTo?: string;
  workshopName: string;
  vesselName: string;
  engineTitle: string;
  serialNumber: string;
  overdue: boolean;
  dueWords: string;
  hoursWords: string;
}): MailMessage {
  const state = input.overdue ? 'is overdue' : 'is due soon';
  return {
    to: input.to,
    replyTo: input.replyTo,
    subject: `First service ${state}: ${input.vesselName}, ${input.engineTitle}`,
    text:
      `The first service of the ${input.engineTitle} on ${input.vesselName} ${state} (engine serial ${input.serialNumber}).\n\n` +
      `Due: ${input.dueWords}.\nEngine hours now: ${input.hoursWords}.\n\n` +
      `Many makers' warranties depend on this service being done on time. Contact ${input.workshopName} to book it.` +
      SIGNATURE(input.workshopName),
  };
}
