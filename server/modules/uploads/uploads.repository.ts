import type { DataSource } from 'typeorm';
import { UploadEntity, StyleEntity } from '../../entities';

export type UploadsRepository = ReturnType<typeof createUploadsRepository>;

/** Upload metadata, scoped by studio; the bytes live on disk under data/uploads. */
export function createUploadsRepository(ds: DataSource) {
  const repo = ds.getRepository(UploadEntity);
  return {
    insert: (u: Partial<UploadEntity>) => repo.save(repo.create(u)),
    list: (studioId: number, filter: { kind?: UploadEntity['kind']; styleId?: number }) =>
      repo.find({ where: { studioId, ...filter }, order: { id: 'DESC' } }),
    get: (studioId: number, id: number) => repo.findOneBy({ studioId, id }),
    remove: (studioId: number, id: number) => repo.delete({ studioId, id }),
    styleExists: async (studioId: number, styleId: number) =>
      ds.getRepository(StyleEntity).exists({ where: { studioId, id: styleId } }),
  };
}
