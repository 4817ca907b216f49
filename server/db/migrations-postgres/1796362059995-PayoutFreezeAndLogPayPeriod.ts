import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PayoutFreezeAndLogPayPeriod1796362059995 implements MigrationInterface {
  name = 'PayoutFreezeAndLogPayPeriod1796362059995';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "payouts" ADD "destination" character varying(120) NOT NULL DEFAULT ''`);
    await queryRunner.query(`ALTER TABLE "payouts" ADD "description" character varying(250) NOT NULL DEFAULT ''`);
    await queryRunner.query(`ALTER TABLE "work_logs" ADD "payPeriodId" integer`);
    await queryRunner.query(`CREATE INDEX "IDX_b3c7bd80554ab33bc4c5cae129" ON "work_logs"  ("payPeriodId") `);
    // Logs of periods approved before this column existed belong to the period whose days hold them.
    await queryRunner.query(
      `UPDATE "work_logs" SET "payPeriodId" = (SELECT p."id" FROM "pay_periods" p WHERE p."studioId" = "work_logs"."studioId" AND to_char("work_logs"."createdAt" AT TIME ZONE 'UTC', 'YYYY-MM-DD') BETWEEN p."fromDay" AND p."toDay" ORDER BY p."id" LIMIT 1)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_b3c7bd80554ab33bc4c5cae129"`);
    await queryRunner.query(`ALTER TABLE "work_logs" DROP COLUMN "payPeriodId"`);
    await queryRunner.query(`ALTER TABLE "payouts" DROP COLUMN "description"`);
    await queryRunner.query(`ALTER TABLE "payouts" DROP COLUMN "destination"`);
  }
}
