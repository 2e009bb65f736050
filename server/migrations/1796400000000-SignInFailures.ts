import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Failed sign-ins per account and per address, kept where every start of the server sees them. */
export class SignInFailures1796400000000 implements MigrationInterface {
  name = 'SignInFailures1796400000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "sign_in_failure" ("key" text PRIMARY KEY NOT NULL, "failures" integer NOT NULL, "windowStartedAt" integer NOT NULL)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "sign_in_failure"`);
  }
}
