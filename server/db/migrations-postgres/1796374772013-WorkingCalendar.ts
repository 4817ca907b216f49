import type { MigrationInterface, QueryRunner } from 'typeorm';

export class WorkingCalendar1796374772013 implements MigrationInterface {
  name = 'WorkingCalendar1796374772013';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "timeZone" character varying(64) NOT NULL DEFAULT 'UTC'`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "workdays" text`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "shiftStart" character varying(5) NOT NULL DEFAULT ''`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "shiftEnd" character varying(5) NOT NULL DEFAULT ''`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "breakMinutes" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "holidays" text`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" ADD "overtimeLimitHoursPerWeek" real`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "overtimeLimitHoursPerWeek"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "holidays"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "breakMinutes"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "shiftEnd"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "shiftStart"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "workdays"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" DROP COLUMN "timeZone"`);
  }
}
