import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The durable mail outbox: each e-mail written with what it is about, sent and retried by a worker. */
export class OutgoingMail1796400100000 implements MigrationInterface {
  name = 'OutgoingMail1796400100000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "outgoing_mail" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "recordType" text, "recordId" text, "what" text NOT NULL DEFAULT (''), "recipients" text NOT NULL, "subject" text NOT NULL, "message" text NOT NULL, "state" text NOT NULL, "attempts" integer NOT NULL DEFAULT (0), "nextAttemptAt" integer NOT NULL, "lastError" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "sentAt" datetime)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_c87f30e9e0e43f3d5cd27544fe" ON "outgoing_mail" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_outgoing_mail_due" ON "outgoing_mail" ("state", "nextAttemptAt") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_outgoing_mail_due"`);
    await queryRunner.query(`DROP INDEX "IDX_c87f30e9e0e43f3d5cd27544fe"`);
    await queryRunner.query(`DROP TABLE "outgoing_mail"`);
  }
}
