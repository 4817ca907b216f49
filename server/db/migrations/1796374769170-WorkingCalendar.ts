import type { MigrationInterface, QueryRunner } from 'typeorm';

export class WorkingCalendar1796374769170 implements MigrationInterface {
  name = 'WorkingCalendar1796374769170';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_11768edd614a0f43a0f0f405ae"`);
    await queryRunner.query(`CREATE TABLE "temporary_studio_work_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "minimumWageOn" boolean NOT NULL DEFAULT (0), "minimumHourlyMinor" varchar(24) NOT NULL DEFAULT (''), "overtimePremiumPercent" integer NOT NULL DEFAULT (0), "timeZone" varchar(64) NOT NULL DEFAULT ('UTC'), "workdays" text, "shiftStart" varchar(5) NOT NULL DEFAULT (''), "shiftEnd" varchar(5) NOT NULL DEFAULT (''), "breakMinutes" integer NOT NULL DEFAULT (0), "holidays" text, "overtimeLimitHoursPerWeek" real)`);
    await queryRunner.query(`INSERT INTO "temporary_studio_work_rules"("id", "studioId", "minimumWageOn", "minimumHourlyMinor", "overtimePremiumPercent") SELECT "id", "studioId", "minimumWageOn", "minimumHourlyMinor", "overtimePremiumPercent" FROM "studio_work_rules"`);
    await queryRunner.query(`DROP TABLE "studio_work_rules"`);
    await queryRunner.query(`ALTER TABLE "temporary_studio_work_rules" RENAME TO "studio_work_rules"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_11768edd614a0f43a0f0f405ae" ON "studio_work_rules" ("studioId") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_11768edd614a0f43a0f0f405ae"`);
    await queryRunner.query(`ALTER TABLE "studio_work_rules" RENAME TO "temporary_studio_work_rules"`);
    await queryRunner.query(`CREATE TABLE "studio_work_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "minimumWageOn" boolean NOT NULL DEFAULT (0), "minimumHourlyMinor" varchar(24) NOT NULL DEFAULT (''), "overtimePremiumPercent" integer NOT NULL DEFAULT (0))`);
    await queryRunner.query(`INSERT INTO "studio_work_rules"("id", "studioId", "minimumWageOn", "minimumHourlyMinor", "overtimePremiumPercent") SELECT "id", "studioId", "minimumWageOn", "minimumHourlyMinor", "overtimePremiumPercent" FROM "temporary_studio_work_rules"`);
    await queryRunner.query(`DROP TABLE "temporary_studio_work_rules"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_11768edd614a0f43a0f0f405ae" ON "studio_work_rules" ("studioId") `);
  }
}
