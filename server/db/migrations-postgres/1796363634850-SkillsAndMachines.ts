import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SkillsAndMachines1796363634850 implements MigrationInterface {
  name = 'SkillsAndMachines1796363634850';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "studios" ADD "machines" text`);
    await queryRunner.query(`ALTER TABLE "users" ADD "skills" text`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "skills"`);
    await queryRunner.query(`ALTER TABLE "studios" DROP COLUMN "machines"`);
  }
}
