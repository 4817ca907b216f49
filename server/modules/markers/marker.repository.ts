import { In, type DataSource } from 'typeorm';
import { MarkerEntity } from '../../entities';
import type { MarkerStatus } from '../../entities/marker.entity';
import type { QueryDeepPartialEntity } from 'typeorm';

export type MarkerRepository = ReturnType<typeof createMarkerRepository>;

/** Marker queries, scoped by studio (except the queue's resume query, which runs at start-up). */
export function createMarkerRepository(ds: DataSource) {
  const repo = ds.getRepository(MarkerEntity);
  return {
    get: (studioId: number, id: number) => repo.findOne({ where: { studioId, id } }),
    list: (studioId: number, where: { styleId?: number; batchId?: number } = {}) =>
      repo.find({ where: { studioId, ...where }, order: { id: 'DESC' }, take: 100 }),
    /** A live or finished marker with the same inputs (failed and cancelled runs are not reused). */
    byHash: (studioId: number, inputHash: string) =>
      repo.findOne({ where: { studioId, inputHash, status: In(['queued', 'running', 'done']) }, order: { id: 'DESC' } }),
    doneForStyle: (studioId: number, styleId: number, widthMm: number) =>
      repo.find({ where: { studioId, styleId, widthMm, status: 'done' }, order: { id: 'DESC' } }),
    insert: (m: Partial<MarkerEntity>) => repo.save(repo.create(m)),
    async update(studioId: number, id: number, patch: Partial<MarkerEntity>) {
      await repo.update({ studioId, id }, patch as QueryDeepPartialEntity<MarkerEntity>);
    },
    /** Jobs a stopped server left behind: queued or running, oldest first. */
    unfinished: () => repo.find({ where: { status: In<MarkerStatus>(['queued', 'running']) }, order: { id: 'ASC' } }),
  };
}
