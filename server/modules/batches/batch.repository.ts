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
    insert: (b: Partial<BatchEntity>) => repo.save(repo.create(b)),
    async update(studioId: number, id: number, patch: Partial<BatchEntity>) {
      await updateIfChanged(repo, { studioId, id }, patch);
      return repo.findOneOrFail({ where: { studioId, id }, relations: { style: true } });
    },
  };
}
