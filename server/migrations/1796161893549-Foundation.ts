import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1796161893549 implements MigrationInterface {
  name = 'Foundation1796161893549';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "workshop" ("id" text PRIMARY KEY NOT NULL, "name" text NOT NULL, "address" text NOT NULL DEFAULT (''), "email" text NOT NULL DEFAULT (''), "timezone" text NOT NULL DEFAULT ('UTC'), "units" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `CREATE TABLE "user" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime)`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `,
    );
    await queryRunner.query(
      `CREATE TABLE "session" ("id" text PRIMARY KEY NOT NULL, "userId" text NOT NULL, "expiresAt" integer NOT NULL)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_3d2f174ef04fb312fdebd0ddc5" ON "session" ("userId") `,
    );
    await queryRunner.query(
      `CREATE TABLE "invite" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "vesselIds" text NOT NULL, "invitedById" text NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `,
    );
    await queryRunner.query(
      `CREATE TABLE "vessel_skipper" ("vesselId" text NOT NULL, "userId" text NOT NULL, PRIMARY KEY ("vesselId", "userId"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "vessel" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "name" text NOT NULL, "hin" text NOT NULL DEFAULT (''), "type" text NOT NULL, "lengthM" real, "homePort" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime)`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_4b96dbf0328e3673ff87ea55b6" ON "vessel" ("workshopId") `,
    );
    await queryRunner.query(
      `CREATE TABLE "engine" ("id" text PRIMARY KEY NOT NULL, "vesselId" text NOT NULL, "workshopId" text NOT NULL, "position" text NOT NULL, "installation" text NOT NULL, "maker" text NOT NULL, "model" text NOT NULL, "serialNumber" text NOT NULL, "ratedPowerKw" real, "fuel" text NOT NULL, "cycle" text NOT NULL, "ratedRpmMin" integer NOT NULL, "ratedRpmMax" integer NOT NULL, "gearRatio" real, "propBlades" integer, "propDiameterIn" real, "propPitchIn" real, "tachSource" text NOT NULL DEFAULT ('none'), "poles" integer, "pulleyRatio" real, "hourMeterAtCommissioning" real, "commissionedOn" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, CONSTRAINT "UQ_engine_workshop_serial" UNIQUE ("workshopId", "serialNumber"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_860074f08d8ee8923d49e0b4b7" ON "engine" ("vesselId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_user" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, CONSTRAINT "FK_ac02fea97ac10467765fdaafb4b" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_user"("id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt") SELECT "id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt" FROM "user"`,
    );
    await queryRunner.query(`DROP TABLE "user"`);
    await queryRunner.query(`ALTER TABLE "temporary_user" RENAME TO "user"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_3d2f174ef04fb312fdebd0ddc5"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_session" ("id" text PRIMARY KEY NOT NULL, "userId" text NOT NULL, "expiresAt" integer NOT NULL, CONSTRAINT "FK_3d2f174ef04fb312fdebd0ddc53" FOREIGN KEY ("userId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_session"("id", "userId", "expiresAt") SELECT "id", "userId", "expiresAt" FROM "session"`,
    );
    await queryRunner.query(`DROP TABLE "session"`);
    await queryRunner.query(`ALTER TABLE "temporary_session" RENAME TO "session"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_3d2f174ef04fb312fdebd0ddc5" ON "session" ("userId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_invite" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "vesselIds" text NOT NULL, "invitedById" text NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_0de322c1757f6a77d1e0d07f0be" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_invite"("id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt") SELECT "id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt" FROM "invite"`,
    );
    await queryRunner.query(`DROP TABLE "invite"`);
    await queryRunner.query(`ALTER TABLE "temporary_invite" RENAME TO "invite"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `,
    );
    await queryRunner.query(
      `CREATE TABLE "temporary_vessel_skipper" ("vesselId" text NOT NULL, "userId" text NOT NULL, CONSTRAINT "FK_796bfc88bd4b3aca826ced43246" FOREIGN KEY ("vesselId") REFERENCES "vessel" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_76ad2720bf37155fa3e8c8656e4" FOREIGN KEY ("userId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, PRIMARY KEY ("vesselId", "userId"))`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_vessel_skipper"("vesselId", "userId") SELECT "vesselId", "userId" FROM "vessel_skipper"`,
    );
    await queryRunner.query(`DROP TABLE "vessel_skipper"`);
    await queryRunner.query(`ALTER TABLE "temporary_vessel_skipper" RENAME TO "vessel_skipper"`);
    await queryRunner.query(`DROP INDEX "IDX_4b96dbf0328e3673ff87ea55b6"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_vessel" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "name" text NOT NULL, "hin" text NOT NULL DEFAULT (''), "type" text NOT NULL, "lengthM" real, "homePort" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, CONSTRAINT "FK_4b96dbf0328e3673ff87ea55b64" FOREIGN KEY ("workshopId") REFERENCES "workshop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_vessel"("id", "workshopId", "name", "hin", "type", "lengthM", "homePort", "createdAt", "updatedAt", "archivedAt") SELECT "id", "workshopId", "name", "hin", "type", "lengthM", "homePort", "createdAt", "updatedAt", "archivedAt" FROM "vessel"`,
    );
    await queryRunner.query(`DROP TABLE "vessel"`);
    await queryRunner.query(`ALTER TABLE "temporary_vessel" RENAME TO "vessel"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_4b96dbf0328e3673ff87ea55b6" ON "vessel" ("workshopId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_860074f08d8ee8923d49e0b4b7"`);
    await queryRunner.query(
      `CREATE TABLE "temporary_engine" ("id" text PRIMARY KEY NOT NULL, "vesselId" text NOT NULL, "workshopId" text NOT NULL, "position" text NOT NULL, "installation" text NOT NULL, "maker" text NOT NULL, "model" text NOT NULL, "serialNumber" text NOT NULL, "ratedPowerKw" real, "fuel" text NOT NULL, "cycle" text NOT NULL, "ratedRpmMin" integer NOT NULL, "ratedRpmMax" integer NOT NULL, "gearRatio" real, "propBlades" integer, "propDiameterIn" real, "propPitchIn" real, "tachSource" text NOT NULL DEFAULT ('none'), "poles" integer, "pulleyRatio" real, "hourMeterAtCommissioning" real, "commissionedOn" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, CONSTRAINT "UQ_engine_workshop_serial" UNIQUE ("workshopId", "serialNumber"), CONSTRAINT "FK_860074f08d8ee8923d49e0b4b7f" FOREIGN KEY ("vesselId") REFERENCES "vessel" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `INSERT INTO "temporary_engine"("id", "vesselId", "workshopId", "position", "installation", "maker", "model", "serialNumber", "ratedPowerKw", "fuel", "cycle", "ratedRpmMin", "ratedRpmMax", "gearRatio", "propBlades", "propDiameterIn", "propPitchIn", "tachSource", "poles", "pulleyRatio", "hourMeterAtCommissioning", "commissionedOn", "createdAt", "updatedAt", "archivedAt") SELECT "id", "vesselId", "workshopId", "position", "installation", "maker", "model", "serialNumber", "ratedPowerKw", "fuel", "cycle", "ratedRpmMin", "ratedRpmMax", "gearRatio", "propBlades", "propDiameterIn", "propPitchIn", "tachSource", "poles", "pulleyRatio", "hourMeterAtCommissioning", "commissionedOn", "createdAt", "updatedAt", "archivedAt" FROM "engine"`,
    );
    await queryRunner.query(`DROP TABLE "engine"`);
    await queryRunner.query(`ALTER TABLE "temporary_engine" RENAME TO "engine"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_860074f08d8ee8923d49e0b4b7" ON "engine" ("vesselId") `,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_860074f08d8ee8923d49e0b4b7"`);
    await queryRunner.query(`ALTER TABLE "engine" RENAME TO "temporary_engine"`);
    await queryRunner.query(
      `CREATE TABLE "engine" ("id" text PRIMARY KEY NOT NULL, "vesselId" text NOT NULL, "workshopId" text NOT NULL, "position" text NOT NULL, "installation" text NOT NULL, "maker" text NOT NULL, "model" text NOT NULL, "serialNumber" text NOT NULL, "ratedPowerKw" real, "fuel" text NOT NULL, "cycle" text NOT NULL, "ratedRpmMin" integer NOT NULL, "ratedRpmMax" integer NOT NULL, "gearRatio" real, "propBlades" integer, "propDiameterIn" real, "propPitchIn" real, "tachSource" text NOT NULL DEFAULT ('none'), "poles" integer, "pulleyRatio" real, "hourMeterAtCommissioning" real, "commissionedOn" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime, CONSTRAINT "UQ_engine_workshop_serial" UNIQUE ("workshopId", "serialNumber"))`,
    );
    await queryRunner.query(
      `INSERT INTO "engine"("id", "vesselId", "workshopId", "position", "installation", "maker", "model", "serialNumber", "ratedPowerKw", "fuel", "cycle", "ratedRpmMin", "ratedRpmMax", "gearRatio", "propBlades", "propDiameterIn", "propPitchIn", "tachSource", "poles", "pulleyRatio", "hourMeterAtCommissioning", "commissionedOn", "createdAt", "updatedAt", "archivedAt") SELECT "id", "vesselId", "workshopId", "position", "installation", "maker", "model", "serialNumber", "ratedPowerKw", "fuel", "cycle", "ratedRpmMin", "ratedRpmMax", "gearRatio", "propBlades", "propDiameterIn", "propPitchIn", "tachSource", "poles", "pulleyRatio", "hourMeterAtCommissioning", "commissionedOn", "createdAt", "updatedAt", "archivedAt" FROM "temporary_engine"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_engine"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_860074f08d8ee8923d49e0b4b7" ON "engine" ("vesselId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_4b96dbf0328e3673ff87ea55b6"`);
    await queryRunner.query(`ALTER TABLE "vessel" RENAME TO "temporary_vessel"`);
    await queryRunner.query(
      `CREATE TABLE "vessel" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "name" text NOT NULL, "hin" text NOT NULL DEFAULT (''), "type" text NOT NULL, "lengthM" real, "homePort" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime)`,
    );
    await queryRunner.query(
      `INSERT INTO "vessel"("id", "workshopId", "name", "hin", "type", "lengthM", "homePort", "createdAt", "updatedAt", "archivedAt") SELECT "id", "workshopId", "name", "hin", "type", "lengthM", "homePort", "createdAt", "updatedAt", "archivedAt" FROM "temporary_vessel"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_vessel"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_4b96dbf0328e3673ff87ea55b6" ON "vessel" ("workshopId") `,
    );
    await queryRunner.query(`ALTER TABLE "vessel_skipper" RENAME TO "temporary_vessel_skipper"`);
    await queryRunner.query(
      `CREATE TABLE "vessel_skipper" ("vesselId" text NOT NULL, "userId" text NOT NULL, PRIMARY KEY ("vesselId", "userId"))`,
    );
    await queryRunner.query(
      `INSERT INTO "vessel_skipper"("vesselId", "userId") SELECT "vesselId", "userId" FROM "temporary_vessel_skipper"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_vessel_skipper"`);
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(`ALTER TABLE "invite" RENAME TO "temporary_invite"`);
    await queryRunner.query(
      `CREATE TABLE "invite" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "vesselIds" text NOT NULL, "invitedById" text NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await queryRunner.query(
      `INSERT INTO "invite"("id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt") SELECT "id", "workshopId", "email", "role", "tokenHash", "vesselIds", "invitedById", "expiresAt", "acceptedAt", "createdAt" FROM "temporary_invite"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_invite"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_3d2f174ef04fb312fdebd0ddc5"`);
    await queryRunner.query(`ALTER TABLE "session" RENAME TO "temporary_session"`);
    await queryRunner.query(
      `CREATE TABLE "session" ("id" text PRIMARY KEY NOT NULL, "userId" text NOT NULL, "expiresAt" integer NOT NULL)`,
    );
    await queryRunner.query(
      `INSERT INTO "session"("id", "userId", "expiresAt") SELECT "id", "userId", "expiresAt" FROM "temporary_session"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_session"`);
    await queryRunner.query(
      `CREATE INDEX "IDX_3d2f174ef04fb312fdebd0ddc5" ON "session" ("userId") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(`ALTER TABLE "user" RENAME TO "temporary_user"`);
    await queryRunner.query(
      `CREATE TABLE "user" ("id" text PRIMARY KEY NOT NULL, "workshopId" text NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "archivedAt" datetime)`,
    );
    await queryRunner.query(
      `INSERT INTO "user"("id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt") SELECT "id", "workshopId", "email", "name", "role", "passwordHash", "createdAt", "archivedAt" FROM "temporary_user"`,
    );
    await queryRunner.query(`DROP TABLE "temporary_user"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `,
    );
    await queryRunner.query(`DROP INDEX "IDX_860074f08d8ee8923d49e0b4b7"`);
    await queryRunner.query(`DROP TABLE "engine"`);
    await queryRunner.query(`DROP INDEX "IDX_4b96dbf0328e3673ff87ea55b6"`);
    await queryRunner.query(`DROP TABLE "vessel"`);
    await queryRunner.query(`DROP TABLE "vessel_skipper"`);
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(`DROP TABLE "invite"`);
    await queryRunner.query(`DROP INDEX "IDX_3d2f174ef04fb312fdebd0ddc5"`);
    await queryRunner.query(`DROP TABLE "session"`);
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(`DROP TABLE "user"`);
    await queryRunner.query(`DROP TABLE "workshop"`);
  }
}
