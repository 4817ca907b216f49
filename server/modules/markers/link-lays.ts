import type { DataSource } from 'typeorm';
import { LayEntity, MarkerEntity } from '../../entities';

const same = (a: Record<string, number>, b: Record<string, number>) => {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  return [...keys].every((k) => (a[k] ?? 0) === (b[k] ?? 0));
};

/** A finished marker of a batch becomes the drawn marker of that batch's planned lays with the same ratio. */
export async function linkMarkerToLays(ds: DataSource, studioId: number, markerId: number): Promise<void> {
  const marker = await ds.getRepository(MarkerEntity).findOneBy({ studioId, id: markerId });
  if (!marker?.batchId) return;
  const lays = await ds.getRepository(LayEntity).find({ where: { studioId, batchId: marker.batchId, status: 'planned' } });
  for (const l of lays) if (l.markerId === null && same(l.ratio, marker.ratio)) await ds.getRepository(LayEntity).update({ studioId, id: l.id }, { markerId });
}
