import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StudioLanguageAndTimeZone1796372876444 implements MigrationInterface {
  name = 'StudioLanguageAndTimeZone1796372876444';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "studios" ADD "language" character varying(8) NOT NULL DEFAULT 'en'`);
    await queryRunner.query(`ALTER TABLE "studios" ADD "timeZone" character varying(64) NOT NULL DEFAULT 'UTC'`);
    await queryRunner.query(`ALTER TABLE "users" ADD "language" character varying(8)`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "language"`);
    await queryRunner.query(`ALTER TABLE "studios" DROP COLUMN "timeZone"`);
    await queryRunner.query(`ALTER TABLE "studios" DROP COLUMN "language"`);
  }
}
