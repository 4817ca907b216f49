import type { MigrationInterface, QueryRunner } from 'typeorm';

export class OrderReceiptKeys1796443578179 implements MigrationInterface {
  name = 'OrderReceiptKeys1796443578179';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_993ea4e7b274aab19de7a7dd94"`);
    await queryRunner.query(`CREATE TABLE "temporary_purchase_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "supplierId" integer NOT NULL, "batchId" integer, "status" varchar(12) NOT NULL DEFAULT ('draft'), "lines" text NOT NULL, "deliveryDate" varchar(10) NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "number" integer NOT NULL, "revision" integer NOT NULL DEFAULT (0), "receiptKeys" text)`);
    await queryRunner.query(`INSERT INTO "temporary_purchase_orders"("id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt", "number") SELECT "id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt", "number" FROM "purchase_orders"`);
    await queryRunner.query(`DROP TABLE "purchase_orders"`);
    await queryRunner.query(`ALTER TABLE "temporary_purchase_orders" RENAME TO "purchase_orders"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_993ea4e7b274aab19de7a7dd94" ON "purchase_orders" ("studioId", "number") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_993ea4e7b274aab19de7a7dd94"`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" RENAME TO "temporary_purchase_orders"`);
    await queryRunner.query(`CREATE TABLE "purchase_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "supplierId" integer NOT NULL, "batchId" integer, "status" varchar(12) NOT NULL DEFAULT ('draft'), "lines" text NOT NULL, "deliveryDate" varchar(10) NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "number" integer NOT NULL)`);
    await queryRunner.query(`INSERT INTO "purchase_orders"("id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt", "number") SELECT "id", "studioId", "supplierId", "batchId", "status", "lines", "deliveryDate", "createdAt", "updatedAt", "number" FROM "temporary_purchase_orders"`);
    await queryRunner.query(`DROP TABLE "temporary_purchase_orders"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_993ea4e7b274aab19de7a7dd94" ON "purchase_orders" ("studioId", "number") `);
  }
}
