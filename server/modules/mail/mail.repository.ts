import type { DataSource } from 'typeorm';
import { MailMessageEntity, StudioEntity, UserEntity } from '../../entities';

export type MailRepository = ReturnType<typeof createMailRepository>;

/** Outbox queries, scoped by studio. */
export function createMailRepository(ds: DataSource) {
  const repo = ds.getRepository(MailMessageEntity);
  return {
    insert: (m: Partial<MailMessageEntity>) => repo.save(repo.create(m)),
    list: (studioId: number) => repo.find({ where: { studioId }, order: { id: 'DESC' }, take: 200 }),
    get: (studioId: number, id: number) => repo.findOneBy({ studioId, id }),
    byMessageId: (messageId: string) => repo.findOne({ where: { messageId }, order: { id: 'DESC' } }),
    user: (studioId: number, id: number) => ds.getRepository(UserEntity).findOneBy({ studioId, id }),
    studio: (id: number) => ds.getRepository(StudioEntity).findOneByOrFail({ id }),
  };
}
