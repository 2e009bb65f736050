import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { certificateNumber, workshopInitials } from '../../../shared/review/certificate-number.js';
import { CONFIRM_NEEDS_COMMENT, type SignOffInput } from '../../../shared/review/review.schema.js';
import { RUN_STATE_WORDS } from '../../../shared/review/run-words.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, NotFoundError, ValidationError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import type { MailOutcome, Outbox } from '../mail/outbox.js';
import { visibleRun } from '../runs/run-access.js';
import { loadRunContext, type RunContext } from '../runs/run-context.js';
import { Run } from '../runs/run.entity.js';
import { reserveChangeSeq } from '../../lib/change-seq.js';
import { User } from '../users/user.entity.js';
import { certificateContent } from './certificate-content.js';
import { renderCertificate } from './certificate-pdf.js';
import { writeCertificateFile } from './certificate-files.js';
import { certificateFilePath, type CertificateStore } from './certificate-store.js';
import { Certificate } from './certificate.entity.js';
import { mailDecision } from './decision-mail.js';
import { RunReview } from './run-review.entity.js';

export interface DecisionResult {
  state: 'signed-off' | 'returned';
  certificate: { number: string; downloadUrl: string } | null;
  mail: MailOutcome;
}

type Reviewer = { id: string; name: string; role: string };

/** Only a submitted run can be decided on; a signed-off one never changes again. */
function refuseUnlessSubmitted(run: Run) {
  if (run.state === 'signed-off') {
    throw new ConflictError('This run is already signed off; a signed-off run cannot be changed.', [
      { field: 'decision', message: 'This run is already signed off.' },
    ]);
  }
  if (run.state !== 'submitted') {
    throw new ConflictError(
      `Only a run submitted for review can be confirmed or returned; this one is "${RUN_STATE_WORDS[run.state]}".`,
      [{ field: 'decision', message: 'This run has not been submitted for review.' }],
    );
  }
}

