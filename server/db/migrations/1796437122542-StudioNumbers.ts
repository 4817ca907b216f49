import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StudioNumbers1796437122542 implements MigrationInterface {
  name = 'StudioNumbers1796437122542';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Rows already saved take 1, 2, 3… in each studio in id order (the demo studio, made first, keeps numbers equal to its ids).
    await queryRunner.query(`CREATE TABLE "temporary_batches" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "quantities" text NOT NULL, "dueDate" varchar(10) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('planned'), "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "number" integer NOT NULL, CONSTRAINT "FK_04f7e14dcf087edadb0f02a95af" FOREIGN KEY ("styleId") REFERENCES "styles" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_batches"("id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt", "number") SELECT "id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt", ROW_NUMBER() OVER (PARTITION BY "studioId" ORDER BY "id") FROM "batches"`);
    await queryRunner.query(`DROP TABLE "batches"`);
    await queryRunner.query(`ALTER TABLE "temporary_batches" RENAME TO "batches"`);
    await queryRunner.query(`CREATE TABLE "temporary_pay_periods" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fromDay" varchar(10) NOT NULL, "toDay" varchar(10) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('approved'), "approvedBy" integer NOT NULL, "lines" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "rules" text, "number" integer NOT NULL)`);
    await queryRunner.query(`INSERT INTO "temporary_pay_periods"("id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt", "rules", "number") SELECT "id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt", "rules", ROW_NUMBER() OVER (PARTITION BY "studioId" ORDER BY "id") FROM "pay_periods"`);
    await queryRunner.query(`DROP TABLE "pay_periods"`);
    await queryRunner.query(`ALTER TABLE "temporary_pay_periods" RENAME TO "pay_periods"`);
    await queryRunner.query(`CREATE TABLE "temporary_purchase_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "supplierId" integer NOT NULL, "batchId" integer, "status" varchar(12) NOT NULL DEFAULT ('draft'), "lines" text NOT NULL, "deliveryDate" varchar(10) NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "number" integer NOT NULL)`);
    await queryRunner.query(`INSERT INTO "temporary_purchase_orders"("id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt", "number") SELECT "id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt", ROW_NUMBER() OVER (PARTITION BY "studioId" ORDER BY "id") FROM "purchase_orders"`);
    await queryRunner.query(`DROP TABLE "purchase_orders"`);
    await queryRunner.query(`ALTER TABLE "temporary_purchase_orders" RENAME TO "purchase_orders"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e3b2838206457f87ab0653c453" ON "batches" ("studioId", "number") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_c96871fe629b141beca9e79d9c" ON "pay_periods" ("studioId", "number") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_993ea4e7b274aab19de7a7dd94" ON "purchase_orders" ("studioId", "number") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_993ea4e7b274aab19de7a7dd94"`);
    await queryRunner.query(`DROP INDEX "IDX_c96871fe629b141beca9e79d9c"`);
    await queryRunner.query(`DROP INDEX "IDX_e3b2838206457f87ab0653c453"`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" RENAME TO "temporary_purchase_orders"`);
    await queryRunner.query(`CREATE TABLE "purchase_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "supplierId" integer NOT NULL, "batchId" integer, "status" varchar(12) NOT NULL DEFAULT ('draft'), "lines" text NOT NULL, "deliveryDate" varchar(10) NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "purchase_orders"("id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt") SELECT "id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt" FROM "temporary_purchase_orders"`);
    await queryRunner.query(`DROP TABLE "temporary_purchase_orders"`);
    await queryRunner.query(`ALTER TABLE "pay_periods" RENAME TO "temporary_pay_periods"`);
    await queryRunner.query(`CREATE TABLE "pay_periods" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fromDay" varchar(10) NOT NULL, "toDay" varchar(10) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('approved'), "approvedBy" integer NOT NULL, "lines" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "rules" text)`);
    await queryRunner.query(`INSERT INTO "pay_periods"("id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt", "rules") SELECT "id", "studioId", "fromDay", "toDay", "status", "approvedBy", "lines", "createdAt", "rules" FROM "temporary_pay_periods"`);
    await queryRunner.query(`DROP TABLE "temporary_pay_periods"`);
    await queryRunner.query(`ALTER TABLE "batches" RENAME TO "temporary_batches"`);
    await queryRunner.query(`CREATE TABLE "batches" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "quantities" text NOT NULL, "dueDate" varchar(10) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('planned'), "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_04f7e14dcf087edadb0f02a95af" FOREIGN KEY ("styleId") REFERENCES "styles" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "batches"("id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt") SELECT "id", "studioId", "styleId", "quantities", "dueDate", "status", "notes", "createdAt" FROM "temporary_batches"`);
    await queryRunner.query(`DROP TABLE "temporary_batches"`);
  }
}
