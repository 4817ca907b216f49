import { insertWithStudioNumber } from '../../db/studio-number';
import { updateIfChanged } from '../../db/update-if-changed';
import type { DataSource } from 'typeorm';
import { BatchEntity } from '../../entities';

export type BatchRepository = ReturnType<typeof createBatchRepository>;

/** Batch queries, always scoped to one studio; the style comes along for names. */
export function createBatchRepository(ds: DataSource) {
  const repo = ds.getRepository(BatchEntity);
  return {
    list: (studioId: number) =>
      repo.find({ where: { studioId }, relations: { style: true }, order: { dueDate: 'ASC', id: 'ASC' } }),
    get: (studioId: number, id: number) =>
      repo.findOne({ where: { studioId, id }, relations: { style: true } }),
    /** A new batch takes the studio's next number (B-0001 for its first). */
    async insert(b: Omit<Partial<BatchEntity>, 'id' | 'number'> & { studioId: number }) {
      const id = await insertWithStudioNumber(ds, BatchEntity, b);
      return repo.findOneOrFail({ where: { studioId: b.studioId, id }, relations: { style: true } });
    },
    async update(studioId: number, id: number, patch: Partial<BatchEntity>) {
      await updateIfChanged(repo, { studioId, id }, patch);
      return repo.findOneOrFail({ where: { studioId, id }, relations: { style: true } });
    },
  };
}
