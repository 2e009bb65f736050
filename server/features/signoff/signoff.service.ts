import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { CONFIRM_NEEDS_COMMENT, type SignOffInput } from '../../../shared/review/review.schema.js';
import type { Clock } from '../../lib/clock.js';
import { NotFoundError, ValidationError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import type { MailOutcome, Outbox } from '../mail/outbox.js';
import { visibleRun } from '../runs/run-access.js';
import { loadRunContext, type RunContext } from '../runs/run-context.js';
import { User } from '../users/user.entity.js';
import { certificateContent } from './certificate-content.js';
import { renderCertificate } from './certificate-pdf.js';
import { writeCertificateFile } from './certificate-files.js';
import { certificateFilePath, type CertificateStore } from './certificate-store.js';
import { Certificate } from './certificate.entity.js';
import { mailDecision } from './decision-mail.js';
import {
  addReview,
  insertCertificate,
  markRun,
  nextCertificateNumber,
  recordSignOff,
  refuseUnlessSubmitted,
  type Reviewer,
} from './signoff-records.js';

export interface DecisionResult {
  state: 'signed-off' | 'returned';
  certificate: { number: string; downloadUrl: string } | null;
  mail: MailOutcome;
}

export class SignOffService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly outbox: Outbox,
    private readonly store: CertificateStore,
    /** Has the board count a run afresh after a return changed how it counts (app.ts passes it in). */
    private readonly recount: (manager: EntityManager, runId: string) => Promise<void>,
  ) {}

  async decide(user: SessionUser, runId: string, input: SignOffInput): Promise<DecisionResult> {
    const ctx = await loadRunContext(this.dataSource, user, runId, this.clock.now());
    refuseUnlessSubmitted(ctx.run);
    if (input.decision === 'confirm' && ctx.account.verdict !== 'complete' && !input.comments) {
      throw new ValidationError([{ field: 'comments', message: CONFIRM_NEEDS_COMMENT }]);
    }
    const rerunPhaseIds =
      input.decision === 'return' ? phasesToRerun(ctx, input.rerunPhaseIds) : [];
    const person = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    const reviewer: Reviewer = { id: person.id, name: person.name, role: person.role };
    const now = this.clock.now();
    const decided =
      input.decision === 'confirm'
        ? await this.confirm(ctx, reviewer, input.comments, now)
        : await this.returnToSkipper(
            ctx,
            reviewer,
            { comments: input.comments, rerunPhaseIds },
            now,
          );
    const mail = await mailDecision(
      this.outbox,
      ctx,
      reviewer,
      input.comments,
      decided.certificate,
      {
        rerunPhaseNames: rerunPhaseIds.map(
          (id) => ctx.run.program.phases.find((p) => p.id === id)!.name,
        ),
      },
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

  /** Signs off, numbers and writes the certificate, all in one transaction (the PDF is removed again if it fails). */
  private async confirm(ctx: RunContext, reviewer: Reviewer, comments: string, now: Date) {
    const id = randomUUID();
    const relative = certificateFilePath(ctx.run.workshopId, id);
    let written = false;
    try {
      return await this.dataSource.transaction(async (manager) => {
        await markRun(manager, ctx, 'signed-off', now);
        await addReview(
          manager,
          ctx,
          reviewer,
          { decision: 'confirmed', comments, rerunPhaseIds: [] },
          now,
        );
        const number = await nextCertificateNumber(manager, ctx, now);
        const content = certificateContent(ctx, ctx.charts, {
          number,
          issuedAt: now,
          comments,
          technician: { name: reviewer.name, role: reviewer.role },
        });
        const pdf = renderCertificate(content);
        this.store.write(relative, pdf);
        written = true;
        await insertCertificate(manager, ctx, {
          id,
          number,
          issuedAt: now,
          issuedById: reviewer.id,
          content,
          stored: { at: now, byteSize: pdf.length },
        });
        await recordSignOff(manager, ctx, reviewer, now, { comments, number });
        return { state: 'signed-off' as const, certificate: { number, pdf } };
      });
    } catch (error) {
      if (written) this.store.remove(relative);
      throw error;
    }
  }

  private async returnToSkipper(
    ctx: RunContext,
    reviewer: Reviewer,
    { comments, rerunPhaseIds }: { comments: string; rerunPhaseIds: string[] },
    now: Date,
  ) {
    return this.dataSource.transaction(async (manager) => {
      await markRun(manager, ctx, 'returned', now);
      await addReview(
        manager,
        ctx,
        reviewer,
        { decision: 'returned', comments, rerunPhaseIds },
        now,
      );
      await this.recount(manager, ctx.run.id);
      await recordAudit(manager, {
        workshopId: ctx.run.workshopId,
        recordType: 'run',
        recordId: ctx.run.id,
        action: 'run-returned',
        actor: reviewer,
        at: now,
        detail: `${comments} (to run again: ${rerunPhaseIds
          .map((id) => ctx.run.program.phases.find((p) => p.id === id)!.name)
          .join(', ')})`,
      });
      return { state: 'returned' as const, certificate: null };
    });
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

/** The phases named to run again, each a phase of the run's program, in program order. */
function phasesToRerun(ctx: RunContext, ids: readonly string[]): string[] {
  const unknown = ids.filter((id) => !ctx.run.program.phases.some((p) => p.id === id));
  if (unknown.length > 0)
    throw new ValidationError([
      {
        field: 'rerunPhaseIds',
        message: `The run's program has no phase "${unknown[0]}": choose the phases to run again from its phases.`,
      },
    ]);
  return ctx.run.program.phases.filter((p) => ids.includes(p.id)).map((p) => p.id);
}
