import { firstServiceWords } from '../../../shared/review/certificate-words.js';
import { appLink, certificateMail, engineTitle, returnedMail } from '../mail/mail-templates.js';
import type { MailMessage } from '../../lib/mailer.js';
import type { MailAbout } from '../mail/outbox.js';
import { firstServiceCalendar } from '../mail/service-calendar.js';
import type { RunContext } from '../runs/run-context.js';

export interface DecisionMailOptions {
  /** The app's public origin for the link to the run; RINGSEAT_ORIGIN or the local address when absent. */
  origin?: string;
  /** Names of the phases sent back to be run again (a return only). */
  rerunPhaseNames?: string[];
  /** When the calendar file is made; now when absent. */
  now?: Date;
}

/** The first service as a calendar event, when it falls due on a date. */
function calendarOf(ctx: RunContext, link: string, now: Date | undefined) {
  const due = ctx.firstService;
  if (!due?.dueOn) return null;
  return firstServiceCalendar({
    engineId: ctx.engine.id,
    vesselName: ctx.vessel.name,
    engineTitle: engineTitle(ctx.engine),
    serialNumber: ctx.engine.serialNumber,
    workshopName: ctx.workshop.name,
    dueOn: due.dueOn,
    dueWords: firstServiceWords(due),
    hoursWords: `${due.hoursNow.toFixed(1)} h (${due.hoursSource === 'logged' ? 'last logged hour meter' : 'estimated from logged running time'})`,
    link,
    stamp: now,
  });
}

/** What both decisions' e-mails say alike: to whom, from which workshop, about which engine. */
const commonParts = (ctx: RunContext, reviewer: { name: string }, link: string) => ({
  to: ctx.skippers.map((s) => s.email),
  replyTo: ctx.workshop.email || undefined,
  workshopName: ctx.workshop.name,
  vesselName: ctx.vessel.name,
  engine: ctx.engine,
  technicianName: reviewer.name,
  link,
});

/**
 * The e-mail that tells the vessel's skippers what the workshop decided: the certificate (and
 * the first service as a calendar file) attached, or the reasons to carry on; either way with a
 * link to the run. It goes into the outbox with the decision, in the same transaction.
 */
export function decisionMail(
  ctx: RunContext,
  reviewer: { name: string },
  comments: string,
  certificate: { number: string; pdf: Buffer } | null,
  options: DecisionMailOptions = {},
): { message: MailMessage; about: MailAbout } {
  const link = appLink(`/runs/${ctx.run.id}`, options.origin);
  const common = commonParts(ctx, reviewer, link);
  const message = certificate
    ? certificateMail({
        ...common,
        number: certificate.number,
        pdf: certificate.pdf,
        firstServiceWords: ctx.firstService
          ? firstServiceWords(ctx.firstService)
          : 'ask the workshop',
        calendar: calendarOf(ctx, link, options.now),
      })
    : returnedMail({
        ...common,
        comments,
        reasons: ctx.account.phases.flatMap((p) => p.reasons.map((r) => r.message)),
        rerunPhaseNames: options.rerunPhaseNames,
      });
  const what = certificate ? `Certificate ${certificate.number} e-mailed` : 'Return e-mailed';
  return { message, about: { recordType: 'run', recordId: ctx.run.id, what } };
}
