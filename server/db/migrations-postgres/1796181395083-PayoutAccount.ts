import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PayoutAccount1796181395083 implements MigrationInterface {
  name = 'PayoutAccount1796181395083';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" ADD "payoutAccount" character varying(64) NOT NULL DEFAULT ''`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "payoutAccount"`);
  }
}
