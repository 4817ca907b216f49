import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PayRules1796373684413 implements MigrationInterface {
  name = 'PayRules1796373684413';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "studio_work_rules" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "minimumWageOn" boolean NOT NULL DEFAULT false, "minimumHourlyMinor" character varying(24) NOT NULL DEFAULT '', "overtimePremiumPercent" integer NOT NULL DEFAULT '0', CONSTRAINT "PK_36f413ceb1f3fa028eda9930fe1" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_11768edd614a0f43a0f0f405ae" ON "studio_work_rules"  ("studioId") `);
    await queryRunner.query(`ALTER TABLE "operations" ADD "pieceRate" character varying(24)`);
    await queryRunner.query(`ALTER TABLE "pay_periods" ADD "rules" text`);
    await queryRunner.query(`ALTER TABLE "work_logs" ADD "pieceRate" character varying(24) NOT NULL DEFAULT ''`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "work_logs" DROP COLUMN "pieceRate"`);
    await queryRunner.query(`ALTER TABLE "pay_periods" DROP COLUMN "rules"`);
    await queryRunner.query(`ALTER TABLE "operations" DROP COLUMN "pieceRate"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_11768edd614a0f43a0f0f405ae"`);
    await queryRunner.query(`DROP TABLE "studio_work_rules"`);
  }
}
