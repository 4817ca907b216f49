import { updateIfChanged } from '../../db/update-if-changed';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { FabricEntity, RollEntity, SupplierEntity } from '../../entities';

export type FabricRepository = ReturnType<typeof createFabricRepository>;

/** Fabric and roll queries, always scoped to one studio. */
export function createFabricRepository(ds: DataSource) {
  const fabrics = ds.getRepository(FabricEntity);
  const rolls = ds.getRepository(RollEntity);
  return {
    list: (studioId: number) => fabrics.find({ where: { studioId }, order: { name: 'ASC' } }),
    get: (studioId: number, id: number) => fabrics.findOne({ where: { studioId, id } }),
    insert: (f: Partial<FabricEntity>) => fabrics.save(fabrics.create(f)),
    async update(studioId: number, id: number, patch: Partial<FabricEntity>) {
      await updateIfChanged(fabrics, { studioId, id }, patch);
      return fabrics.findOneOrFail({ where: { studioId, id } });
    },
    async remove(studioId: number, id: number) {
      await fabrics.delete({ studioId, id });
    },
    /** Whether the supplier is one of this studio's: another studio's supplier is never linked. */
    hasSupplier: async (studioId: number, supplierId: number) => (await ds.getRepository(SupplierEntity).countBy({ studioId, id: supplierId })) > 0,
    rolls: (studioId: number, fabricId: number) => rolls.find({ where: { studioId, fabricId }, order: { shadeLot: 'ASC', label: 'ASC' } }),
    allRolls: (studioId: number) => rolls.find({ where: { studioId } }),
    rollsById: (studioId: number, ids: number[]) => rolls.find({ where: { studioId, id: In(ids) } }),
    /** Labels already in stock; asked in slices so a long list stays under the drivers' bound-variable limits. */
    async labelsTaken(studioId: number, labels: string[]) {
      const taken: string[] = [];
      for (let i = 0; i < labels.length; i += 500) {
        const found = await rolls.find({ where: { studioId, label: In(labels.slice(i, i + 500)) }, select: { label: true } });
        taken.push(...found.map((r) => r.label));
      }
      return taken;
    },
    /** Insert rolls in one transaction: all or none, in chunks of 100 rows per INSERT (bound-variable limits). */
    insertRolls: (list: Partial<RollEntity>[]) =>
      ds.transaction((m) => m.getRepository(RollEntity).save(list.map((r) => m.getRepository(RollEntity).create(r)), { chunk: 100 })),
    async updateRoll(studioId: number, id: number, patch: Partial<RollEntity>, m: EntityManager = ds.manager) {
      await updateIfChanged(m.getRepository(RollEntity), { studioId, id }, patch);
    },
  };
}
