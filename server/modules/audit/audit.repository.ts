import type { DataSource, EntityManager } from 'typeorm';
import { createStatements } from '../../db/statements';
import { AuditEntryEntity } from '../../entities';
import type { Actor } from '../../auth/require';

export type AuditRepository = ReturnType<typeof createAuditRepository>;

const summarise = (v: unknown) => (v === undefined ? '' : JSON.stringify(v).slice(0, 4000));

export function createAuditRepository(ds: DataSource) {
  const sql = createStatements(ds);
  return {
    /** Record who did what; pass the transaction's manager so the entry commits with the change. */
    async record(
      actor: Pick<Actor, 'id' | 'studioId' | 'name'>,
      action: string,
      entity: string,
      entityId: number | null,
      before?: unknown,
      after?: unknown,
      manager: EntityManager = ds.manager,
    ) {
      const entry = {
        studioId: actor.studioId,
        userId: actor.id,
        userName: actor.name,
        action,
        entity,
        entityId,
        before: summarise(before),
        after: summarise(after),
      };
      // Outside a transaction (every floor log) one constant prepared INSERT; inside one, the transaction's manager.
      if (manager === ds.manager) await sql.insert(AuditEntryEntity, entry);
      else await manager.getRepository(AuditEntryEntity).insert(entry);
    },
    list(studioId: number, limit = 200) {
      return ds.getRepository(AuditEntryEntity).find({
        where: { studioId },
        order: { id: 'DESC' },
        take: limit,
      });
    },
  };
}
