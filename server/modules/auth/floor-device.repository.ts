import type { DataSource } from 'typeorm';
import { FloorDeviceEntity } from '../../entities';

export type FloorDeviceRepository = ReturnType<typeof createFloorDeviceRepository>;

/** Studio tablets bound to the floor, found by the hash of the token the device holds. */
export function createFloorDeviceRepository(ds: DataSource) {
  const devices = ds.getRepository(FloorDeviceEntity);
  return {
    insert: (d: Omit<FloorDeviceEntity, 'id' | 'createdAt'>) => devices.save(devices.create(d)),
    byTokenHash: (tokenHash: string) => devices.findOneBy({ tokenHash }),
    remove: (studioId: number, id: number) => devices.delete({ studioId, id }),
  };
}
