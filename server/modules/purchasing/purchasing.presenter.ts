import { poNumber, type PurchaseOrderDto, type SupplierDto } from '../../../shared/schemas/purchasing';
import { minor, mm } from '../../../shared/units';
import type { PurchaseOrderLine as PoLineDoc } from '../../../exports/types';
import { purchaseOrderLineTotalMinor } from '../../../exports/xlsx/purchase-order.xlsx';
import type { PurchaseOrderEntity, SupplierEntity } from '../../entities';
import type { PurchaseOrderLine } from '../../entities/purchase-order.entity';

export const presentSupplier = (s: SupplierEntity): SupplierDto => ({
  id: s.id,
  name: s.name,
  contact: s.contact,
  email: s.email,
  leadTimeDays: s.leadTimeDays,
});

/**
 * A stored line as the workbook builder wants it. Fabric lines are stored in mm at a price per metre; an
 * imperial studio's sheet shows yards, so its price is per yard (rounded to the minor unit).
 */
export function documentLine(l: PurchaseOrderLine, unitSystem: 'metric' | 'imperial'): PoLineDoc {
  if (l.kind === 'fabric') {
    const price = unitSystem === 'imperial' ? Math.round(l.unitPriceMinor * 0.9144) : l.unitPriceMinor;
    return { item: l.item, description: 'Fabric', quantity: { kind: 'length', lengthMm: mm(l.quantity) }, unitPriceMinor: minor(price) };
  }
  return { item: l.item, description: 'Trim', quantity: { kind: 'count', count: l.quantity, unit: l.unit }, unitPriceMinor: minor(l.unitPriceMinor) };
}

export function presentOrder(o: PurchaseOrderEntity, supplier: SupplierEntity | undefined, unitSystem: 'metric' | 'imperial'): PurchaseOrderDto {
  const lines = o.lines.map((l) => ({
    kind: l.kind,
    refId: l.refId,
    item: l.item,
    unit: l.unit,
    quantity: l.quantity,
    unitPriceMinor: l.unitPriceMinor,
    lineTotalMinor: purchaseOrderLineTotalMinor(documentLine(l, unitSystem), unitSystem),
    receivedQuantity: l.receivedQuantity ?? 0,
  }));
  return {
    id: o.id,
    number: poNumber(o),
    supplierId: o.supplierId,
    supplierName: supplier?.name ?? '',
    supplierEmail: supplier?.email ?? '',
    batchId: o.batchId,
    status: o.status,
    deliveryDate: o.deliveryDate,
    lines,
    totalMinor: lines.reduce((a, l) => a + l.lineTotalMinor, 0),
    revision: o.revision ?? 0,
    createdAt: new Date(o.createdAt).toISOString(),
    updatedAt: new Date(o.updatedAt).toISOString(),
  };
}
