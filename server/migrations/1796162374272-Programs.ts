import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Programs1796162374272 implements MigrationInterface {
  name = 'Programs1796162374272';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "program" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "builtInKey" text, "copiedFromId" text, "name" text NOT NULL, "definition" text NOT NULL, "retiredAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_17136d3285446b89e8cc5066be" ON "program" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE TABLE "run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
    await queryRunner.query(`DROP INDEX "IDX_17136d3285446b89e8cc5066be"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_program" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "builtInKey" text, "copiedFromId" text, "name" text NOT NULL, "definition" text NOT NULL, "retiredAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_17136d3285446b89e8cc5066be2" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_program"("id", "workshopId", "builtInKey", "copiedFromId", "name", "definition", "retiredAt", "createdAt", "updatedAt") SELECT "id", "workshopId", "builtInKey", "copiedFromId", "name", "definition", "retiredAt", "createdAt", "updatedAt" FROM "program"`,
    );
    await queryRunner.query(`DROP TABLE "program"`);
    await queryRunner.query(`ALTER TABLE "temporary_program" RENAME TO "program"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_17136d3285446b89e8cc5066be" ON "program" ("workshopId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_19c0ca3535059db808f2819785a" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_run"("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt") SELECT "id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt" FROM "run"`,
    );
    await queryRunner.query(`DROP TABLE "run"`);
    await queryRunner.query(`ALTER TABLE "temporary_run" RENAME TO "run"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(`ALTER TABLE "run" RENAME TO "temporary_run"`);
    await queryRunner.query(
      `CREATE TABLE "run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `INSERT INTO "run"("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt") SELECT "id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt" FROM "temporary_run"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_run"`);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_17136d3285446b89e8cc5066be"`);
    await queryRunner.query(`ALTER TABLE "program" RENAME TO "temporary_program"`);
    await queryRunner.query(
      `CREATE TABLE "program" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "builtInKey" text, "copiedFromId" text, "name" text NOT NULL, "definition" text NOT NULL, "retiredAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `INSERT INTO "program"("id", "workshopId", "builtInKey", "copiedFromId", "name", "definition", "retiredAt", "createdAt", "updatedAt") SELECT "id", "workshopId", "builtInKey", "copiedFromId", "name", "definition", "retiredAt", "createdAt", "updatedAt" FROM "temporary_program"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_program"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_17136d3285446b89e8cc5066be" ON "program" ("workshopId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(`DROP TABLE "run"`);
    await queryRunner.query(`DROP INDEX "IDX_17136d3285446b89e8cc5066be"`);
    await queryRunner.query(`DROP TABLE "program"`);
  }
}
