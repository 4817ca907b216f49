import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RollReservations1796362119816 implements MigrationInterface {
  name = 'RollReservations1796362119816';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "roll_reservations" ("id" SERIAL NOT NULL, "studioId" integer NOT NULL, "rollId" integer NOT NULL, "cutPlanId" integer NOT NULL, "layId" integer NOT NULL, "batchId" integer NOT NULL, "lengthMm" real NOT NULL, "status" character varying(10) NOT NULL DEFAULT 'held', "consumedMm" real, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "settledAt" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_6c7846d3f0d3fec0f6140364d1a" PRIMARY KEY ("id"))`);
    await queryRunner.query(`CREATE INDEX "IDX_1c34637b66c6828215488e00ca" ON "roll_reservations"  ("studioId", "cutPlanId") `);
    await queryRunner.query(`CREATE INDEX "IDX_91ca427fe604676c95da91f436" ON "roll_reservations"  ("studioId", "rollId", "status") `);
    await queryRunner.query(`ALTER TABLE "rolls" ADD "reservedMm" real NOT NULL DEFAULT '0'`);
    // Lays already planned hold their rolls from now on, as if planned after this change.
    const lays: { id: number; studioId: number; cutPlanId: number; batchId: number; rolls: string; markerLengthMm: number; endAllowanceMm: number }[] = await queryRunner.query(
      `SELECT l."id", l."studioId", l."cutPlanId", l."batchId", l."rolls", l."markerLengthMm", l."endAllowanceMm" FROM "lays" l JOIN "cut_plans" p ON p."id" = l."cutPlanId" WHERE l."status" = 'planned' AND p."status" <> 'superseded'`,
    );
    for (const lay of lays) {
      for (const line of JSON.parse(lay.rolls) as { rollId: number; plies: number }[]) {
        const lengthMm = line.plies * (lay.markerLengthMm + lay.endAllowanceMm);
        if (!(lengthMm > 0)) continue;
        await queryRunner.query(
          `INSERT INTO "roll_reservations" ("studioId", "rollId", "cutPlanId", "layId", "batchId", "lengthMm", "status") VALUES ($1, $2, $3, $4, $5, $6, 'held')`,
          [lay.studioId, line.rollId, lay.cutPlanId, lay.id, lay.batchId, lengthMm],
        );
        await queryRunner.query(`UPDATE "rolls" SET "reservedMm" = "reservedMm" + $1 WHERE "id" = $2`, [lengthMm, line.rollId]);
      }
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "rolls" DROP COLUMN "reservedMm"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_91ca427fe604676c95da91f436"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_1c34637b66c6828215488e00ca"`);
    await queryRunner.query(`DROP TABLE "roll_reservations"`);
  }
}
