import { firstServiceWords } from '../../../shared/review/certificate-words.js';
import { certificateMail, returnedMail } from '../mail/mail-templates.js';
import { outcomeWords, type MailOutcome, type Outbox } from '../mail/outbox.js';
import type { RunContext } from '../runs/run-context.js';

const engineTitle = (ctx: RunContext) =>
  `${ctx.engine.position} engine (${ctx.engine.maker} ${ctx.engine.model}, serial ${ctx.engine.serialNumber})`;

/** Tells the vessel's skippers what the workshop decided: the certificate attached, or the reasons to carry on. */
export async function mailDecision(
  outbox: Outbox,
  ctx: RunContext,
  reviewer: { name: string },
  comments: string,
  certificate: { number: string; pdf: Buffer } | null,
): Promise<{ outcome: MailOutcome; sent: boolean; words: string }> {
  const to = ctx.skippers.map((s) => s.email);
  const common = {
    to,
    replyTo: ctx.workshop.email || undefined,
    workshopName: ctx.workshop.name,
    vesselName: ctx.vessel.name,
    engineTitle: engineTitle(ctx),
    technicianName: reviewer.name,
  };
  const outcome = certificate
    ? await outbox.send(
        certificateMail({
          ...common,
          number: certificate.number,
          pdf: certificate.pdf,
          firstServiceWords: ctx.firstService
            ? firstServiceWords(ctx.firstService)
            : 'ask the workshop',
        }),
      )
    : await outbox.send(
        returnedMail({
          ...common,
          comments,
          reasons: ctx.account.phases.flatMap((p) => p.reasons.map((r) => r.message)),
        }),
      );
  const words = outcomeWords(
    certificate ? `Certificate ${certificate.number} e-mailed` : 'Return e-mailed',
    outcome,
  );
  return { outcome, sent: outcome.sent, words };
}
