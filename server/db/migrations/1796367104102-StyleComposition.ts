import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StyleComposition1796367104102 implements MigrationInterface {
  name = 'StyleComposition1796367104102';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_fa12072b538d463a9b9b541285"`);
    await queryRunner.query(`CREATE TABLE "temporary_styles" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "code" varchar(24) NOT NULL, "name" varchar(120) NOT NULL, "description" text NOT NULL DEFAULT (''), "sizeRun" text NOT NULL, "baseSize" varchar(12) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('draft'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "composition" text, "materialFabrics" text)`);
    await queryRunner.query(`INSERT INTO "temporary_styles"("id", "studioId", "code", "name", "description", "sizeRun", "baseSize", "status", "createdAt", "updatedAt") SELECT "id", "studioId", "code", "name", "description", "sizeRun", "baseSize", "status", "createdAt", "updatedAt" FROM "styles"`);
    await queryRunner.query(`DROP TABLE "styles"`);
    await queryRunner.query(`ALTER TABLE "temporary_styles" RENAME TO "styles"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fa12072b538d463a9b9b541285" ON "styles" ("studioId", "code") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_fa12072b538d463a9b9b541285"`);
    await queryRunner.query(`ALTER TABLE "styles" RENAME TO "temporary_styles"`);
    await queryRunner.query(`CREATE TABLE "styles" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "code" varchar(24) NOT NULL, "name" varchar(120) NOT NULL, "description" text NOT NULL DEFAULT (''), "sizeRun" text NOT NULL, "baseSize" varchar(12) NOT NULL, "status" varchar(16) NOT NULL DEFAULT ('draft'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "styles"("id", "studioId", "code", "name", "description", "sizeRun", "baseSize", "status", "createdAt", "updatedAt") SELECT "id", "studioId", "code", "name", "description", "sizeRun", "baseSize", "status", "createdAt", "updatedAt" FROM "temporary_styles"`);
    await queryRunner.query(`DROP TABLE "temporary_styles"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_fa12072b538d463a9b9b541285" ON "styles" ("studioId", "code") `);
  }
}
