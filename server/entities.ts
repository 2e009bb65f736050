import { PasswordReset } from './features/account/password-reset.entity.js';
import { Attachment } from './features/attachments/attachment.entity.js';
import { AuditEntry } from './features/audit/audit-entry.entity.js';
import { CommissioningChecklist } from './features/checklists/checklist.entity.js';
import { Program } from './features/programs/program.entity.js';
import { OutgoingMail } from './features/mail/outgoing-mail.entity.js';
import { ServiceRecord } from './features/reminders/service-record.entity.js';
import { ServiceReminder } from './features/reminders/service-reminder.entity.js';
import { RunSummary, RunSummaryMark } from './features/review/run-summary.entity.js';
import { RunEventRow } from './features/runs/run-event.entity.js';
import { Run } from './features/runs/run.entity.js';
import { Certificate } from './features/signoff/certificate.entity.js';
import { RunReview } from './features/signoff/run-review.entity.js';
import { ChangeCounter } from './lib/change-counter.entity.js';
import { RunPatchRow } from './features/sync/run-patch.entity.js';
import { Session } from './features/auth/session.entity.js';
import { SignInFailure } from './features/auth/sign-in-failure.entity.js';
import { Invite } from './features/team/invite.entity.js';
import { User } from './features/users/user.entity.js';
import { Engine } from './features/vessels/engine.entity.js';
import { VesselSkipper } from './features/vessels/vessel-skipper.entity.js';
import { Vessel } from './features/vessels/vessel.entity.js';
import { Workshop } from './features/workshops/workshop.entity.js';

/** Every entity of the schema; the data source and the migration generator both use this list. */
export const ENTITIES = [
  Workshop,
  User,
  Session,
  SignInFailure,
  Invite,
  PasswordReset,
  Vessel,
  VesselSkipper,
  Engine,
  Program,
  Run,
  RunEventRow,
  ChangeCounter,
  RunPatchRow,
  CommissioningChecklist,
  Attachment,
  AuditEntry,
  OutgoingMail,
  RunReview,
  Certificate,
  RunSummary,
  RunSummaryMark,
  ServiceReminder,
  ServiceRecord,
];
