import { MigrationInterface, QueryRunner } from 'typeorm';

export class Accounts1796400200000 implements MigrationInterface {
  name = 'Accounts1796400200000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "password_reset" ("id" text PRIMARY KEY NOT NULL, "userId" text NOT NULL, "tokenHash" text NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_05baebe80e9f8fab8207eda250" ON "password_reset" ("userId") `,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_dc6908de54eb09f588adfdb285" ON "password_reset" ("tokenHash") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_user" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, "passwordChangedAt" datetime, CONSTRAINT "FK_ac02fea97ac10467765fdaafb4b" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_user"("id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt") SELECT "id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt" FROM "user"`,
    );
    await queryRunner.query(`DROP TABLE "user"`);
    await queryRunner.query(`ALTER TABLE "temporary_user" RENAME TO "user"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_invite" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "vesselIds" text NOT NULL, "invitedById" text NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "revokedAt" datetime, CONSTRAINT "FK_0de322c1757f6a77d1e0d07f0be" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_invite"("id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt") SELECT "id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt" FROM "invite"`,
    );
    await queryRunner.query(`DROP TABLE "invite"`);
    await queryRunner.query(`ALTER TABLE "temporary_invite" RENAME TO "invite"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(`ALTER TABLE "invite" RENAME TO "temporary_invite"`);
    await queryRunner.query(
      `CREATE TABLE "invite" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "vesselIds" text NOT NULL, "invitedById" text NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_0de322c1757f6a77d1e0d07f0be" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "invite"("id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt") SELECT "id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt" FROM "temporary_invite"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_invite"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(`ALTER TABLE "user" RENAME TO "temporary_user"`);
    await queryRunner.query(
      `CREATE TABLE "user" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, CONSTRAINT "FK_ac02fea97ac10467765fdaafb4b" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "user"("id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt") SELECT "id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt" FROM "temporary_user"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_user"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_dc6908de54eb09f588adfdb285"`);
    await queryRunner.query(`DROP INDEX "IDX_05baebe80e9f8fab8207eda250"`);
    await queryRunner.query(`DROP TABLE "password_reset"`);
  }
}