export class SignOffService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly outbox: Outbox,
    private readonly store: CertificateStore,
  ) {}

  async decide(user: SessionUser, runId: string, input: SignOffInput): Promise<DecisionResult> {
    const ctx = await loadRunContext(this.dataSource, user, runId, this.clock.now());
    refuseUnlessSubmitted(ctx.run);
    if (input.decision === 'confirm' && ctx.account.verdict !== 'complete' && !input.comments) {
      throw new ValidationError([{ field: 'comments', message: CONFIRM_NEEDS_COMMENT }]);
    }
    const person = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    const reviewer: Reviewer = { id: person.id, name: person.name, role: person.role };
    const now = this.clock.now();
    const decided =
      input.decision === 'confirm'
        ? await this.confirm(ctx, reviewer, input.comments, now)
        : await this.returnToSkipper(ctx, reviewer, input.comments, now);
    const mail = await mailDecision(
      this.outbox,
      ctx,
      reviewer,
      input.comments,
      decided.certificate,
    );
    await this.dataSource.transaction((manager) =>
      recordAudit(manager, {
        workshopId: ctx.run.workshopId,
        recordType: 'run',
        recordId: ctx.run.id,
        action: mail.sent ? 'mail-sent' : 'mail-failed',
        actor: null,
        at: this.clock.now(),
        detail: mail.words,
      }),
    );
    return {
      state: decided.state,
      certificate: decided.certificate && {
        number: decided.certificate.number,
        downloadUrl: `/api/runs/${runId}/certificate`,
      },
      mail: mail.outcome,
    };
  }

  private async markRun(
    manager: EntityManager,
    ctx: RunContext,
    state: 'signed-off' | 'returned',
    now: Date,
  ) {
    refuseUnlessSubmitted(await manager.getRepository(Run).findOneByOrFail({ id: ctx.run.id }));
    const seq = await reserveChangeSeq(manager);
    await manager
      .getRepository(Run)
      .update(
        { id: ctx.run.id },
        state === 'signed-off' ? { state, signedOffAt: now, seq } : { state, seq },
      );
  }

  private async addReview(
    manager: EntityManager,
    ctx: RunContext,
    reviewer: Reviewer,
    decision: 'confirmed' | 'returned',
    comments: string,
    now: Date,
  ) {
    await manager.getRepository(RunReview).insert({
      id: randomUUID(),
      runId: ctx.run.id,
      workshopId: ctx.run.workshopId,
      decision,
      comments,
      verdict: ctx.account.verdict,
      reviewerId: reviewer.id,
      reviewerName: reviewer.name,
      decidedAt: now,
    });
  }

  /** Signs off, numbers and writes the certificate, all in one transaction (the PDF is removed again if it fails). */
  private async confirm(ctx: RunContext, reviewer: Reviewer, comments: string, now: Date) {
    const id = randomUUID();
    const relative = certificateFilePath(ctx.run.workshopId, id);
    let written = false;
    try {
      return await this.dataSource.transaction(async (manager) => {
        await this.markRun(manager, ctx, 'signed-off', now);
        await this.addReview(manager, ctx, reviewer, 'confirmed', comments, now);
        const number = await this.nextNumber(manager, ctx, now);
        const content = certificateContent(ctx, ctx.charts, {
          number,
          issuedAt: now,
          comments,
          technician: { name: reviewer.name, role: reviewer.role },
        });
        const pdf = renderCertificate(content);
        this.store.write(relative, pdf);
        written = true;
        await manager.getRepository(Certificate).insert({
          id,
          runId: ctx.run.id,
          workshopId: ctx.run.workshopId,
          number,
          issuedAt: now,
          issuedById: reviewer.id,
          content,
          filePath: relative,
          storedAt: now,
          byteSize: pdf.length,
        });
        const audit = {
          workshopId: ctx.run.workshopId,
          recordType: 'run' as const,
          recordId: ctx.run.id,
          actor: reviewer,
          at: now,
        };
        await recordAudit(manager, { ...audit, action: 'run-signed-off', detail: comments });
        await recordAudit(manager, { ...audit, action: 'certificate-issued', detail: number });
        return { state: 'signed-off' as const, certificate: { number, pdf } };
      });
    } catch (error) {
      if (written) this.store.remove(relative);
      throw error;
    }
  }

  private async returnToSkipper(ctx: RunContext, reviewer: Reviewer, comments: string, now: Date) {
    return this.dataSource.transaction(async (manager) => {
      await this.markRun(manager, ctx, 'returned', now);
      await this.addReview(manager, ctx, reviewer, 'returned', comments, now);
      await recordAudit(manager, {
        workshopId: ctx.run.workshopId,
        recordType: 'run',
        recordId: ctx.run.id,
        action: 'run-returned',
        actor: reviewer,
        at: now,
        detail: comments,
      });
      return { state: 'returned' as const, certificate: null };
    });
  }

  /** The year's next running number of the workshop, inside the sign-off's transaction. */
  private async nextNumber(manager: EntityManager, ctx: RunContext, now: Date): Promise<string> {
    const initials = workshopInitials(ctx.workshop.name);
    const year = Number(now.toISOString().slice(0, 4));
    const [{ n }] = await manager.query(
      'SELECT COUNT(*) AS "n" FROM "certificate" WHERE "workshopId" = ? AND "number" LIKE ?',
      [ctx.run.workshopId, `${initials}-${year}-%`],
    );
    return certificateNumber({ initials, year, sequence: Number(n) + 1 });
  }

  /** The certificate PDF for anyone who may see the run; each download goes into the trail. */
  async certificate(user: SessionUser, runId: string): Promise<{ fileName: string; pdf: Buffer }> {
    const run = await visibleRun(this.dataSource, user, runId);
    const certificate = await this.dataSource
      .getRepository(Certificate)
      .findOne({ where: { runId: run.id } });
    if (!certificate)
      throw new NotFoundError('certificate for this run (it is not signed off yet)');
    const pdf =
      this.store.read(certificate.filePath) ??
      (await writeCertificateFile(this.dataSource, this.store, certificate, this.clock.now()));
    const person = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    await this.dataSource.transaction((manager) =>
      recordAudit(manager, {
        workshopId: run.workshopId,
        recordType: 'run',
        recordId: run.id,
        action: 'certificate-downloaded',
        actor: { id: person.id, name: person.name },
        at: this.clock.now(),
        detail: certificate.number,
      }),
    );
    return { fileName: `break-in-certificate-${certificate.number}.pdf`, pdf };
  }
}
