import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RunPatches1796163491458 implements MigrationInterface {
  name = 'RunPatches1796163491458';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "run_patch" ("id" text PRIMARY KEY NOT NULL, "runId" text NOT NULL, "authorId" text NOT NULL, "at" integer NOT NULL, "receivedAt" integer NOT NULL, "body" text NOT NULL)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_cc46eda627019a9b4239c841a3" ON "run_patch" ("runId") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_cc46eda627019a9b4239c841a3"`);
    await queryRunner.query(`DROP TABLE "run_patch"`);
  }
}
