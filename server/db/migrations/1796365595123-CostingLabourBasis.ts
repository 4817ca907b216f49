import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CostingLabourBasis1796365595123 implements MigrationInterface {
  name = 'CostingLabourBasis1796365595123';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_79adc92f9fef7133fad4b9bd3a"`);
    await queryRunner.query(`CREATE TABLE "temporary_costing_settings" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "labourCostPerMinuteMinor" integer NOT NULL, "overheadPercent" real NOT NULL DEFAULT (0), "wastagePercent" real NOT NULL DEFAULT (3), "marginPercent" real NOT NULL DEFAULT (20), "retailMultiplier" real NOT NULL DEFAULT (2), "labourBasis" varchar(12) NOT NULL DEFAULT ('sam'))`);
    await queryRunner.query(`INSERT INTO "temporary_costing_settings"("id", "studioId", "styleId", "labourCostPerMinuteMinor", "overheadPercent", "wastagePercent", "marginPercent", "retailMultiplier") SELECT "id", "studioId", "styleId", "labourCostPerMinuteMinor", "overheadPercent", "wastagePercent", "marginPercent", "retailMultiplier" FROM "costing_settings"`);
    await queryRunner.query(`DROP TABLE "costing_settings"`);
    await queryRunner.query(`ALTER TABLE "temporary_costing_settings" RENAME TO "costing_settings"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_79adc92f9fef7133fad4b9bd3a" ON "costing_settings" ("studioId", "styleId") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_79adc92f9fef7133fad4b9bd3a"`);
    await queryRunner.query(`ALTER TABLE "costing_settings" RENAME TO "temporary_costing_settings"`);
    await queryRunner.query(`CREATE TABLE "costing_settings" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "labourCostPerMinuteMinor" integer NOT NULL, "overheadPercent" real NOT NULL DEFAULT (0), "wastagePercent" real NOT NULL DEFAULT (3), "marginPercent" real NOT NULL DEFAULT (20), "retailMultiplier" real NOT NULL DEFAULT (2))`);
    await queryRunner.query(`INSERT INTO "costing_settings"("id", "studioId", "styleId", "labourCostPerMinuteMinor", "overheadPercent", "wastagePercent", "marginPercent", "retailMultiplier") SELECT "id", "studioId", "styleId", "labourCostPerMinuteMinor", "overheadPercent", "wastagePercent", "marginPercent", "retailMultiplier" FROM "temporary_costing_settings"`);
    await queryRunner.query(`DROP TABLE "temporary_costing_settings"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_79adc92f9fef7133fad4b9bd3a" ON "costing_settings" ("studioId", "styleId") `);
  }
}
