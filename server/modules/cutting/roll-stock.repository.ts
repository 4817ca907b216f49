import { In, type DataSource, type EntityManager } from 'typeorm';
import { BatchEntity, RollEntity, RollReservationEntity } from '../../entities';

export type RollStockRepository = ReturnType<typeof createRollStockRepository>;

/** Below this (mm) two lengths are the same: allocation works in real millimetres. */
const LENGTH_EPSILON_MM = 1e-3;
/** A retired batch holds no fabric: its held reservations are released when anyone plans. */
const RETIRED = ['shipped', 'cancelled'];

/**
 * Roll reservations and the roll counts they keep. Every change of `rolls.reservedMm` or
 * `rolls.remainingMm` is one conditional UPDATE, so a check and its count never drift apart under
 * concurrent requests (STYLE.md §10); the reservation rows are the ledger of who held what.
 */
export function createRollStockRepository(ds: DataSource) {
  const reservations = ds.getRepository(RollReservationEntity);
  return {
    /** Held reservations of some lays. */
    heldOfLays: (studioId: number, layIds: number[]) =>
      layIds.length ? reservations.find({ where: { studioId, layId: In(layIds), status: 'held' } }) : Promise.resolve([]),
    heldOfLay: (m: EntityManager, studioId: number, layId: number) =>
      m.getRepository(RollReservationEntity).find({ where: { studioId, layId, status: 'held' } }),
    heldOnRolls: (studioId: number, rollIds: number[]) =>
      rollIds.length ? reservations.find({ where: { studioId, rollId: In(rollIds), status: 'held' } }) : Promise.resolve([]),
    rolls: (studioId: number, ids: number[], m: EntityManager = ds.manager) =>
      ids.length ? m.getRepository(RollEntity).find({ where: { studioId, id: In(ids) } }) : Promise.resolve([]),

    /** Held reservations a new plan of `batchId` replaces: the batch's own, and those of retired batches. */
    async releasable(studioId: number, batchId: number, m: EntityManager = ds.manager) {
      const retired = await m.getRepository(BatchEntity).find({ where: { studioId, status: In(RETIRED) }, select: { id: true } });
      const batchIds = [batchId, ...retired.map((b) => b.id)];
      return m.getRepository(RollReservationEntity).find({ where: { studioId, status: 'held', batchId: In(batchIds) } });
    },

    /** Release held reservations and give their length back to the rolls. */
    async release(m: EntityManager, studioId: number, rows: RollReservationEntity[], now: Date) {
      for (const r of rows) {
        const done = await m.getRepository(RollReservationEntity).update({ studioId, id: r.id, status: 'held' }, { status: 'released', settledAt: now });
        if (!done.affected) continue;
        await m.createQueryBuilder().update(RollEntity)
          .set({ reservedMm: () => '"reservedMm" - :len' })
          .where('"studioId" = :studioId AND "id" = :id', { studioId, id: r.rollId, len: r.lengthMm })
          .execute();
      }
    },

    /**
     * Hold `lengthMm` of a roll for a lay, only if that much is still free (on hand − held): one
     * conditional UPDATE. False when another plan took it first.
     */
    async reserve(m: EntityManager, row: Pick<RollReservationEntity, 'studioId' | 'rollId' | 'cutPlanId' | 'layId' | 'batchId' | 'lengthMm'>) {
      const res = await m.createQueryBuilder().update(RollEntity)
        .set({ reservedMm: () => '"reservedMm" + :len' })
        .where('"studioId" = :studioId AND "id" = :id AND "remainingMm" - "reservedMm" >= :need', {
          studioId: row.studioId, id: row.rollId, len: row.lengthMm, need: row.lengthMm - LENGTH_EPSILON_MM,
        })
        .execute();
      if (!res.affected) return false;
      await m.getRepository(RollReservationEntity).insert({ ...row, status: 'held', consumedMm: null, settledAt: null });
      return true;
    },

    /**
     * A lay was cut from this roll: what is left becomes `remainingMm` (never more than before: the
     * UPDATE only matches while the roll still has at least that much) and the lay's hold is consumed.
     * False when the roll holds less than `leftMm` now.
     */
    async consume(m: EntityManager, studioId: number, layId: number, rollId: number, leftMm: number, isRemnant: boolean, now: Date) {
      const held = await m.getRepository(RollReservationEntity).find({ where: { studioId, layId, rollId, status: 'held' } });
      const heldMm = held.reduce((a, r) => a + r.lengthMm, 0);
      const roll = await m.getRepository(RollEntity).findOneByOrFail({ studioId, id: rollId });
      const res = await m.createQueryBuilder().update(RollEntity)
        .set({ remainingMm: leftMm, isRemnant, reservedMm: () => '"reservedMm" - :held' })
        .where('"studioId" = :studioId AND "id" = :id AND "remainingMm" >= :left', { studioId, id: rollId, held: heldMm, left: leftMm })
        .execute();
      if (!res.affected) return false;
      let taken = roll.remainingMm - leftMm;
      for (const r of held) {
        const share = r === held[held.length - 1] ? taken : Math.min(taken, r.lengthMm);
        taken -= share;
        await m.getRepository(RollReservationEntity).update({ studioId, id: r.id }, { status: 'consumed', consumedMm: share, settledAt: now });
      }
      return true;
    },

    /**
     * A cut lay's measured remnant was corrected by `deltaMm` (new − old): the roll's on-hand length moves by
     * it in one conditional UPDATE that only matches while the result stays within 0 and the roll's length,
     * and the lay's consumed hold on the roll takes the opposite change. False when the roll cannot move so.
     */
    async correctRemnant(m: EntityManager, studioId: number, layId: number, rollId: number, deltaMm: number) {
      const res = await m.createQueryBuilder().update(RollEntity)
        .set({ remainingMm: () => '"remainingMm" + :delta' })
        .where('"studioId" = :studioId AND "id" = :id AND "remainingMm" + :delta >= 0 AND "remainingMm" + :delta <= "lengthMm"', { studioId, id: rollId, delta: deltaMm })
        .execute();
      if (!res.affected) return false;
      const consumed = await m.getRepository(RollReservationEntity).find({ where: { studioId, layId, rollId, status: 'consumed' }, order: { id: 'DESC' }, take: 1 });
      if (consumed[0]) await m.getRepository(RollReservationEntity).update({ studioId, id: consumed[0].id }, { consumedMm: Math.max(0, (consumed[0].consumedMm ?? 0) - deltaMm) });
      return true;
    },
  };
}
