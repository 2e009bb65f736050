import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Drops run_event's index on workshopId: no query reads by it (the workshop's events are found
 * through their runs or by change number), and every synced reading paid to keep it up to date.
 */
export class RunEventLeanIndexes1796250000000 implements MigrationInterface {
  name = 'RunEventLeanIndexes1796250000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_901378c93e622f2fe27eac5f74"`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE INDEX "IDX_901378c93e622f2fe27eac5f74" ON "run_event" ("workshopId") `,
    );
  }
}
