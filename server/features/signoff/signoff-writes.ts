import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { recordAudit } from '../audit/audit.service.js';
import type { RunContext } from '../runs/run-context.js';
import { certificateContent } from './certificate-content.js';
import { renderCertificate } from './certificate-pdf.js';
import { certificateFilePath, type CertificateStore } from './certificate-store.js';
import {
  addReview,
  insertCertificate,
  markRun,
  nextCertificateNumber,
  recordSignOff,
  type Reviewer,
} from './signoff-records.js';

/*
 * What one decision writes, inside the caller's transaction, so that the decisions on both
 * engines of a vessel are saved together or not at all. A certificate's PDF is written to disk
 * before the transaction commits; its path goes into `written` so the caller removes it again
 * when the transaction fails.
 */

export interface Written {
  state: 'signed-off' | 'returned';
  certificate: { number: string; pdf: Buffer } | null;
}

/** Signs the run off and issues its certificate: the next number, the PDF on disk, the rows. */
export async function confirmRun(
  manager: EntityManager,
  store: CertificateStore,
  written: string[],
  decision: { ctx: RunContext; reviewer: Reviewer; comments: string; now: Date },
): Promise<Written> {
  const { ctx, reviewer, comments, now } = decision;
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
  const id = randomUUID();
  const relative = certificateFilePath(ctx.run.workshopId, id);
  store.write(relative, pdf);
  written.push(relative);
  await insertCertificate(manager, ctx, {
    id,
    number,
    issuedAt: now,
    issuedById: reviewer.id,
    content,
    stored: { at: now, byteSize: pdf.length },
  });
  await recordSignOff(manager, ctx, reviewer, now, { comments, number });
  return { state: 'signed-off', certificate: { number, pdf } };
}

/** Returns the run to the skipper with the phases to run again; the board counts it afresh. */
export async function returnRun(
  manager: EntityManager,
  recount: (manager: EntityManager, runId: string) => Promise<void>,
  decision: {
    ctx: RunContext;
    reviewer: Reviewer;
    comments: string;
    rerunPhaseIds: string[];
    now: Date;
  },
): Promise<Written> {
  const { ctx, reviewer, comments, rerunPhaseIds, now } = decision;
  await markRun(manager, ctx, 'returned', now);
  await addReview(manager, ctx, reviewer, { decision: 'returned', comments, rerunPhaseIds }, now);
  await recount(manager, ctx.run.id);
  await recordAudit(manager, {
    workshopId: ctx.run.workshopId,
    recordType: 'run',
    recordId: ctx.run.id,
    action: 'run-returned',
    actor: reviewer,
    at: now,
    detail: `${comments} (to run again: ${phaseNames(ctx, rerunPhaseIds).join(', ')})`,
  });
  return { state: 'returned', certificate: null };
}

/** The names of the run's phases with these ids, in the order given. */
export function phaseNames(ctx: RunContext, ids: readonly string[]): string[] {
  return ids.map((id) => ctx.run.program.phases.find((p) => p.id === id)!.name);
}
