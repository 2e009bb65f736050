import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { AuditEntry } from './audit-entry.entity.js';

export type AuditAction =
  | 'run-assigned'
  | 'run-submitted'
  | 'run-returned'
  | 'run-signed-off'
  | 'certificate-issued'
  | 'certificate-downloaded'
  | 'mail-sent'
  | 'mail-failed'
  | 'service-reminder-sent'
  | 'first-service-recorded'
  | 'entry-voided'
  | 'run-cancelled'
  | 'checklist-completed'
  | 'checklist-reopened'
  | AccountAction;

/** What can happen to a person's account or to an invite; the team's account history lists them. */
export const ACCOUNT_ACTIONS = [
  'invite-sent',
  'invite-resent',
  'invite-revoked',
  'invite-accepted',
  'password-changed',
  'password-reset-requested',
  'password-reset',
  'signed-out-everywhere',
  'role-changed',
  'account-deactivated',
  'account-reactivated',
] as const;
export type AccountAction = (typeof ACCOUNT_ACTIONS)[number];

export interface AuditInput {
  workshopId: string;
  recordType: 'run' | 'engine' | 'user' | 'invite';
  recordId: string;
  action: AuditAction;
  /** Null when the system acted on its own (a scheduled reminder). */
  actor: { id: string; name: string } | null;
  at: Date;
  detail?: string;
}

/** Adds an entry inside the caller's transaction, so the trail and the change commit together. */
export async function recordAudit(manager: EntityManager, input: AuditInput): Promise<void> {
  await manager.getRepository(AuditEntry).insert({
    id: randomUUID(),
    workshopId: input.workshopId,
    recordType: input.recordType,
    recordId: input.recordId,
    action: input.action,
    actorId: input.actor?.id ?? null,
    actorName: input.actor?.name ?? 'Ringseat',
    at: input.at,
    detail: input.detail ?? '',
  });
}
