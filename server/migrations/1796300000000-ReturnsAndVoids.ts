import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A returned run names the phases to run again (run_review.rerunPhaseIds, run.rerunFrom); the run
 * keeps the skipper's submit note, its latest decision and its certificate number for its views.
 */
export class ReturnsAndVoids1796300000000 implements MigrationInterface {
  name = 'ReturnsAndVoids1796300000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_f9defd56865b6f784f0404751a"`);
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "currentPhaseId" text, "notes" text NOT NULL DEFAULT (''), "clockSkewMs" integer, "lastEventAt" integer, "seq" integer NOT NULL DEFAULT (0), "submitNote" text, "rerunFrom" text NOT NULL DEFAULT ('{}'), "lastDecision" text, "certificateNumber" text, CONSTRAINT "FK_19c0ca3535059db808f2819785a" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_run"("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt", "currentPhaseId", "notes", "clockSkewMs", "lastEventAt", "seq") SELECT "id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt", "currentPhaseId", "notes", "clockSkewMs", "lastEventAt", "seq" FROM "run"`,
    );
    await queryRunner.query(`DROP TABLE "run"`);
    await queryRunner.query(`ALTER TABLE "temporary_run" RENAME TO "run"`);
    await queryRunner.query(`CREATE INDEX "IDX_f9defd56865b6f784f0404751a" ON "run" ("seq") `);
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
    await queryRunner.query(`DROP INDEX "IDX_141a93a032b28df5bcfbe33db0"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_run_review" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "decision" text NOT NULL, "comments" text NOT NULL DEFAULT (''), "verdict" text NOT NULL, "reviewerId" text NOT NULL, "reviewerName" text NOT NULL, "decidedAt" datetime NOT NULL, "rerunPhaseIds" text NOT NULL DEFAULT ('[]'), CONSTRAINT "FK_141a93a032b28df5bcfbe33db0e" FOREIGN KEY ("runId") REFERENCES "run" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_run_review"("id", "runId", "workshopId", "decision", "comments", "verdict", "reviewerId", "reviewerName", "decidedAt") SELECT "id", "runId", "workshopId", "decision", "comments", "verdict", "reviewerId", "reviewerName", "decidedAt" FROM "run_review"`,
    );
    await queryRunner.query(`DROP TABLE "run_review"`);
    await queryRunner.query(`ALTER TABLE "temporary_run_review" RENAME TO "run_review"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_141a93a032b28df5bcfbe33db0" ON "run_review" ("runId") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_141a93a032b28df5bcfbe33db0"`);
    await queryRunner.query(`ALTER TABLE "run_review" RENAME TO "temporary_run_review"`);
    await queryRunner.query(
      `CREATE TABLE "run_review" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "decision" text NOT NULL, "comments" text NOT NULL DEFAULT (''), "verdict" text NOT NULL, "reviewerId" text NOT NULL, "reviewerName" text NOT NULL, "decidedAt" datetime NOT NULL, CONSTRAINT "FK_141a93a032b28df5bcfbe33db0e" FOREIGN KEY ("runId") REFERENCES "run" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "run_review"("id", "runId", "workshopId", "decision", "comments", "verdict", "reviewerId", "reviewerName", "decidedAt") SELECT "id", "runId", "workshopId", "decision", "comments", "verdict", "reviewerId", "reviewerName", "decidedAt" FROM "temporary_run_review"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_run_review"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_141a93a032b28df5bcfbe33db0" ON "run_review" ("runId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(`DROP INDEX "IDX_f9defd56865b6f784f0404751a"`);
    await queryRunner.query(`ALTER TABLE "run" RENAME TO "temporary_run"`);
    await queryRunner.query(
      `CREATE TABLE "run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "currentPhaseId" text, "notes" text NOT NULL DEFAULT (''), "clockSkewMs" integer, "lastEventAt" integer, "seq" integer NOT NULL DEFAULT (0), CONSTRAINT "FK_19c0ca3535059db808f2819785a" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "run"("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt", "currentPhaseId", "notes", "clockSkewMs", "lastEventAt", "seq") SELECT "id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt", "currentPhaseId", "notes", "clockSkewMs", "lastEventAt", "seq" FROM "temporary_run"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_run"`);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_f9defd56865b6f784f0404751a" ON "run" ("seq") `);
  }
}
