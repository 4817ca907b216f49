import type { MigrationInterface, QueryRunner } from 'typeorm';

export class FabricPricesShrinkageAndCorrections1796374270955 implements MigrationInterface {
  name = 'FabricPricesShrinkageAndCorrections1796374270955';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "temporary_fabrics" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "composition" varchar(200) NOT NULL DEFAULT (''), "widthMm" real NOT NULL, "shrinkagePercent" real NOT NULL DEFAULT (0), "isDirectional" boolean NOT NULL DEFAULT (0), "pricePerMetreMinor" integer NOT NULL DEFAULT (0), "supplierId" integer, "maxPlies" integer NOT NULL DEFAULT (40), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "shrinkageLengthPercent" real NOT NULL DEFAULT (0), "shrinkageWidthPercent" real NOT NULL DEFAULT (0), "priceMinor" integer NOT NULL DEFAULT (0), "priceUnit" varchar(5) NOT NULL DEFAULT ('metre'))`);
    await queryRunner.query(`INSERT INTO "temporary_fabrics"("id", "studioId", "name", "composition", "widthMm", "shrinkagePercent", "isDirectional", "pricePerMetreMinor", "supplierId", "maxPlies", "createdAt") SELECT "id", "studioId", "name", "composition", "widthMm", "shrinkagePercent", "isDirectional", "pricePerMetreMinor", "supplierId", "maxPlies", "createdAt" FROM "fabrics"`);
    await queryRunner.query(`DROP TABLE "fabrics"`);
    await queryRunner.query(`ALTER TABLE "temporary_fabrics" RENAME TO "fabrics"`);
    await queryRunner.query(`DROP INDEX "IDX_fffd4b509d74360d6e7d296286"`);
    await queryRunner.query(`CREATE TABLE "temporary_lays" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "cutPlanId" integer NOT NULL, "batchId" integer NOT NULL, "seq" integer NOT NULL, "ratio" text NOT NULL, "plies" integer NOT NULL, "markerLengthMm" real NOT NULL, "endAllowanceMm" real NOT NULL, "markerId" integer, "spreadingMode" varchar(24) NOT NULL, "rolls" text NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('planned'), "flaws" text NOT NULL DEFAULT (''), "cutAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "corrections" text)`);
    await queryRunner.query(`INSERT INTO "temporary_lays"("id", "studioId", "cutPlanId", "batchId", "seq", "ratio", "plies", "markerLengthMm", "endAllowanceMm", "markerId", "spreadingMode", "rolls", "status", "flaws", "cutAt", "createdAt") SELECT "id", "studioId", "cutPlanId", "batchId", "seq", "ratio", "plies", "markerLengthMm", "endAllowanceMm", "markerId", "spreadingMode", "rolls", "status", "flaws", "cutAt", "createdAt" FROM "lays"`);
    await queryRunner.query(`DROP TABLE "lays"`);
    await queryRunner.query(`ALTER TABLE "temporary_lays" RENAME TO "lays"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fffd4b509d74360d6e7d296286" ON "lays" ("studioId", "cutPlanId", "seq") `);
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`CREATE TABLE "temporary_rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "reservedMm" real NOT NULL DEFAULT (0), "ticketLengthMm" real, CONSTRAINT "FK_7c93a04625a9bc94379054e18e2" FOREIGN KEY ("fabricId") REFERENCES "fabrics" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_rolls"("id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt", "reservedMm") SELECT "id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt", "reservedMm" FROM "rolls"`);
    await queryRunner.query(`DROP TABLE "rolls"`);
    await queryRunner.query(`ALTER TABLE "temporary_rolls" RENAME TO "rolls"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
    // One shrinkage stood for both directions; a price was per metre.
    await queryRunner.query(`UPDATE "fabrics" SET "shrinkageLengthPercent" = "shrinkagePercent", "shrinkageWidthPercent" = "shrinkagePercent", "priceMinor" = "pricePerMetreMinor", "priceUnit" = 'metre'`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`ALTER TABLE "rolls" RENAME TO "temporary_rolls"`);
    await queryRunner.query(`CREATE TABLE "rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "reservedMm" real NOT NULL DEFAULT (0), CONSTRAINT "FK_7c93a04625a9bc94379054e18e2" FOREIGN KEY ("fabricId") REFERENCES "fabrics" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "rolls"("id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt", "reservedMm") SELECT "id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt", "reservedMm" FROM "temporary_rolls"`);
    await queryRunner.query(`DROP TABLE "temporary_rolls"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
    await queryRunner.query(`DROP INDEX "IDX_fffd4b509d74360d6e7d296286"`);
    await queryRunner.query(`ALTER TABLE "lays" RENAME TO "temporary_lays"`);
    await queryRunner.query(`CREATE TABLE "lays" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "cutPlanId" integer NOT NULL, "batchId" integer NOT NULL, "seq" integer NOT NULL, "ratio" text NOT NULL, "plies" integer NOT NULL, "markerLengthMm" real NOT NULL, "endAllowanceMm" real NOT NULL, "markerId" integer, "spreadingMode" varchar(24) NOT NULL, "rolls" text NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('planned'), "flaws" text NOT NULL DEFAULT (''), "cutAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "lays"("id", "studioId", "cutPlanId", "batchId", "seq", "ratio", "plies", "markerLengthMm", "endAllowanceMm", "markerId", "spreadingMode", "rolls", "status", "flaws", "cutAt", "createdAt") SELECT "id", "studioId", "cutPlanId", "batchId", "seq", "ratio", "plies", "markerLengthMm", "endAllowanceMm", "markerId", "spreadingMode", "rolls", "status", "flaws", "cutAt", "createdAt" FROM "temporary_lays"`);
    await queryRunner.query(`DROP TABLE "temporary_lays"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fffd4b509d74360d6e7d296286" ON "lays" ("studioId", "cutPlanId", "seq") `);
    await queryRunner.query(`ALTER TABLE "fabrics" RENAME TO "temporary_fabrics"`);
    await queryRunner.query(`CREATE TABLE "fabrics" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "name" varchar(120) NOT NULL, "composition" varchar(200) NOT NULL DEFAULT (''), "widthMm" real NOT NULL, "shrinkagePercent" real NOT NULL DEFAULT (0), "isDirectional" boolean NOT NULL DEFAULT (0), "pricePerMetreMinor" integer NOT NULL DEFAULT (0), "supplierId" integer, "maxPlies" integer NOT NULL DEFAULT (40), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "fabrics"("id", "studioId", "name", "composition", "widthMm", "shrinkagePercent", "isDirectional", "pricePerMetreMinor", "supplierId", "maxPlies", "createdAt") SELECT "id", "studioId", "name", "composition", "widthMm", "shrinkagePercent", "isDirectional", "pricePerMetreMinor", "supplierId", "maxPlies", "createdAt" FROM "temporary_fabrics"`);
    await queryRunner.query(`DROP TABLE "temporary_fabrics"`);
  }
}
