import type { MigrationInterface, QueryRunner } from 'typeorm';

export class FloorSignInAndBundleNumbers1796361958472 implements MigrationInterface {
  name = 'FloorSignInAndBundleNumbers1796361958472';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "floor_devices" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "tokenHash" varchar(64) NOT NULL, "label" varchar(80) NOT NULL, "createdById" integer NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_1d556b4230d013f6daac4a2c1d" ON "floor_devices" ("tokenHash") `);
    await queryRunner.query(`DROP INDEX "IDX_d560b96b8168fec10a362ae3aa"`);
    await queryRunner.query(`CREATE TABLE "temporary_bundles" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "batchId" integer NOT NULL, "layId" integer NOT NULL, "number" integer NOT NULL, "size" varchar(12) NOT NULL, "shadeLot" varchar(40) NOT NULL, "plyFrom" integer NOT NULL, "plyTo" integer NOT NULL, "pieces" integer NOT NULL, "reopened" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "numberScope" integer NOT NULL DEFAULT (0))`);
    await queryRunner.query(`INSERT INTO "temporary_bundles"("id", "studioId", "batchId", "layId", "number", "size", "shadeLot", "plyFrom", "plyTo", "pieces", "reopened", "createdAt") SELECT "id", "studioId", "batchId", "layId", "number", "size", "shadeLot", "plyFrom", "plyTo", "pieces", "reopened", "createdAt" FROM "bundles"`);
    await queryRunner.query(`DROP TABLE "bundles"`);
    await queryRunner.query(`ALTER TABLE "temporary_bundles" RENAME TO "bundles"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_d560b96b8168fec10a362ae3aa" ON "bundles" ("studioId", "batchId", "number") `);
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`CREATE TABLE "temporary_users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payoutAccount" varchar(64) NOT NULL DEFAULT (''), "pinFailures" integer NOT NULL DEFAULT (0), "pinLockedUntil" datetime, CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount" FROM "users"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`ALTER TABLE "temporary_users" RENAME TO "users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
    // Bundles cut before numbers were studio-wide keep the numbers on their printed tickets. Where a number
    // is also another batch's, it stays unique only with its batch (numberScope = batchId) and is always
    // typed or scanned with it; every other bundle, and every bundle cut from now on, is unique in the studio.
    await queryRunner.query(`UPDATE "bundles" SET "numberScope" = "batchId" WHERE EXISTS (SELECT 1 FROM "bundles" "o" WHERE "o"."studioId" = "bundles"."studioId" AND "o"."number" = "bundles"."number" AND "o"."batchId" <> "bundles"."batchId")`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a2e8cd210b7186e5e60febdac1" ON "bundles" ("studioId", "numberScope", "number") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_a2e8cd210b7186e5e60febdac1"`);
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`ALTER TABLE "users" RENAME TO "temporary_users"`);
    await queryRunner.query(`CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payoutAccount" varchar(64) NOT NULL DEFAULT (''), CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt", "payoutAccount" FROM "temporary_users"`);
    await queryRunner.query(`DROP TABLE "temporary_users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
    await queryRunner.query(`DROP INDEX "IDX_d560b96b8168fec10a362ae3aa"`);
    await queryRunner.query(`ALTER TABLE "bundles" RENAME TO "temporary_bundles"`);
    await queryRunner.query(`CREATE TABLE "bundles" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "batchId" integer NOT NULL, "layId" integer NOT NULL, "number" integer NOT NULL, "size" varchar(12) NOT NULL, "shadeLot" varchar(40) NOT NULL, "plyFrom" integer NOT NULL, "plyTo" integer NOT NULL, "pieces" integer NOT NULL, "reopened" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "bundles"("id", "studioId", "batchId", "layId", "number", "size", "shadeLot", "plyFrom", "plyTo", "pieces", "reopened", "createdAt") SELECT "id", "studioId", "batchId", "layId", "number", "size", "shadeLot", "plyFrom", "plyTo", "pieces", "reopened", "createdAt" FROM "temporary_bundles"`);
    await queryRunner.query(`DROP TABLE "temporary_bundles"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_d560b96b8168fec10a362ae3aa" ON "bundles" ("studioId", "batchId", "number") `);
    await queryRunner.query(`DROP INDEX "IDX_1d556b4230d013f6daac4a2c1d"`);
    await queryRunner.query(`DROP TABLE "floor_devices"`);
  }
}
