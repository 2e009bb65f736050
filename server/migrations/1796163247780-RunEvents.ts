import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RunEvents1796163247780 implements MigrationInterface {
  name = 'RunEvents1796163247780';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "run_event" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "kind" text NOT NULL, "at" integer NOT NULL, "receivedAt" integer NOT NULL, "authorId" text NOT NULL, "phaseId" text, "rpm" real, "throttle" text, "body" text NOT NULL, "seq" integer NOT NULL)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_901378c93e622f2fe27eac5f74" ON "run_event" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_4f072ffeffb00071de11cfc675" ON "run_event" ("seq") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_run_event_run_at" ON "run_event" ("runId", "at") `);
    await queryRunner.query(
      `CREATE TABLE "change_counter" ("name" text PRIMARY KEY NOT NULL, "value" integer NOT NULL)`,
    );
    await queryRunner.query(`INSERT INTO "change_counter" ("name", "value") VALUES ('changes', 0)`);
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "currentPhaseId" text, "notes" text NOT NULL DEFAULT (''), "clockSkewMs" integer, "lastEventAt" integer, "seq" integer NOT NULL DEFAULT (0), CONSTRAINT "FK_19c0ca3535059db808f2819785a" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_run"("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt") SELECT "id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt" FROM "run"`,
    );
    await queryRunner.query(`DROP TABLE "run"`);
    await queryRunner.query(`ALTER TABLE "temporary_run" RENAME TO "run"`);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_f9defd56865b6f784f0404751a" ON "run" ("seq") `);
    await queryRunner.query(`DROP INDEX "IDX_901378c93e622f2fe27eac5f74"`);
    await queryRunner.query(`DROP INDEX "IDX_4f072ffeffb00071de11cfc675"`);
    await queryRunner.query(`DROP INDEX "IDX_run_event_run_at"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_run_event" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "kind" text NOT NULL, "at" integer NOT NULL, "receivedAt" integer NOT NULL, "authorId" text NOT NULL, "phaseId" text, "rpm" real, "throttle" text, "body" text NOT NULL, "seq" integer NOT NULL, CONSTRAINT "FK_ce218bb5aefc46d11b92405bf3c" FOREIGN KEY ("runId") REFERENCES "run" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_run_event"("id", "runId", "workshopId", "engineId", "kind", "at", "receivedAt", "authorId", "phaseId", "rpm", "throttle", "body", "seq") SELECT "id", "runId", "workshopId", "engineId", "kind", "at", "receivedAt", "authorId", "phaseId", "rpm", "throttle", "body", "seq" FROM "run_event"`,
    );
    await queryRunner.query(`DROP TABLE "run_event"`);
    await queryRunner.query(`ALTER TABLE "temporary_run_event" RENAME TO "run_event"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_901378c93e622f2fe27eac5f74" ON "run_event" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_4f072ffeffb00071de11cfc675" ON "run_event" ("seq") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_run_event_run_at" ON "run_event" ("runId", "at") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_run_event_run_at"`);
    await queryRunner.query(`DROP INDEX "IDX_4f072ffeffb00071de11cfc675"`);
    await queryRunner.query(`DROP INDEX "IDX_901378c93e622f2fe27eac5f74"`);
    await queryRunner.query(`ALTER TABLE "run_event" RENAME TO "temporary_run_event"`);
    await queryRunner.query(
      `CREATE TABLE "run_event" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "kind" text NOT NULL, "at" integer NOT NULL, "receivedAt" integer NOT NULL, "authorId" text NOT NULL, "phaseId" text, "rpm" real, "throttle" text, "body" text NOT NULL, "seq" integer NOT NULL)`,
    );
    await queryRunner.query(
      `INSERT INTO "run_event"("id", "runId", "workshopId", "engineId", "kind", "at", "receivedAt", "authorId", "phaseId", "rpm", "throttle", "body", "seq") SELECT "id", "runId", "workshopId", "engineId", "kind", "at", "receivedAt", "authorId", "phaseId", "rpm", "throttle", "body", "seq" FROM "temporary_run_event"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_run_event"`);
    await queryRunner.query(`CREATE INDEX "IDX_run_event_run_at" ON "run_event" ("runId", "at") `);
    await queryRunner.query(
      `CREATE INDEX "IDX_4f072ffeffb00071de11cfc675" ON "run_event" ("seq") `,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_901378c93e622f2fe27eac5f74" ON "run_event" ("workshopId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_f9defd56865b6f784f0404751a"`);
    await queryRunner.query(`DROP INDEX "IDX_7fe581fbef41849a34d4a17aa6"`);
    await queryRunner.query(`DROP INDEX "IDX_19c0ca3535059db808f2819785"`);
    await queryRunner.query(`DROP INDEX "IDX_568b3bf1f91d2f18638c04a719"`);
    await queryRunner.query(`ALTER TABLE "run" RENAME TO "temporary_run"`);
    await queryRunner.query(
      `CREATE TABLE "run" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "vesselId" text NOT NULL, "programId" text NOT NULL, "program" text NOT NULL, "bands" text NOT NULL, "state" text NOT NULL, "assignedById" text NOT NULL, "submittedAt" datetime, "signedOffAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_19c0ca3535059db808f2819785a" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "run"("id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt") SELECT "id", "workshopId", "engineId", "vesselId", "programId", "program", "bands", "state", "assignedById", "submittedAt", "signedOffAt", "createdAt", "updatedAt" FROM "temporary_run"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_run"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_7fe581fbef41849a34d4a17aa6" ON "run" ("workshopId") `,
    );
    await queryRunner.query(`CREATE INDEX "IDX_19c0ca3535059db808f2819785" ON "run" ("engineId") `);
    await queryRunner.query(`CREATE INDEX "IDX_568b3bf1f91d2f18638c04a719" ON "run" ("state") `);
    await queryRunner.query(`DROP TABLE "change_counter"`);
    await queryRunner.query(`DROP INDEX "IDX_run_event_run_at"`);
    await queryRunner.query(`DROP INDEX "IDX_4f072ffeffb00071de11cfc675"`);
    await queryRunner.query(`DROP INDEX "IDX_901378c93e622f2fe27eac5f74"`);
    await queryRunner.query(`DROP TABLE "run_event"`);
  }
}
