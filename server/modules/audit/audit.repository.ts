import { In, type DataSource, type EntityManager, type EntityTarget } from 'typeorm';
import { createStatements } from '../../db/statements';
import { AuditEntryEntity, BatchEntity, PayPeriodEntity, PurchaseOrderEntity } from '../../entities';
import type { Actor } from '../../auth/require';

export type AuditRepository = ReturnType<typeof createAuditRepository>;

const summarise = (v: unknown) => (v === undefined ? '' : JSON.stringify(v).slice(0, 4000));

/** The entries whose record people know by its studio number rather than by name. */
const NUMBERED: [string, EntityTarget<{ id: number; studioId: number; number: number }>][] = [
  ['batch', BatchEntity],
  ['purchase_order', PurchaseOrderEntity],
  ['pay_period', PayPeriodEntity],
];

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
    /** The studio numbers of the batches, orders and pay periods these entries name, keyed `entity:id`. */
    async numbersOf(studioId: number, entries: Pick<AuditEntryEntity, 'entity' | 'entityId'>[]) {
      const out = new Map<string, number>();
      for (const [entity, target] of NUMBERED) {
        const ids = [...new Set(entries.filter((e) => e.entity === entity && e.entityId).map((e) => e.entityId!))];
        if (!ids.length) continue;
        const rows = await ds.getRepository(target).find({ where: { studioId, id: In(ids) }, select: { id: true, number: true } });
        for (const r of rows) out.set(`${entity}:${r.id}`, r.number);
      }
      return out;
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
