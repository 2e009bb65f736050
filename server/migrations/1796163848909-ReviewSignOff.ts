import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Review, sign-off and certificates, the audit trail, the runs board's summaries and service reminders. */
export class ReviewSignOff1796163848909 implements MigrationInterface {
  name = 'ReviewSignOff1796163848909';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "audit_entry" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "recordType" text NOT NULL, "recordId" text NOT NULL, "action" text NOT NULL, "actorId" text, "actorName" text NOT NULL, "at" datetime NOT NULL, "detail" text NOT NULL DEFAULT (''))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_830c5423ce421ec1ae1ca585a1" ON "audit_entry" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_audit_entry_record" ON "audit_entry" ("recordType", "recordId", "at") `,
    );
    await queryRunner.query(
      `CREATE TABLE "service_reminder" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "kind" text NOT NULL, "state" text NOT NULL, "dueAtHours" real, "dueOn" text, "sentAt" datetime NOT NULL, "recipients" text NOT NULL, CONSTRAINT "UQ_service_reminder_engine_kind" UNIQUE ("engineId", "kind"), CONSTRAINT "FK_09f300a2f877cb2e8b5e4122999" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE TABLE "run_summary" ("runId" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "eventSeq" integer NOT NULL, "programName" text NOT NULL, "serviceHours" real, "serviceMonths" integer, "verdict" text NOT NULL, "progress" real NOT NULL, "breachCount" integer NOT NULL, "openPhaseName" text, "sessionMs" integer NOT NULL, "hourMeter" real, "hourMeterAt" integer, CONSTRAINT "FK_5c4518a1a34728e5e6879819c55" FOREIGN KEY ("runId") REFERENCES "run" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_8f645a8973624eede653543463" ON "run_summary" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE TABLE "run_summary_mark" ("workshopId" text PRIMARY KEY NOT NULL, "eventSeq" integer NOT NULL)`,
    );
    await queryRunner.query(
      `CREATE TABLE "certificate" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "number" text NOT NULL, "issuedAt" datetime NOT NULL, "issuedById" text NOT NULL, "content" text NOT NULL, "filePath" text NOT NULL, "storedAt" datetime, "byteSize" integer, CONSTRAINT "UQ_certificate_workshop_number" UNIQUE ("workshopId", "number"), CONSTRAINT "FK_ed81a4b5eb0072f1993cf83944f" FOREIGN KEY ("runId") REFERENCES "run" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_certificate_run" ON "certificate" ("runId") `,
    );
    await queryRunner.query(
      `CREATE TABLE "run_review" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "decision" text NOT NULL, "comments" text NOT NULL DEFAULT (''), "verdict" text NOT NULL, "reviewerId" text NOT NULL, "reviewerName" text NOT NULL, "decidedAt" datetime NOT NULL, CONSTRAINT "FK_141a93a032b28df5bcfbe33db0e" FOREIGN KEY ("runId") REFERENCES "run" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_141a93a032b28df5bcfbe33db0" ON "run_review" ("runId") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_141a93a032b28df5bcfbe33db0"`);
    await queryRunner.query(`DROP TABLE "run_review"`);
    await queryRunner.query(`DROP INDEX "IDX_certificate_run"`);
    await queryRunner.query(`DROP TABLE "certificate"`);
    await queryRunner.query(`DROP TABLE "run_summary_mark"`);
    await queryRunner.query(`DROP INDEX "IDX_8f645a8973624eede653543463"`);
    await queryRunner.query(`DROP TABLE "run_summary"`);
    await queryRunner.query(`DROP TABLE "service_reminder"`);
    await queryRunner.query(`DROP INDEX "IDX_audit_entry_record"`);
    await queryRunner.query(`DROP INDEX "IDX_830c5423ce421ec1ae1ca585a1"`);
    await queryRunner.query(`DROP TABLE "audit_entry"`);
  }
}
