import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Per-person skills and the studio's machines. Generated, then reviewed: the generator rebuilt `studios` and
 * `users` through temporary tables, and dropping `studios` on SQLite would cascade to its users when foreign keys
 * are on; a nullable column needs no rebuild, so both are plain ADD/DROP COLUMN (SQLite ≥ 3.35).
 */
export class SkillsAndMachines1796363630677 implements MigrationInterface {
  name = 'SkillsAndMachines1796363630677';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "studios" ADD COLUMN "machines" text`);
    await queryRunner.query(`ALTER TABLE "users" ADD COLUMN "skills" text`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "skills"`);
    await queryRunner.query(`ALTER TABLE "studios" DROP COLUMN "machines"`);
  }
}
