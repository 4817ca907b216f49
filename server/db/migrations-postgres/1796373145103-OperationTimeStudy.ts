import type { MigrationInterface, QueryRunner } from 'typeorm';

export class OperationTimeStudy1796373145103 implements MigrationInterface {
  name = 'OperationTimeStudy1796373145103';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "operations" ADD "timeStudy" text`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "operations" DROP COLUMN "timeStudy"`);
  }
}
