import type { MigrationInterface, QueryRunner } from 'typeorm';

export class FloorSignInAndBundleNumbers1796361960738 implements MigrationInterface {
  name = 'FloorSignInAndBundleNumbers1796361960738';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "floor_devices" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "tokenHash" character varying(64) NOT NULL, "label" character varying(80) NOT NULL, "createdById" integer NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_e46eba43ad5a5baef9392ea96a8" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_1d556b4230d013f6daac4a2c1d" ON "floor_devices"  ("tokenHash") `);
    await queryRunner.query(`ALTER TABLE "bundles" ADD "numberScope" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "users" ADD "pinFailures" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(`ALTER TABLE "users" ADD "pinLockedUntil" TIMESTAMP WITH TIME ZONE`);
    // Bundles cut before numbers were studio-wide keep the numbers on their printed tickets. Where a number
    // is also another batch's, it stays unique only with its batch (numberScope = batchId) and is always
    // typed or scanned with it; every other bundle, and every bundle cut from now on, is unique in the studio.
    await queryRunner.query(`UPDATE "bundles" SET "numberScope" = "batchId" WHERE EXISTS (SELECT 1 FROM "bundles" "o" WHERE "o"."studioId" = "bundles"."studioId" AND "o"."number" = "bundles"."number" AND "o"."batchId" <> "bundles"."batchId")`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a2e8cd210b7186e5e60febdac1" ON "bundles"  ("studioId", "numberScope", "number") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_a2e8cd210b7186e5e60febdac1"`);
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "pinLockedUntil"`);
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "pinFailures"`);
    await queryRunner.query(`ALTER TABLE "bundles" DROP COLUMN "numberScope"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_1d556b4230d013f6daac4a2c1d"`);
    await queryRunner.query(`DROP TABLE "floor_devices"`);
  }
}
