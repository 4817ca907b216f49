import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ManyProcesses1796363770917 implements MigrationInterface {
  name = 'ManyProcesses1796363770917';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "sign_in_throttles" ("key" character varying(255) NOT NULL, "hits" integer NOT NULL, "resetAtMs" bigint NOT NULL, CONSTRAINT "PK_f01bfc0e243b5d41e587ffff6dd" PRIMARY KEY ("key"))`);
    await queryRunner.query(`CREATE INDEX "IDX_62a98bceca2e8078c2851b1280" ON "sign_in_throttles"  ("resetAtMs") `);
    await queryRunner.query(`ALTER TABLE "markers" ADD "runs" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "markers" ADD "claimToken" character varying(40)`);
    await queryRunner.query(`ALTER TABLE "markers" ADD "leaseExpiresAtMs" bigint`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "markers" DROP COLUMN "leaseExpiresAtMs"`);
    await queryRunner.query(`ALTER TABLE "markers" DROP COLUMN "claimToken"`);
    await queryRunner.query(`ALTER TABLE "markers" DROP COLUMN "runs"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_62a98bceca2e8078c2851b1280"`);
    await queryRunner.query(`DROP TABLE "sign_in_throttles"`);
  }
}
