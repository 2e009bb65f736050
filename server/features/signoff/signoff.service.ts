import type { DataSource, EntityManager } from 'typeorm';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { SignOffInput } from '../../../shared/review/review.schema.js';
import type { Clock } from '../../lib/clock.js';
import { NotFoundError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import type { MailOutcome, Outbox } from '../mail/outbox.js';
import { visibleRun } from '../runs/run-access.js';
import { loadRunContext } from '../runs/run-context.js';
import { User } from '../users/user.entity.js';
import { writeCertificateFile } from './certificate-files.js';
import type { CertificateStore } from './certificate-store.js';
import { Certificate } from './certificate.entity.js';
import { decisionMail } from './decision-mail.js';
import { checkDecision, forEngine, type CheckedDecision } from './signoff-checks.js';
import type { Reviewer } from './signoff-records.js';
import { confirmRun, phaseNames, returnRun, type Written } from './signoff-writes.js';

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

  /** A decision on one run. */
  async decide(user: SessionUser, runId: string, input: SignOffInput): Promise<DecisionResult> {
    const ctx = await loadRunContext(this.dataSource, user, runId, this.clock.now());
    const [result] = await this.decideAll(user, [checkDecision(ctx, input)]);
    return result;
  }

  /**
   * Decisions on several runs of one vessel (both engines of a twin), saved together or not at
   * all: one refused decision refuses them all, naming the engine and the field
   * (decisions.N.field). Each engine keeps its own run, decision and certificate.
   */
  async decideVessel(
    user: SessionUser,
    vesselId: string,
    items: ReadonlyArray<SignOffInput & { runId: string }>,
  ): Promise<Array<DecisionResult & { runId: string }>> {
    const checked: CheckedDecision[] = [];
    for (const [index, { runId, ...input }] of items.entries()) {
      const ctx = await loadRunContext(this.dataSource, user, runId, this.clock.now());
      checked.push(forEngine(index, ctx, () => checkDecision(ctx, input, vesselId)));
    }
    const results = await this.decideAll(user, checked);
    return results.map((result, i) => ({ runId: checked[i].ctx.run.id, ...result }));
  }

  /**
   * Writes every decision and its e-mail to the skippers in one transaction, then tries the
   * e-mails at once; what the mail server did not take waits in the outbox for the worker.
   */
  private async decideAll(user: SessionUser, decisions: CheckedDecision[]) {
    const person = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    const reviewer: Reviewer = { id: person.id, name: person.name, role: person.role };
    const now = this.clock.now();
    const written: string[] = [];
    let saved: Array<Written & { mailId: string }>;
    try {
      saved = await this.dataSource.transaction(async (manager) => {
        const out: Array<Written & { mailId: string }> = [];
        for (const d of decisions) {
          const decided = await this.write(manager, written, d, reviewer, now);
          out.push({ ...decided, mailId: await this.enqueueMail(manager, d, reviewer, decided) });
        }
        return out;
      });
    } catch (error) {
      for (const relative of written) this.store.remove(relative);
      throw error;
    }
    const mail = await this.outbox.deliver(saved.map((s) => s.mailId));
    return saved.map((decided, i): DecisionResult => ({
      state: decided.state,
      certificate: decided.certificate && {
        number: decided.certificate.number,
        downloadUrl: `/api/runs/${decisions[i].ctx.run.id}/certificate`,
      },
      mail: mail[i],
    }));
  }

  private write(
    manager: EntityManager,
    written: string[],
    { ctx, input, rerunPhaseIds }: CheckedDecision,
    reviewer: Reviewer,
    now: Date,
  ): Promise<Written> {
    const decision = { ctx, reviewer, comments: input.comments, now };
    return input.decision === 'confirm'
      ? confirmRun(manager, this.store, written, decision)
      : returnRun(manager, this.recount, { ...decision, rerunPhaseIds });
  }

  /** The e-mail to the skippers, into the outbox in the decision's own transaction. */
  private enqueueMail(
    manager: EntityManager,
    { ctx, input, rerunPhaseIds }: CheckedDecision,
    reviewer: Reviewer,
    decided: Written,
  ): Promise<string> {
    const { message, about } = decisionMail(ctx, reviewer, input.comments, decided.certificate, {
      rerunPhaseNames: phaseNames(ctx, rerunPhaseIds),
    });
    return this.outbox.enqueue(manager, ctx.workshop.id, message, about);
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
