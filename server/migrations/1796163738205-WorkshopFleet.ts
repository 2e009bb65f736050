import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Commissioning checklists (one per engine) and attachments (photos and documents on records). */
export class WorkshopFleet1796163738205 implements MigrationInterface {
  name = 'WorkshopFleet1796163738205';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "attachment" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "recordType" text NOT NULL, "recordId" text NOT NULL, "caption" text NOT NULL DEFAULT (''), "originalName" text NOT NULL, "mimeType" text NOT NULL, "sizeBytes" integer NOT NULL, "storedName" text NOT NULL, "uploadedById" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_097ec1723150c883f5739d1949" ON "attachment" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_attachment_record" ON "attachment" ("recordType", "recordId") `,
    );
    await queryRunner.query(
      `CREATE TABLE "commissioning_checklist" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "entries" text NOT NULL, "evaluation" text NOT NULL, "updatedById" text NOT NULL, "completedAt" datetime, "completedById" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_638877ea48ac3da73626d29c6f7" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_73233f4134dc2d72e3ba665558" ON "commissioning_checklist" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_638877ea48ac3da73626d29c6f" ON "commissioning_checklist" ("engineId") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_638877ea48ac3da73626d29c6f"`);
    await queryRunner.query(`DROP INDEX "IDX_73233f4134dc2d72e3ba665558"`);
    await queryRunner.query(`DROP TABLE "commissioning_checklist"`);
    await queryRunner.query(`DROP INDEX "IDX_attachment_record"`);
    await queryRunner.query(`DROP INDEX "IDX_097ec1723150c883f5739d1949"`);
    await queryRunner.query(`DROP TABLE "attachment"`);
  }
}
