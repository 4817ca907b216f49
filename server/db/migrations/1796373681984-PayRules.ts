import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PayRules1796373681984 implements MigrationInterface {
  name = 'PayRules1796373681984';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "studio_work_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "minimumWageOn" boolean NOT NULL DEFAULT (0), "minimumHourlyMinor" varchar(24) NOT NULL DEFAULT (''), "overtimePremiumPercent" integer NOT NULL DEFAULT (0))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_11768edd614a0f43a0f0f405ae" ON "studio_work_rules" ("studioId") `);
    await queryRunner.query(`DROP INDEX "IDX_a5fda10bf6882e27e4fecbc05f"`);
    await queryRunner.query(`CREATE TABLE "temporary_operations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "seq" integer NOT NULL, "code" varchar(12) NOT NULL, "name" varchar(120) NOT NULL, "section" varchar(12) NOT NULL, "machineType" varchar(24) NOT NULL, "sam" real NOT NULL, "predecessors" text NOT NULL, "pieceRateMinor" integer, "timeStudy" text, "pieceRate" varchar(24))`);
    await queryRunner.query(`INSERT INTO "temporary_operations"("id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor", "timeStudy") SELECT "id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor", "timeStudy" FROM "operations"`);
    await queryRunner.query(`DROP TABLE "operations"`);
    await queryRunner.query(`ALTER TABLE "temporary_operations" RENAME TO "operations"`);
    await queryRunner.query(`CREATE INDEX "IDX_a5fda10bf6882e27e4fecbc05f" ON "operations" ("studioId", "styleId", "seq") `);
    await queryRunner.query(`CREATE TABLE "temporary_pay_periods" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fromDay" varchar(10) NOT NULL, "toDay" varchar(10) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('approved'), "approvedBy" integer NOT NULL, "lines" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "rules" text)`);
    await queryRunner.query(`INSERT INTO "temporary_pay_periods"("id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt") SELECT "id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt" FROM "pay_periods"`);
    await queryRunner.query(`DROP TABLE "pay_periods"`);
    await queryRunner.query(`ALTER TABLE "temporary_pay_periods" RENAME TO "pay_periods"`);
    await queryRunner.query(`DROP INDEX "IDX_b3c7bd80554ab33bc4c5cae129"`);
    await queryRunner.query(`DROP INDEX "IDX_60a7b7186e96b938a631a4dcdd"`);
    await queryRunner.query(`DROP INDEX "IDX_4212da054af063c1d1c3ac8f64"`);
    await queryRunner.query(`DROP INDEX "IDX_87968b1601e391e8668f98df94"`);
    await queryRunner.query(`CREATE TABLE "temporary_work_logs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "bundleId" integer NOT NULL, "operationId" integer NOT NULL, "attempt" integer NOT NULL DEFAULT (0), "userId" integer NOT NULL, "pieces" integer NOT NULL, "earnedMinutes" real NOT NULL, "payMinor" integer NOT NULL DEFAULT (0), "idempotencyKey" varchar(80) NOT NULL, "outcome" varchar(8) NOT NULL DEFAULT (''), "defect" varchar(200) NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payPeriodId" integer, "pieceRate" varchar(24) NOT NULL DEFAULT (''))`);
    await queryRunner.query(`INSERT INTO "temporary_work_logs"("id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt", "payPeriodId") SELECT "id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt", "payPeriodId" FROM "work_logs"`);
    await queryRunner.query(`DROP TABLE "work_logs"`);
    await queryRunner.query(`ALTER TABLE "temporary_work_logs" RENAME TO "work_logs"`);
    await queryRunner.query(`CREATE INDEX "IDX_b3c7bd80554ab33bc4c5cae129" ON "work_logs" ("payPeriodId") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_60a7b7186e96b938a631a4dcdd" ON "work_logs" ("idempotencyKey") `);
    await queryRunner.query(`CREATE INDEX "IDX_4212da054af063c1d1c3ac8f64" ON "work_logs" ("studioId", "userId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_87968b1601e391e8668f98df94" ON "work_logs" ("bundleId", "operationId", "attempt") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_87968b1601e391e8668f98df94"`);
    await queryRunner.query(`DROP INDEX "IDX_4212da054af063c1d1c3ac8f64"`);
    await queryRunner.query(`DROP INDEX "IDX_60a7b7186e96b938a631a4dcdd"`);
    await queryRunner.query(`DROP INDEX "IDX_b3c7bd80554ab33bc4c5cae129"`);
    await queryRunner.query(`ALTER TABLE "work_logs" RENAME TO "temporary_work_logs"`);
    await queryRunner.query(`CREATE TABLE "work_logs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "bundleId" integer NOT NULL, "operationId" integer NOT NULL, "attempt" integer NOT NULL DEFAULT (0), "userId" integer NOT NULL, "pieces" integer NOT NULL, "earnedMinutes" real NOT NULL, "payMinor" integer NOT NULL DEFAULT (0), "idempotencyKey" varchar(80) NOT NULL, "outcome" varchar(8) NOT NULL DEFAULT (''), "defect" varchar(200) NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payPeriodId" integer)`);
    await queryRunner.query(`INSERT INTO "work_logs"("id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt", "payPeriodId") SELECT "id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt", "payPeriodId" FROM "temporary_work_logs"`);
    await queryRunner.query(`DROP TABLE "temporary_work_logs"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_87968b1601e391e8668f98df94" ON "work_logs" ("bundleId", "operationId", "attempt") `);
    await queryRunner.query(`CREATE INDEX "IDX_4212da054af063c1d1c3ac8f64" ON "work_logs" ("studioId", "userId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_60a7b7186e96b938a631a4dcdd" ON "work_logs" ("idempotencyKey") `);
    await queryRunner.query(`CREATE INDEX "IDX_b3c7bd80554ab33bc4c5cae129" ON "work_logs" ("payPeriodId") `);
    await queryRunner.query(`ALTER TABLE "pay_periods" RENAME TO "temporary_pay_periods"`);
    await queryRunner.query(`CREATE TABLE "pay_periods" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fromDay" varchar(10) NOT NULL, "toDay" varchar(10) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('approved'), "approvedBy" integer NOT NULL, "lines" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "pay_periods"("id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt") SELECT "id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt" FROM "temporary_pay_periods"`);
    await queryRunner.query(`DROP TABLE "temporary_pay_periods"`);
    await queryRunner.query(`DROP INDEX "IDX_a5fda10bf6882e27e4fecbc05f"`);
    await queryRunner.query(`ALTER TABLE "operations" RENAME TO "temporary_operations"`);
    await queryRunner.query(`CREATE TABLE "operations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "seq" integer NOT NULL, "code" varchar(12) NOT NULL, "name" varchar(120) NOT NULL, "section" varchar(12) NOT NULL, "machineType" varchar(24) NOT NULL, "sam" real NOT NULL, "predecessors" text NOT NULL, "pieceRateMinor" integer, "timeStudy" text)`);
    await queryRunner.query(`INSERT INTO "operations"("id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor", "timeStudy") SELECT "id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor", "timeStudy" FROM "temporary_operations"`);
    await queryRunner.query(`DROP TABLE "temporary_operations"`);
    await queryRunner.query(`CREATE INDEX "IDX_a5fda10bf6882e27e4fecbc05f" ON "operations" ("studioId", "styleId", "seq") `);
    await queryRunner.query(`DROP INDEX "IDX_11768edd614a0f43a0f0f405ae"`);
    await queryRunner.query(`DROP TABLE "studio_work_rules"`);
  }
}
