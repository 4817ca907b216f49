import { updateIfChanged } from '../../db/update-if-changed';
import type { DataSource } from 'typeorm';
import { FabricEntity, StyleEntity } from '../../entities';

export type StyleRepository = ReturnType<typeof createStyleRepository>;

/** Style queries, always scoped to one studio. */
export function createStyleRepository(ds: DataSource) {
  const repo = ds.getRepository(StyleEntity);
  return {
    /** Ids of the studio's fabrics (a style's materials link only to these). */
    fabricIds: async (studioId: number) => new Set((await ds.getRepository(FabricEntity).find({ where: { studioId }, select: { id: true } })).map((f) => f.id)),
    list: (studioId: number) => repo.find({ where: { studioId }, order: { code: 'ASC' } }),
    get: (studioId: number, id: number) => repo.findOne({ where: { studioId, id } }),
    byCode: (studioId: number, code: string) => repo.findOne({ where: { studioId, code } }),
    insert: (s: Partial<StyleEntity>) => repo.save(repo.create(s)),
    async update(studioId: number, id: number, patch: Partial<StyleEntity>) {
      await updateIfChanged(repo, { studioId, id }, patch);
      return repo.findOneOrFail({ where: { studioId, id } });
    },
  };
}
