import type { MigrationInterface, QueryRunner } from 'typeorm';

export class OperationTimeStudy1796373144364 implements MigrationInterface {
  name = 'OperationTimeStudy1796373144364';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_a5fda10bf6882e27e4fecbc05f"`);
    await queryRunner.query(`CREATE TABLE "temporary_operations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "seq" integer NOT NULL, "code" varchar(12) NOT NULL, "name" varchar(120) NOT NULL, "section" varchar(12) NOT NULL, "machineType" varchar(24) NOT NULL, "sam" real NOT NULL, "predecessors" text NOT NULL, "pieceRateMinor" integer, "timeStudy" text)`);
    await queryRunner.query(`INSERT INTO "temporary_operations"("id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor") SELECT "id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor" FROM "operations"`);
    await queryRunner.query(`DROP TABLE "operations"`);
    await queryRunner.query(`ALTER TABLE "temporary_operations" RENAME TO "operations"`);
    await queryRunner.query(`CREATE INDEX "IDX_a5fda10bf6882e27e4fecbc05f" ON "operations" ("studioId", "styleId", "seq") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_a5fda10bf6882e27e4fecbc05f"`);
    await queryRunner.query(`ALTER TABLE "operations" RENAME TO "temporary_operations"`);
    await queryRunner.query(`CREATE TABLE "operations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "seq" integer NOT NULL, "code" varchar(12) NOT NULL, "name" varchar(120) NOT NULL, "section" varchar(12) NOT NULL, "machineType" varchar(24) NOT NULL, "sam" real NOT NULL, "predecessors" text NOT NULL, "pieceRateMinor" integer)`);
    await queryRunner.query(`INSERT INTO "operations"("id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor") SELECT "id", "studioId", "styleId", "seq", "code", "name", "section", "machineType", "sam", "predecessors", "pieceRateMinor" FROM "temporary_operations"`);
    await queryRunner.query(`DROP TABLE "temporary_operations"`);
    await queryRunner.query(`CREATE INDEX "IDX_a5fda10bf6882e27e4fecbc05f" ON "operations" ("studioId", "styleId", "seq") `);
  }
}
