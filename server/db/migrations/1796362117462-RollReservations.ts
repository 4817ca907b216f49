import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RollReservations1796362117462 implements MigrationInterface {
  name = 'RollReservations1796362117462';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "roll_reservations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "rollId" integer NOT NULL, "cutPlanId" integer NOT NULL, "layId" integer NOT NULL, "batchId" integer NOT NULL, "lengthMm" real NOT NULL, "status" varchar(10) NOT NULL DEFAULT ('held'), "consumedMm" real, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "settledAt" datetime)`);
    await queryRunner.query(`CREATE INDEX "IDX_1c34637b66c6828215488e00ca" ON "roll_reservations" ("studioId", "cutPlanId") `);
    await queryRunner.query(`CREATE INDEX "IDX_91ca427fe604676c95da91f436" ON "roll_reservations" ("studioId", "rollId", "status") `);
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`CREATE TABLE "temporary_rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "reservedMm" real NOT NULL DEFAULT (0), CONSTRAINT "FK_7c93a04625a9bc94379054e18e2" FOREIGN KEY ("fabricId") REFERENCES "fabrics" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_rolls"("id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt") SELECT "id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt" FROM "rolls"`);
    await queryRunner.query(`DROP TABLE "rolls"`);
    await queryRunner.query(`ALTER TABLE "temporary_rolls" RENAME TO "rolls"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
    // Lays already planned hold their rolls from now on, as if planned after this change.
    const lays: { id: number; studioId: number; cutPlanId: number; batchId: number; rolls: string; markerLengthMm: number; endAllowanceMm: number }[] = await queryRunner.query(
      `SELECT l."id", l."studioId", l."cutPlanId", l."batchId", l."rolls", l."markerLengthMm", l."endAllowanceMm" FROM "lays" l JOIN "cut_plans" p ON p."id" = l."cutPlanId" WHERE l."status" = 'planned' AND p."status" <> 'superseded'`,
    );
    for (const lay of lays) {
      for (const line of JSON.parse(lay.rolls) as { rollId: number; plies: number }[]) {
        const lengthMm = line.plies * (lay.markerLengthMm + lay.endAllowanceMm);
        if (!(lengthMm > 0)) continue;
        await queryRunner.query(
          `INSERT INTO "roll_reservations" ("studioId", "rollId", "cutPlanId", "layId", "batchId", "lengthMm", "status") VALUES (?, ?, ?, ?, ?, ?, 'held')`,
          [lay.studioId, line.rollId, lay.cutPlanId, lay.id, lay.batchId, lengthMm],
        );
        await queryRunner.query(`UPDATE "rolls" SET "reservedMm" = "reservedMm" + ? WHERE "id" = ?`, [lengthMm, line.rollId]);
      }
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_065051debbc61e0ba44511b7cd"`);
    await queryRunner.query(`ALTER TABLE "rolls" RENAME TO "temporary_rolls"`);
    await queryRunner.query(`CREATE TABLE "rolls" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "studioId" integer NOT NULL, "fabricId" integer NOT NULL, "label" varchar(40) NOT NULL, "lengthMm" real NOT NULL, "widthMm" real NOT NULL, "shadeLot" varchar(40) NOT NULL, "receivedDate" varchar(10) NOT NULL, "remainingMm" real NOT NULL, "isRemnant" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_7c93a04625a9bc94379054e18e2" FOREIGN KEY ("fabricId") REFERENCES "fabrics" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "rolls"("id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt") SELECT "id", "studioId", "fabricId", "label", "lengthMm", "widthMm", "shadeLot", "receivedDate", "remainingMm", "isRemnant", "createdAt" FROM "temporary_rolls"`);
    await queryRunner.query(`DROP TABLE "temporary_rolls"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_065051debbc61e0ba44511b7cd" ON "rolls" ("studioId", "label") `);
    await queryRunner.query(`DROP INDEX "IDX_91ca427fe604676c95da91f436"`);
    await queryRunner.query(`DROP INDEX "IDX_1c34637b66c6828215488e00ca"`);
    await queryRunner.query(`DROP TABLE "roll_reservations"`);
  }
}
