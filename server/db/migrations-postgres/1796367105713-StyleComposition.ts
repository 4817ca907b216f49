import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StyleComposition1796367105713 implements MigrationInterface {
  name = 'StyleComposition1796367105713';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "styles" ADD "composition" text`);
    await queryRunner.query(`ALTER TABLE "styles" ADD "materialFabrics" text`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "styles" DROP COLUMN "materialFabrics"`);
    await queryRunner.query(`ALTER TABLE "styles" DROP COLUMN "composition"`);
  }
}
