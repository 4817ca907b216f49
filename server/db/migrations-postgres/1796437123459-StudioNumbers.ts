import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StudioNumbers1796437123459 implements MigrationInterface {
  name = 'StudioNumbers1796437123459';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Rows already saved take 1, 2, 3… in each studio in id order (the demo studio, made first, keeps numbers equal to its ids).
    await queryRunner.query(`ALTER TABLE "batches" ADD "number" integer`);
    await queryRunner.query(`UPDATE "batches" AS t SET "number" = n."rn" FROM (SELECT "id", ROW_NUMBER() OVER (PARTITION BY "studioId" ORDER BY "id") AS "rn" FROM "batches") AS n WHERE n."id" = t."id"`);
    await queryRunner.query(`ALTER TABLE "batches" ALTER COLUMN "number" SET NOT NULL`);
    await queryRunner.query(`ALTER TABLE "pay_periods" ADD "number" integer`);
    await queryRunner.query(`UPDATE "pay_periods" AS t SET "number" = n."rn" FROM (SELECT "id", ROW_NUMBER() OVER (PARTITION BY "studioId" ORDER BY "id") AS "rn" FROM "pay_periods") AS n WHERE n."id" = t."id"`);
    await queryRunner.query(`ALTER TABLE "pay_periods" ALTER COLUMN "number" SET NOT NULL`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" ADD "number" integer`);
    await queryRunner.query(`UPDATE "purchase_orders" AS t SET "number" = n."rn" FROM (SELECT "id", ROW_NUMBER() OVER (PARTITION BY "studioId" ORDER BY "id") AS "rn" FROM "purchase_orders") AS n WHERE n."id" = t."id"`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" ALTER COLUMN "number" SET NOT NULL`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e3b2838206457f87ab0653c453" ON "batches" ("studioId", "number") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_c96871fe629b141beca9e79d9c" ON "pay_periods" ("studioId", "number") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_993ea4e7b274aab19de7a7dd94" ON "purchase_orders" ("studioId", "number") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."IDX_993ea4e7b274aab19de7a7dd94"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_c96871fe629b141beca9e79d9c"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_e3b2838206457f87ab0653c453"`);
    await queryRunner.query(`ALTER TABLE "purchase_orders" DROP COLUMN "number"`);
    await queryRunner.query(`ALTER TABLE "pay_periods" DROP COLUMN "number"`);
    await queryRunner.query(`ALTER TABLE "batches" DROP COLUMN "number"`);
  }
}
