import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ProductionPlanning1796167187845 implements MigrationInterface {
  name = 'ProductionPlanning1796167187845';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "attendance" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "userId" integer NOT NULL, "day" varchar(10) NOT NULL, "minutes" real NOT NULL)`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_ea57146c900a178d4994c39dcc" ON "attendance" ("studioId", "userId", "day") `);
    await queryRunner.query(`CREATE TABLE "bundles" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "batchId" integer NOT NULL, "layId" integer NOT NULL, "number" integer NOT NULL, "size" varchar(12) NOT NULL, "shadeLot" varchar(40) NOT NULL, "plyFrom" integer NOT NULL, "plyTo" integer NOT NULL, "pieces" integer NOT NULL, "reopened" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_d560b96b8168fec10a362ae3aa" ON "bundles" ("studioId", "batchId", "number") `);
    await queryRunner.query(`CREATE TABLE "costing_settings" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "labourCostPerMinuteMinor" integer NOT NULL, "overheadPercent" real NOT NULL DEFAULT (0), "wastagePercent" real NOT NULL DEFAULT (3), "marginPercent" real NOT NULL DEFAULT (20), "retailMultiplier" real NOT NULL DEFAULT (2))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_79adc92f9fef7133fad4b9bd3a" ON "costing_settings" ("studioId", "styleId") `);
    await queryRunner.query(`CREATE TABLE "cut_plans" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "batchId" integer NOT NULL, "fabricId" integer NOT NULL, "input" text NOT NULL, "result" text NOT NULL, "fabricUsedMm" real NOT NULL, "lowerBoundMm" real NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('draft'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "fabrics" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "composition" varchar(200) NOT NULL DEFAULT (''), "widthMm" real NOT NULL, "shrinkagePercent" real NOT NULL DEFAULT (0), "isDirectional" boolean NOT NULL DEFAULT (0), "pricePerMetreMinor" integer NOT NULL DEFAULT (0), "supplierId" integer, "maxPlies" integer NOT NULL DEFAULT (40), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "grading_sets" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "sizeChart" text NOT NULL, "pieces" text NOT NULL, "gradeRules" text NOT NULL, "eases" text NOT NULL, "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_cbdc2598d7688c754ea5ab588c" ON "grading_sets" ("studioId", "styleId") `);
    await queryRunner.query(`CREATE TABLE "lays" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "cutPlanId" integer NOT NULL, "batchId" integer NOT NULL, "seq" integer NOT NULL, "ratio" text NOT NULL, "plies" integer NOT NULL, "markerLengthMm" real NOT NULL, "endAllowanceMm" real NOT NULL, "markerId" integer, "spreadingMode" varchar(24) NOT NULL, "rolls" text NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('planned'), "flaws" text NOT NULL DEFAULT (''), "cutAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fffd4b509d74360d6e7d296286" ON "lays" ("studioId", "cutPlanId", "seq") `);
    await queryRunner.query(`CREATE TABLE "mail_messages" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "to" varchar(200) NOT NULL, "subject" varchar(300) NOT NULL, "text" text NOT NULL, "attachments" text NOT NULL, "messageId" varchar(200) NOT NULL DEFAULT (''), "status" varchar(12) NOT NULL DEFAULT ('sent'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "markers" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "batchId" integer, "fabricId" integer, "ratio" text NOT NULL, "widthMm" real NOT NULL, "inputHash" varchar(64) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('queued'), "lengthMm" real, "utilisation" real, "elapsedMs" real NOT NULL DEFAULT (0), "input" text, "result" text, "error" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f" ON "markers" ("studioId", "inputHash") `);
    await queryRunner.query(`CREATE TABLE "operations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "seq" integer NOT NULL, "code" varchar(12) NOT NULL, "name" varchar(120) NOT NULL, "section" varchar(12) NOT NULL, "machineType" varchar(24) NOT NULL, "sam" real NOT NULL, "predecessors" text NOT NULL, "pieceRateMinor" integer)`);
    await queryRunner.query(`CREATE INDEX "IDX_a5fda10bf6882e27e4fecbc05f" ON "operations" ("studioId", "styleId", "seq") `);
    await queryRunner.query(`CREATE TABLE "pay_periods" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fromDay" varchar(10) NOT NULL, "toDay" varchar(10) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('approved'), "approvedBy" integer NOT NULL, "lines" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "payouts" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "payPeriodId" integer NOT NULL, "userId" integer NOT NULL, "amountMinor" integer NOT NULL, "currency" varchar(3) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('pending'), "idempotencyKey" varchar(80) NOT NULL, "providerRef" varchar(120) NOT NULL DEFAULT (''), "error" text NOT NULL DEFAULT (''), "attempts" integer NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_84a12a9110c12ee41ae80cc0f8" ON "payouts" ("payPeriodId", "userId") `);
    await queryRunner.query(`CREATE TABLE "purchase_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "supplierId" integer NOT NULL, "batchId" integer, "status" varchar(12) NOT NULL DEFAULT ('draft'), "lines" text NOT NULL, "deliveryDate" varchar(10) NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
    await queryRunner.query(`CREATE TABLE "suppliers" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "contact" varchar(120) NOT NULL DEFAULT (''), "email" varchar(200) NOT NULL, "leadTimeDays" integer NOT NULL DEFAULT (7), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "trims" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "name" varchar(120) NOT NULL, "unit" varchar(16) NOT NULL, "quantityPerGarment" real NOT NULL, "unitPriceMinor" integer NOT NULL, "supplierId" integer, "inStock" real NOT NULL DEFAULT (0))`);
    await queryRunner.query(`CREATE INDEX "IDX_5c7928a550939385b13bab8bb8" ON "trims" ("studioId", "styleId") `);
    await queryRunner.query(`CREATE TABLE "uploads" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "kind" varchar(24) NOT NULL, "styleId" integer, "originalName" varchar(200) NOT NULL, "mimeType" varchar(80) NOT NULL, "size" integer NOT NULL, "storedName" varchar(200) NOT NULL, "uploadedBy" integer NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "work_logs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "bundleId" integer NOT NULL, "operationId" integer NOT NULL, "attempt" integer NOT NULL DEFAULT (0), "userId" integer NOT NULL, "pieces" integer NOT NULL, "earnedMinutes" real NOT NULL, "payMinor" integer NOT NULL DEFAULT (0), "idempotencyKey" varchar(80) NOT NULL, "outcome" varchar(8) NOT NULL DEFAULT (''), "defect" varchar(200) NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_60a7b7186e96b938a631a4dcdd" ON "work_logs" ("idempotencyKey") `);
    await queryRunner.query(`CREATE INDEX "IDX_4212da054af063c1d1c3ac8f64" ON "work_logs" ("studioId", "userId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_87968b1601e391e8668f98df94" ON "work_logs" ("bundleId", "operationId", "attempt") `);
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`CREATE TABLE "temporary_rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_7c93a04625a9bc94379054e18e2" FOREIGN KEY ("fabricId") REFERENCES "fabrics" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_rolls"("id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt") SELECT "id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt" FROM "rolls"`);
    await queryRunner.query(`DROP TABLE "rolls"`);
    await queryRunner.query(`ALTER TABLE "temporary_rolls" RENAME TO "rolls"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`ALTER TABLE "rolls" RENAME TO "temporary_rolls"`);
    await queryRunner.query(`CREATE TABLE "rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "rolls"("id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt") SELECT "id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt" FROM "temporary_rolls"`);
    await queryRunner.query(`DROP TABLE "temporary_rolls"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
    await queryRunner.query(`DROP INDEX "IDX_87968b1601e391e8668f98df94"`);
    await queryRunner.query(`DROP INDEX "IDX_4212da054af063c1d1c3ac8f64"`);
    await queryRunner.query(`DROP INDEX "IDX_60a7b7186e96b938a631a4dcdd"`);
    await queryRunner.query(`DROP TABLE "work_logs"`);
    await queryRunner.query(`DROP TABLE "uploads"`);
    await queryRunner.query(`DROP INDEX "IDX_5c7928a550939385b13bab8bb8"`);
    await queryRunner.query(`DROP TABLE "trims"`);
    await queryRunner.query(`DROP TABLE "suppliers"`);
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`DROP TABLE "rolls"`);
    await queryRunner.query(`DROP TABLE "purchase_orders"`);
    await queryRunner.query(`DROP INDEX "IDX_84a12a9110c12ee41ae80cc0f8"`);
    await queryRunner.query(`DROP TABLE "payouts"`);
    await queryRunner.query(`DROP TABLE "pay_periods"`);
    await queryRunner.query(`DROP INDEX "IDX_a5fda10bf6882e27e4fecbc05f"`);
    await queryRunner.query(`DROP TABLE "operations"`);
    await queryRunner.query(`DROP INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f"`);
    await queryRunner.query(`DROP TABLE "markers"`);
    await queryRunner.query(`DROP TABLE "mail_messages"`);
    await queryRunner.query(`DROP INDEX "IDX_fffd4b509d74360d6e7d296286"`);
    await queryRunner.query(`DROP TABLE "lays"`);
    await queryRunner.query(`DROP INDEX "IDX_cbdc2598d7688c754ea5ab588c"`);
    await queryRunner.query(`DROP TABLE "grading_sets"`);
    await queryRunner.query(`DROP TABLE "fabrics"`);
    await queryRunner.query(`DROP TABLE "cut_plans"`);
    await queryRunner.query(`DROP INDEX "IDX_79adc92f9fef7133fad4b9bd3a"`);
    await queryRunner.query(`DROP TABLE "costing_settings"`);
    await queryRunner.query(`DROP INDEX "IDX_d560b96b8168fec10a362ae3aa"`);
    await queryRunner.query(`DROP TABLE "bundles"`);
    await queryRunner.query(`DROP INDEX "IDX_ea57146c900a178d4994c39dcc"`);
    await queryRunner.query(`DROP TABLE "attendance"`);
  }
}
