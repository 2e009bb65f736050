import type { MailMessage } from '../../lib/mailer.js';
import { paragraphs, SIGNATURE } from './mail-templates.js';

/* The e-mails about a person's own account: a forgotten password, and word of a change. */

export function passwordResetMail(input: {
  to: string;
  name: string;
  workshopName: string;
  link: string;
  validMinutes: number;
}): MailMessage {
  return {
    to: [input.to],
    subject: `Choose a new Ringseat password`,
    text:
      paragraphs(
        `Hello ${input.name},`,
        `Someone, hopefully you, asked to choose a new password for your Ringseat account at ${input.workshopName}.`,
        `Open this link to choose it. It works once, for ${input.validMinutes} minutes:\n${input.link}`,
        `If you did not ask, ignore this e-mail: your password stays as it is.`,
      ) + SIGNATURE(input.workshopName),
  };
}

/** Sent after the password changed, so a change the owner did not make does not go unnoticed. */
export function passwordChangedMail(input: {
  to: string;
  name: string;
  workshopName: string;
  how: 'changed' | 'reset';
}): MailMessage {
  const what =
    input.how === 'changed'
      ? 'was changed from the account page'
      : 'was reset through a link sent to this address';
  return {
    to: [input.to],
    subject: `Your Ringseat password was changed`,
    text:
      paragraphs(
        `Hello ${input.name},`,
        `The password of your Ringseat account at ${input.workshopName} ${what}. Every other device signed in to it has been signed out.`,
        `If this was not you, choose a new password with "Forgot your password?" on the sign-in page at once, and tell your workshop's manager.`,
      ) + SIGNATURE(input.workshopName),
  };
}
