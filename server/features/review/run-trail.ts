import { In, type DataSource } from 'typeorm';
import type { AuditView } from '../../../shared/review/views.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import type { AuditAction } from '../audit/audit.service.js';
import type { Run } from '../runs/run.entity.js';
import { RunPatchRow } from '../sync/run-patch.entity.js';
import { User } from '../users/user.entity.js';

/**
 * A run's trail, oldest first. Besides what was recorded here, two facts are read from where
 * they are kept anyway: the assignment (the run row names who assigned it and when) and each
 * submission (every device change is kept in run_patch with its author and arrival time).
 */
export async function runTrail(dataSource: DataSource, run: Run): Promise<AuditView[]> {
  const recorded = await dataSource
    .getRepository(AuditEntry)
    .find({ where: { recordType: 'run', recordId: run.id }, order: { at: 'ASC' } });
  const patches = await dataSource
    .getRepository(RunPatchRow)
    .find({ where: { runId: run.id }, order: { receivedAt: 'ASC' } });
  const submissions = patches.filter((p) => p.body.submit === true);
  const names = await userNames(dataSource, [
    run.assignedById,
    ...submissions.map((p) => p.authorId),
  ]);
  const views: AuditView[] = recorded.map((e) => ({
    action: e.action,
    at: e.at.toISOString(),
    actorName: e.actorName,
    detail: e.detail,
  }));
  views.push(...keptElsewhere(run, recorded, submissions, names));
  return views.sort(inTrailOrder);
}

async function userNames(dataSource: DataSource, ids: string[]): Promise<Map<string, string>> {
  const users = await dataSource
    .getRepository(User)
    .find({ where: { id: In([...new Set(ids)]) }, select: { id: true, name: true } });
  return new Map(users.map((u) => [u.id, u.name]));
}

/** The assignment (unless it was recorded) and each submission, as trail entries. */
function keptElsewhere(
  run: Run,
  recorded: AuditEntry[],
  submissions: RunPatchRow[],
  names: Map<string, string>,
): AuditView[] {
  const views: AuditView[] = [];
  if (!recorded.some((e) => e.action === 'run-assigned')) {
    views.push({
      action: 'run-assigned',
      at: run.createdAt.toISOString(),
      actorName: names.get(run.assignedById) ?? 'A former member of staff',
      detail: run.program.name,
    });
  }
  for (const patch of submissions) {
    views.push({
      action: 'run-submitted',
      at: new Date(patch.receivedAt).toISOString(),
      actorName: names.get(patch.authorId) ?? 'A former user',
      detail: '',
    });
  }
  return views;
}

/** Oldest first; at the same instant, in the order one action leads to the next. */
const inTrailOrder = (a: AuditView, b: AuditView) =>
  a.at.localeCompare(b.at) ||
  ACTION_ORDER.indexOf(a.action as AuditAction) - ACTION_ORDER.indexOf(b.action as AuditAction);

/** Order of actions recorded at the same instant: the way one leads to the next. */
const ACTION_ORDER: AuditAction[] = [
  'run-assigned',
  'run-submitted',
  'run-returned',
  'run-signed-off',
  'certificate-issued',
  'mail-sent',
  'mail-failed',
  'certificate-downloaded',
  'service-reminder-sent',
];
