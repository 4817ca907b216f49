import { In, type DataSource } from 'typeorm';
import { BatchEntity, BundleEntity, LayEntity, RollEntity, StyleEntity, UserEntity } from '../../entities';

const LIMIT = 5;

/** Escapes LIKE wildcards so a typed `%` or `_` is looked for as itself. */
const likeText = (text: string) => `%${text.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** Each search kind's lookup, scoped to one studio; LOWER(..) LIKE so SQLite and PostgreSQL match alike. */
export function createSearchRepository(ds: DataSource) {
  return {
    bundlesByNumber: (studioId: number, number: number, batchId?: number) =>
      ds.getRepository(BundleEntity).find({ where: { studioId, number, ...(batchId ? { batchId } : {}) }, order: { batchId: 'DESC' }, take: LIMIT }),
    /** The batch a typed code (B-0003) means: its number in this studio, never its id. */
    batchByNumber: (studioId: number, number: number) => ds.getRepository(BatchEntity).findOne({ where: { studioId, number }, relations: { style: true } }),
    batchesByIds: (studioId: number, ids: number[]) => (ids.length ? ds.getRepository(BatchEntity).find({ where: { studioId, id: In(ids) } }) : Promise.resolve([])),
    stylesByText: (studioId: number, text: string) =>
      ds.getRepository(StyleEntity).createQueryBuilder('s')
        .where('s.studioId = :studioId', { studioId })
        .andWhere("(LOWER(s.code) LIKE :q ESCAPE '\\' OR LOWER(s.name) LIKE :q ESCAPE '\\')", { q: likeText(text) })
        .orderBy('s.code').take(LIMIT).getMany(),
    rollsByLabel: (studioId: number, text: string) =>
      ds.getRepository(RollEntity).createQueryBuilder('r')
        .leftJoinAndSelect('r.fabric', 'f')
        .where('r.studioId = :studioId', { studioId })
        .andWhere("LOWER(r.label) LIKE :q ESCAPE '\\'", { q: likeText(text) })
        .orderBy('r.label').take(LIMIT).getMany(),
    peopleByText: (studioId: number, text: string) =>
      ds.getRepository(UserEntity).createQueryBuilder('u')
        .where('u.studioId = :studioId', { studioId })
        .andWhere("(LOWER(u.name) LIKE :q ESCAPE '\\' OR LOWER(u.email) LIKE :q ESCAPE '\\')", { q: likeText(text) })
        .orderBy('u.name').take(LIMIT).getMany(),
    firstLayOf: (studioId: number, batchId: number) =>
      ds.getRepository(LayEntity).findOne({ where: { studioId, batchId }, order: { seq: 'ASC' } }),
  };
}
export type SearchRepository = ReturnType<typeof createSearchRepository>;
