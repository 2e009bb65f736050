import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Services done on an engine (the first service for now): one per engine and kind. */
export class ServiceRecords1796300100000 implements MigrationInterface {
  name = 'ServiceRecords1796300100000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "service_record" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "engineId" text NOT NULL, "kind" text NOT NULL, "doneOn" text NOT NULL, "hourMeter" real NOT NULL, "doneBy" text NOT NULL, "notes" text NOT NULL DEFAULT (''), "recordedById" text NOT NULL, "recordedByName" text NOT NULL, "recordedAt" datetime NOT NULL, CONSTRAINT "UQ_service_record_engine_kind" UNIQUE ("engineId", "kind"), CONSTRAINT "FK_5a75afc4e4febeca57c45deae74" FOREIGN KEY ("engineId") REFERENCES "engine" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_7d5831d6eb92d1e63cc8f5aa9a" ON "service_record" ("workshopId") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_7d5831d6eb92d1e63cc8f5aa9a"`);
    await queryRunner.query(`DROP TABLE "service_record"`);
  }
}
