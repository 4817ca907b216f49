import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PayoutFreezeAndLogPayPeriod1796362058857 implements MigrationInterface {
  name = 'PayoutFreezeAndLogPayPeriod1796362058857';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_84a12a9110c12ee41ae80cc0f8"`);
    await queryRunner.query(`CREATE TABLE "temporary_payouts" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "payPeriodId" integer NOT NULL, "userId" integer NOT NULL, "amountMinor" integer NOT NULL, "currency" varchar(3) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('pending'), "idempotencyKey" varchar(80) NOT NULL, "providerRef" varchar(120) NOT NULL DEFAULT (''), "error" text NOT NULL DEFAULT (''), "attempts" integer NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "destination" varchar(120) NOT NULL DEFAULT (''), "description" varchar(250) NOT NULL DEFAULT (''))`);
    await queryRunner.query(`INSERT INTO "temporary_payouts"("id", "studioId", "payPeriodId", "userId", "amountMinor", "currency", "status", "idempotencyKey", "providerRef", "error", "attempts", "createdAt", "updatedAt") SELECT "id", "studioId", "payPeriodId", "userId", "amountMinor", "currency", "status", "idempotencyKey", "providerRef", "error", "attempts", "createdAt", "updatedAt" FROM "payouts"`);
    await queryRunner.query(`DROP TABLE "payouts"`);
    await queryRunner.query(`ALTER TABLE "temporary_payouts" RENAME TO "payouts"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_84a12a9110c12ee41ae80cc0f8" ON "payouts" ("payPeriodId", "userId") `);
    await queryRunner.query(`DROP INDEX "IDX_87968b1601e391e8668f98df94"`);
    await queryRunner.query(`DROP INDEX "IDX_4212da054af063c1d1c3ac8f64"`);
    await queryRunner.query(`DROP INDEX "IDX_60a7b7186e96b938a631a4dcdd"`);
    await queryRunner.query(`CREATE TABLE "temporary_work_logs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "bundleId" integer NOT NULL, "operationId" integer NOT NULL, "attempt" integer NOT NULL DEFAULT (0), "userId" integer NOT NULL, "pieces" integer NOT NULL, "earnedMinutes" real NOT NULL, "payMinor" integer NOT NULL DEFAULT (0), "idempotencyKey" varchar(80) NOT NULL, "outcome" varchar(8) NOT NULL DEFAULT (''), "defect" varchar(200) NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "payPeriodId" integer)`);
    await queryRunner.query(`INSERT INTO "temporary_work_logs"("id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt") SELECT "id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt" FROM "work_logs"`);
    await queryRunner.query(`DROP TABLE "work_logs"`);
    await queryRunner.query(`ALTER TABLE "temporary_work_logs" RENAME TO "work_logs"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_87968b1601e391e8668f98df94" ON "work_logs" ("bundleId", "operationId", "attempt") `);
    await queryRunner.query(`CREATE INDEX "IDX_4212da054af063c1d1c3ac8f64" ON "work_logs" ("studioId", "userId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_60a7b7186e96b938a631a4dcdd" ON "work_logs" ("idempotencyKey") `);
    await queryRunner.query(`CREATE INDEX "IDX_b3c7bd80554ab33bc4c5cae129" ON "work_logs" ("payPeriodId") `);
    // Logs of periods approved before this column existed belong to the period whose days hold them.
    await queryRunner.query(
      `UPDATE "work_logs" SET "payPeriodId" = (SELECT p."id" FROM "pay_periods" p WHERE p."studioId" = "work_logs"."studioId" AND substr("work_logs"."createdAt", 1, 10) BETWEEN p."fromDay" AND p."toDay" ORDER BY p."id" LIMIT 1)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_b3c7bd80554ab33bc4c5cae129"`);
    await queryRunner.query(`DROP INDEX "IDX_60a7b7186e96b938a631a4dcdd"`);
    await queryRunner.query(`DROP INDEX "IDX_4212da054af063c1d1c3ac8f64"`);
    await queryRunner.query(`DROP INDEX "IDX_87968b1601e391e8668f98df94"`);
    await queryRunner.query(`ALTER TABLE "work_logs" RENAME TO "temporary_work_logs"`);
    await queryRunner.query(`CREATE TABLE "work_logs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "bundleId" integer NOT NULL, "operationId" integer NOT NULL, "attempt" integer NOT NULL DEFAULT (0), "userId" integer NOT NULL, "pieces" integer NOT NULL, "earnedMinutes" real NOT NULL, "payMinor" integer NOT NULL DEFAULT (0), "idempotencyKey" varchar(80) NOT NULL, "outcome" varchar(8) NOT NULL DEFAULT (''), "defect" varchar(200) NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "work_logs"("id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt") SELECT "id", "studioId", "bundleId", "operationId", "attempt", "userId", "pieces", "earnedMinutes", "payMinor", "idempotencyKey", "outcome", "defect", "createdAt" FROM "temporary_work_logs"`);
    await queryRunner.query(`DROP TABLE "temporary_work_logs"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_60a7b7186e96b938a631a4dcdd" ON "work_logs" ("idempotencyKey") `);
    await queryRunner.query(`CREATE INDEX "IDX_4212da054af063c1d1c3ac8f64" ON "work_logs" ("studioId", "userId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_87968b1601e391e8668f98df94" ON "work_logs" ("bundleId", "operationId", "attempt") `);
    await queryRunner.query(`DROP INDEX "IDX_84a12a9110c12ee41ae80cc0f8"`);
    await queryRunner.query(`ALTER TABLE "payouts" RENAME TO "temporary_payouts"`);
    await queryRunner.query(`CREATE TABLE "payouts" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "payPeriodId" integer NOT NULL, "userId" integer NOT NULL, "amountMinor" integer NOT NULL, "currency" varchar(3) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('pending'), "idempotencyKey" varchar(80) NOT NULL, "providerRef" varchar(120) NOT NULL DEFAULT (''), "error" text NOT NULL DEFAULT (''), "attempts" integer NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "payouts"("id", "studioId", "payPeriodId", "userId", "amountMinor", "currency", "status", "idempotencyKey", "providerRef", "error", "attempts", "createdAt", "updatedAt") SELECT "id", "studioId", "payPeriodId", "userId", "amountMinor", "currency", "status", "idempotencyKey", "providerRef", "error", "attempts", "createdAt", "updatedAt" FROM "temporary_payouts"`);
    await queryRunner.query(`DROP TABLE "temporary_payouts"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_84a12a9110c12ee41ae80cc0f8" ON "payouts" ("payPeriodId", "userId") `);
  }
}
