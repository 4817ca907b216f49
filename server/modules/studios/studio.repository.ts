import type { DataSource } from 'typeorm';
import { updateIfChanged } from '../../db/update-if-changed';
import { StudioEntity, UserEntity } from '../../entities';
import type { AuditRepository } from '../audit/audit.repository';

export type StudioRepository = ReturnType<typeof createStudioRepository>;

/** The studio row of each tenant, and the opening of a new one. */
export function createStudioRepository(ds: DataSource, audit: AuditRepository) {
  const repo = ds.getRepository(StudioEntity);
  return {
    get: (id: number) => repo.findOneByOrFail({ id }),
    update: async (id: number, patch: Partial<StudioEntity>) => {
      await updateIfChanged(repo, { id }, patch);
    },
    /** A new studio and its owner in one transaction, with the audit entry of the opening: all or nothing. */
    open(studio: Pick<StudioEntity, 'name' | 'currency' | 'unitSystem' | 'language' | 'timeZone' | 'workingDayHours'>, owner: Pick<UserEntity, 'name' | 'email' | 'passwordHash'>) {
      return ds.transaction(async (m) => {
        const saved = await m.getRepository(StudioEntity).save(studio);
        const user = await m.getRepository(UserEntity).save({ ...owner, studioId: saved.id, role: 'owner' as const, active: true });
        await audit.record({ id: user.id, studioId: saved.id, name: user.name }, 'create', 'studio', saved.id, undefined, { name: saved.name }, m);
        return user;
      });
    },
  };
}
