import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CostingLabourBasis1796365596933 implements MigrationInterface {
  name = 'CostingLabourBasis1796365596933';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "costing_settings" ADD "labourBasis" character varying(12) NOT NULL DEFAULT 'sam'`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "costing_settings" DROP COLUMN "labourBasis"`);
  }
}
