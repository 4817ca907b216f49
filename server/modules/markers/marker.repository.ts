import { In, type DataSource } from 'typeorm';
import { createStatements } from '../../db/statements';
import { BatchEntity, MarkerEntity, StudioEntity } from '../../entities';
import type { MarkerStatus } from '../../entities/marker.entity';
import type { QueryDeepPartialEntity } from 'typeorm';

export type MarkerRepository = ReturnType<typeof createMarkerRepository>;

/** Marker queries, scoped by studio (except the queue's resume query, which runs at start-up). */
export function createMarkerRepository(ds: DataSource) {
  const repo = ds.getRepository(MarkerEntity);
  const sql = createStatements(ds);
  return {
    /** The studio's name, printed on a marker plot. */
    /** The studio's name and the language, units and time zone its documents are written in. */
    studio: (studioId: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id: studioId }),
    get: (studioId: number, id: number) => repo.findOne({ where: { studioId, id } }),
    /** The marker's batch, for the batch code on its files. */
    batch: (studioId: number, id: number) => ds.getRepository(BatchEntity).findOneBy({ studioId, id }),
    list: (studioId: number, where: { styleId?: number; batchId?: number } = {}) =>
      repo.find({ where: { studioId, ...where }, order: { id: 'DESC' }, take: 100 }),
    /** A live or finished marker with the same inputs (failed and cancelled runs are not reused). */
    byHash: (studioId: number, inputHash: string) =>
      repo.findOne({ where: { studioId, inputHash, status: In(['queued', 'running', 'done']) }, order: { id: 'DESC' } }),
    /** Finished markers of a style on one fabric at its width (a lining's marker is never the shell's). */
    doneForStyle: (studioId: number, styleId: number, fabricId: number, widthMm: number) =>
      repo.find({ where: { studioId, styleId, fabricId, widthMm, status: 'done' }, order: { id: 'DESC' } }),
    insert: (m: Partial<MarkerEntity>) => repo.save(repo.create(m)),
    async update(studioId: number, id: number, patch: Partial<MarkerEntity>) {
      await repo.update({ studioId, id }, patch as QueryDeepPartialEntity<MarkerEntity>);
    },
    /** Jobs a stopped server left behind: queued or running, oldest first. */
    unfinished: () => repo.find({ where: { status: In<MarkerStatus>(['queued', 'running']) }, order: { id: 'ASC' } }),
    /**
     * Jobs any process may claim now: queued, or running under a lease that ran out (its process died),
     * oldest first. Several processes may list the same job; `claim` lets one of them run it.
     */
    claimable: (nowMs: number) =>
      sql.all(
        MarkerEntity,
        `SELECT * FROM "markers" WHERE "status" = 'queued' OR ("status" = 'running' AND ("leaseExpiresAtMs" IS NULL OR "leaseExpiresAtMs" < ?)) ORDER BY "id"`,
        [nowMs],
      ),
    /**
     * Claim a job in one conditional UPDATE: true for exactly one caller. `takeover` also claims a job
     * another holder still leases (the Redis queue, whose own lock already says that holder is gone).
     */
    async claim(studioId: number, id: number, token: string, nowMs: number, leaseMs: number, takeover = false): Promise<boolean> {
      const running = takeover ? `"status" = 'running'` : `"status" = 'running' AND ("leaseExpiresAtMs" IS NULL OR "leaseExpiresAtMs" < ?)`;
      const claimed = await sql.value(
        `UPDATE "markers" SET "status" = 'running', "runs" = "runs" + 1, "claimToken" = ?, "leaseExpiresAtMs" = ? WHERE "id" = ? AND "studioId" = ? AND ("status" = 'queued' OR (${running})) RETURNING "id"`,
        takeover ? [token, nowMs + leaseMs, id, studioId] : [token, nowMs + leaseMs, id, studioId, nowMs],
      );
      return claimed !== undefined;
    },
    /** Extend a claim; false when the job was cancelled elsewhere or claimed by another process. */
    async renew(id: number, token: string, untilMs: number): Promise<boolean> {
      const renewed = await sql.value(
        `UPDATE "markers" SET "leaseExpiresAtMs" = ? WHERE "id" = ? AND "claimToken" = ? AND "status" = 'running' RETURNING "id"`,
        [untilMs, id, token],
      );
      return renewed !== undefined;
    },
    /** Store a run's outcome, only while `token` still holds the claim; the claim ends with it. */
    async finish(studioId: number, id: number, token: string, patch: Partial<MarkerEntity>) {
      await repo.update({ studioId, id, claimToken: token }, { ...patch, claimToken: null, leaseExpiresAtMs: null } as QueryDeepPartialEntity<MarkerEntity>);
    },
  };
}
