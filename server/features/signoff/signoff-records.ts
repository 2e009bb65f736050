import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { certificateNumber, workshopInitials } from '../../../shared/review/certificate-number.js';
import type { CertificateContent } from '../../../shared/review/certificate-content.js';
import { RUN_STATE_WORDS } from '../../../shared/review/run-words.js';
import { reserveChangeSeq } from '../../lib/change-seq.js';
import { ConflictError } from '../../lib/errors.js';
import { recordAudit } from '../audit/audit.service.js';
import type { RunContext } from '../runs/run-context.js';
import { Run } from '../runs/run.entity.js';
import { certificateFilePath } from './certificate-store.js';
import { Certificate } from './certificate.entity.js';
import { RunReview } from './run-review.entity.js';
import type { RunDecisionView } from '../../../shared/runs/run-view.js';

/*
 * The rows a decision on a run writes, each inside the caller's transaction. The sign-off
 * service and the demo workshop's signed-off run both write them through these functions.
 */

export type Reviewer = { id: string; name: string; role: string };

/** Only a submitted run can be decided on; a signed-off one never changes again. */
export function refuseUnlessSubmitted(run: Run) {
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

/** Moves the run on, checking its state again inside the transaction (another decision may have won). */
export async function markRun(
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

export interface ReviewDecision {
  decision: 'confirmed' | 'returned';
  comments: string;
  /** The phases sent back to be run again; empty when confirmed. */
  rerunPhaseIds: string[];
}

/**
 * Keeps the decision (run_review keeps every one) and writes it on the run as its latest. A
 * return also sets, for each phase sent back, the moment from which it counts again (the re-run
 * rule in shared/runs/phase-tally.ts); the caller has the board's summary of the run counted afresh.
 */
export async function addReview(
  manager: EntityManager,
  ctx: RunContext,
  reviewer: Pick<Reviewer, 'id' | 'name'>,
  review: ReviewDecision,
  now: Date,
) {
  const { decision, comments, rerunPhaseIds } = review;
  await manager.getRepository(RunReview).insert({
    id: randomUUID(),
    runId: ctx.run.id,
    workshopId: ctx.run.workshopId,
    decision,
    comments,
    rerunPhaseIds,
    verdict: ctx.account.verdict,
    reviewerId: reviewer.id,
    reviewerName: reviewer.name,
    decidedAt: now,
  });
  const lastDecision: RunDecisionView = {
    decision,
    comments,
    rerunPhaseIds,
    reviewerName: reviewer.name,
    decidedAt: now.toISOString(),
  };
  const rerunFrom = { ...ctx.run.rerunFrom };
  for (const phaseId of rerunPhaseIds) rerunFrom[phaseId] = now.getTime();
  await manager.getRepository(Run).update({ id: ctx.run.id }, { lastDecision, rerunFrom });
}

/** The year's next running number of the workshop, inside the sign-off's transaction. */
export async function nextCertificateNumber(
  manager: EntityManager,
  ctx: RunContext,
  now: Date,
): Promise<string> {
  const initials = workshopInitials(ctx.workshop.name);
  const year = Number(now.toISOString().slice(0, 4));
  const [{ n }] = await manager.query(
    'SELECT COUNT(*) AS "n" FROM "certificate" WHERE "workshopId" = ? AND "number" LIKE ?',
    [ctx.run.workshopId, `${initials}-${year}-%`],
  );
  return certificateNumber({ initials, year, sequence: Number(n) + 1 });
}

/** The certificate record; `stored` is null when its PDF is written later. */
export async function insertCertificate(
  manager: EntityManager,
  ctx: RunContext,
  certificate: {
    id: string;
    number: string;
    issuedAt: Date;
    issuedById: string;
    content: CertificateContent;
    stored: { at: Date; byteSize: number } | null;
  },
) {
  const { id, stored, ...rest } = certificate;
  await manager.getRepository(Certificate).insert({
    id,
    runId: ctx.run.id,
    workshopId: ctx.run.workshopId,
    ...rest,
    filePath: certificateFilePath(ctx.run.workshopId, id),
    storedAt: stored?.at ?? null,
    byteSize: stored?.byteSize ?? null,
  });
  await manager
    .getRepository(Run)
    .update({ id: ctx.run.id }, { certificateNumber: certificate.number });
}

/** The trail of a sign-off: the decision with its comments, then the certificate's number. */
export async function recordSignOff(
  manager: EntityManager,
  ctx: RunContext,
  actor: { id: string; name: string },
  at: Date,
  entries: { comments: string; number: string },
) {
  const audit = {
    workshopId: ctx.run.workshopId,
    recordType: 'run' as const,
    recordId: ctx.run.id,
    actor,
    at,
  };
  await recordAudit(manager, { ...audit, action: 'run-signed-off', detail: entries.comments });
  await recordAudit(manager, { ...audit, action: 'certificate-issued', detail: entries.number });
}
