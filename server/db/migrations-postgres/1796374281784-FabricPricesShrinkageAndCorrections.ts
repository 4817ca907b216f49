import type { MigrationInterface, QueryRunner } from 'typeorm';

export class FabricPricesShrinkageAndCorrections1796374281784 implements MigrationInterface {
  name = 'FabricPricesShrinkageAndCorrections1796374281784';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "fabrics" ADD "shrinkageLengthPercent" real NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "fabrics" ADD "shrinkageWidthPercent" real NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "fabrics" ADD "priceMinor" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "fabrics" ADD "priceUnit" character varying(5) NOT NULL DEFAULT 'metre'`);
    await queryRunner.query(`ALTER TABLE "lays" ADD "corrections" text`);
    await queryRunner.query(`ALTER TABLE "rolls" ADD "ticketLengthMm" real`);
    // One shrinkage stood for both directions; a price was per metre.
    await queryRunner.query(`UPDATE "fabrics" SET "shrinkageLengthPercent" = "shrinkagePercent", "shrinkageWidthPercent" = "shrinkagePercent", "priceMinor" = "pricePerMetreMinor", "priceUnit" = 'metre'`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "rolls" DROP COLUMN "ticketLengthMm"`);
    await queryRunner.query(`ALTER TABLE "lays" DROP COLUMN "corrections"`);
    await queryRunner.query(`ALTER TABLE "fabrics" DROP COLUMN "priceUnit"`);
    await queryRunner.query(`ALTER TABLE "fabrics" DROP COLUMN "priceMinor"`);
    await queryRunner.query(`ALTER TABLE "fabrics" DROP COLUMN "shrinkageWidthPercent"`);
    await queryRunner.query(`ALTER TABLE "fabrics" DROP COLUMN "shrinkageLengthPercent"`);
  }
}
