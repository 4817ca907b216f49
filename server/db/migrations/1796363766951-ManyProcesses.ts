import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ManyProcesses1796363766951 implements MigrationInterface {
  name = 'ManyProcesses1796363766951';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "sign_in_throttles" ("key" varchar(255) PRIMARY KEY NOT NULL, "hits" integer NOT NULL, "resetAtMs" bigint NOT NULL)`);
    await queryRunner.query(`CREATE INDEX "IDX_62a98bceca2e8078c2851b1280" ON "sign_in_throttles" ("resetAtMs") `);
    await queryRunner.query(`DROP INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f"`);
    await queryRunner.query(`CREATE TABLE "temporary_markers" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "batchId" integer, "fabricId" integer, "ratio" text NOT NULL, "widthMm" real NOT NULL, "inputHash" varchar(64) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('queued'), "lengthMm" real, "utilisation" real, "elapsedMs" real NOT NULL DEFAULT (0), "input" text, "result" text, "error" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "runs" integer NOT NULL DEFAULT (0), "claimToken" varchar(40), "leaseExpiresAtMs" bigint)`);
    await queryRunner.query(`INSERT INTO "temporary_markers"("id", "studioId", "styleId", "batchId", "fabricId", "ratio", "widthMm", "inputHash", "status", "lengthMm", "utilisation", "elapsedMs", "input", "result", "error", "createdAt") SELECT "id", "studioId", "styleId", "batchId", "fabricId", "ratio", "widthMm", "inputHash", "status", "lengthMm", "utilisation", "elapsedMs", "input", "result", "error", "createdAt" FROM "markers"`);
    await queryRunner.query(`DROP TABLE "markers"`);
    await queryRunner.query(`ALTER TABLE "temporary_markers" RENAME TO "markers"`);
    await queryRunner.query(`CREATE INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f" ON "markers" ("studioId", "inputHash") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f"`);
    await queryRunner.query(`ALTER TABLE "markers" RENAME TO "temporary_markers"`);
    await queryRunner.query(`CREATE TABLE "markers" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "styleId" integer NOT NULL, "batchId" integer, "fabricId" integer, "ratio" text NOT NULL, "widthMm" real NOT NULL, "inputHash" varchar(64) NOT NULL, "status" varchar(12) NOT NULL DEFAULT ('queued'), "lengthMm" real, "utilisation" real, "elapsedMs" real NOT NULL DEFAULT (0), "input" text, "result" text, "error" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "markers"("id", "studioId", "styleId", "batchId", "fabricId", "ratio", "widthMm", "inputHash", "status", "lengthMm", "utilisation", "elapsedMs", "input", "result", "error", "createdAt") SELECT "id", "studioId", "styleId", "batchId", "fabricId", "ratio", "widthMm", "inputHash", "status", "lengthMm", "utilisation", "elapsedMs", "input", "result", "error", "createdAt" FROM "temporary_markers"`);
    await queryRunner.query(`DROP TABLE "temporary_markers"`);
    await queryRunner.query(`CREATE INDEX "IDX_1e9c5c8f14d65bc8bc41926c6f" ON "markers" ("studioId", "inputHash") `);
    await queryRunner.query(`DROP INDEX "IDX_62a98bceca2e8078c2851b1280"`);
    await queryRunner.query(`DROP TABLE "sign_in_throttles"`);
  }
}
