import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1796166610737 implements MigrationInterface {
  name = 'Foundation1796166610737';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "audit_entries" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "userId" integer, "userName" varchar(120) NOT NULL DEFAULT (''), "action" varchar(40) NOT NULL, "entity" varchar(40) NOT NULL, "entityId" integer, "before" text NOT NULL DEFAULT (''), "after" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_dbd6ed6fd46fdf10e397b7dd13" ON "audit_entries" ("studioId", "createdAt") `);
    await queryRunner.query(`CREATE TABLE "styles" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "code" varchar(24) NOT NULL, "name" varchar(120) NOT NULL, "description" text NOT NULL DEFAULT (''), "sizeRun" text NOT NULL, "baseSize" varchar(12) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('draft'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fa12072b538d463a9b9b541285" ON "styles" ("studioId", "code") `);
    await queryRunner.query(`CREATE TABLE "batches" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "quantities" text NOT NULL, "dueDate" varchar(10) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('planned'), "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "sessions" ("id" varchar(128) PRIMARY KEY NOT NULL, "expiresAt" bigint NOT NULL, "data" text NOT NULL)`);
    await queryRunner.query(`CREATE INDEX "IDX_50762206f116cd47d1c3fec396" ON "sessions" ("expiresAt") `);
    await queryRunner.query(`CREATE TABLE "studios" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" varchar(120) NOT NULL, "currency" varchar(3) NOT NULL, "unitSystem" varchar(8) NOT NULL DEFAULT ('metric'), "workingDayHours" real NOT NULL DEFAULT (8), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
    await queryRunner.query(`CREATE TABLE "temporary_batches" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "quantities" text NOT NULL, "dueDate" varchar(10) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('planned'), "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_04f7e14dcf087edadb0f02a95af" FOREIGN KEY ("styleId") REFERENCES "styles" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_batches"("id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt") SELECT "id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt" FROM "batches"`);
    await queryRunner.query(`DROP TABLE "batches"`);
    await queryRunner.query(`ALTER TABLE "temporary_batches" RENAME TO "batches"`);
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`CREATE TABLE "temporary_users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_819f4cf5ade23efbae751c9a1fb" FOREIGN KEY ("studioId") REFERENCES "studios" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt" FROM "users"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`ALTER TABLE "temporary_users" RENAME TO "users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`ALTER TABLE "users" RENAME TO "temporary_users"`);
    await queryRunner.query(`CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "email" varchar(200) NOT NULL, "role" varchar(16) NOT NULL, "passwordHash" varchar(255) NOT NULL, "pinHash" varchar(255), "mustChangePassword" boolean NOT NULL DEFAULT (0), "active" boolean NOT NULL DEFAULT (1), "failedLogins" integer NOT NULL DEFAULT (0), "lockedUntil" datetime, "sessionVersion" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "users"("id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt") SELECT "id", "studioId", "name", "email", "role", "passwordHash", "pinHash", "mustChangePassword", "active", "failedLogins", "lockedUntil", "sessionVersion", "createdAt" FROM "temporary_users"`);
    await queryRunner.query(`DROP TABLE "temporary_users"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
    await queryRunner.query(`ALTER TABLE "batches" RENAME TO "temporary_batches"`);
    await queryRunner.query(`CREATE TABLE "batches" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "quantities" text NOT NULL, "dueDate" varchar(10) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('planned'), "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "batches"("id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt") SELECT "id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt" FROM "temporary_batches"`);
    await queryRunner.query(`DROP TABLE "temporary_batches"`);
    await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TABLE "studios"`);
    await queryRunner.query(`DROP INDEX "IDX_50762206f116cd47d1c3fec396"`);
    await queryRunner.query(`DROP TABLE "sessions"`);
    await queryRunner.query(`DROP TABLE "batches"`);
    await queryRunner.query(`DROP INDEX "IDX_fa12072b538d463a9b9b541285"`);
    await queryRunner.query(`DROP TABLE "styles"`);
    await queryRunner.query(`DROP INDEX "IDX_dbd6ed6fd46fdf10e397b7dd13"`);
    await queryRunner.query(`DROP TABLE "audit_entries"`);
  }
}
