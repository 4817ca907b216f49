import { can, type Role } from '../../../shared/auth/permissions';
import type { FabricDto, RollDto } from '../../../shared/schemas/cutting';
import type { FabricEntity, RollEntity } from '../../entities';

/** Fabric → DTO. The price goes only to roles that may read costs (never to the cutter). */
export function presentFabric(f: FabricEntity, role: Role, rolls: RollEntity[] = []): FabricDto {
  const own = rolls.filter((r) => r.fabricId === f.id);
  return {
    id: f.id,
    name: f.name,
    composition: f.composition,
    widthMm: f.widthMm,
    shrinkagePercent: f.shrinkagePercent,
    shrinkageLengthPercent: f.shrinkageLengthPercent,
    shrinkageWidthPercent: f.shrinkageWidthPercent,
    isDirectional: f.isDirectional,
    maxPlies: f.maxPlies,
    supplierId: f.supplierId,
    ...(can(role, 'costs:read') ? { pricePerMetreMinor: f.pricePerMetreMinor, price: { amountMinor: f.priceMinor, per: f.priceUnit } } : {}),
    rollCount: own.length,
    totalRemainingMm: own.reduce((a, r) => a + r.remainingMm, 0),
  };
}

export const presentRoll = (r: RollEntity): RollDto => ({
  id: r.id,
  fabricId: r.fabricId,
  label: r.label,
  lengthMm: r.lengthMm,
  widthMm: r.widthMm,
  shadeLot: r.shadeLot,
  receivedDate: r.receivedDate,
  remainingMm: r.remainingMm,
  reservedMm: r.reservedMm,
  isRemnant: r.isRemnant,
  ticketLengthMm: r.ticketLengthMm,
});
