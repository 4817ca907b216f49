import { CostingSettingsEntity, FabricEntity, SupplierEntity, TrimEntity } from '../entities';
import type { SeedContext } from './seed-context';

/** Our own invented suppliers; the .example addresses reach nobody (RFC 2606). */
export const DEMO_SUPPLIERS = [
  { key: 'mill', name: 'Mvuli Weaving Co.', contact: 'Order desk', email: 'orders@mvuli-weaving.example', leadTimeDays: 10 },
  { key: 'trims', name: 'Baobab Notions Supply', contact: 'Sales counter', email: 'sales@baobab-notions.example', leadTimeDays: 4 },
] as const;

/**
 * Bill of materials of the Sable shirt dress, per garment. Prices are KES minor units (cents). The self
 * belt is cut from the shell fabric and needs no trims. Quantities are our own, from the style description.
 */
export const DEMO_BOM = [
  { name: 'Shirt buttons 11 mm, 4-hole', unit: 'pcs', quantityPerGarment: 10, unitPriceMinor: 500, inStock: 150 },
  { name: 'Fusible interfacing (collar, band, front facings)', unit: 'm', quantityPerGarment: 0.35, unitPriceMinor: 18000, inStock: 0 },
  { name: 'Sewing thread, 5000 m cone', unit: 'cone', quantityPerGarment: 0.05, unitPriceMinor: 35000, inStock: 1 },
  { name: 'Care label', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 400, inStock: 0 },
  { name: 'Size label', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 250, inStock: 0 },
  { name: 'Hang tag with string', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 1500, inStock: 0 },
  { name: 'Poly bag', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 800, inStock: 0 },
];

/**
 * Labour cost per minute, KES: a wage of KES 30 000 a month over 26 days × 8 h × 60 = 12 480 minutes is
 * 2.40 a minute at 100 %; at a 60 % line efficiency that is 4.00 a standard minute (method of
 * onlineclothingstudy.com, "Garment CM cost estimation using SAM", reference §5.1; the wage is our own).
 */
export const DEMO_COSTING_SETTINGS = {
  labourCostPerMinuteMinor: 400,
  overheadPercent: 15,
  wastagePercent: 3,
  marginPercent: 30,
  retailMultiplier: 2,
};

/** Demo data of the costing area for Tamarind Row Studio: suppliers, the style's BOM, costing settings. */
export async function seedCosting(ctx: SeedContext): Promise<void> {
  const { ds, studioId, styleId } = ctx;
  const suppliers = ds.getRepository(SupplierEntity);
  const saved: Record<string, number> = {};
  for (const { key, ...s } of DEMO_SUPPLIERS) saved[key] = (await suppliers.save(suppliers.create({ ...s, studioId }))).id;

  const fabrics = ds.getRepository(FabricEntity);
  const existing = await fabrics.find({ where: { studioId } });
  if (existing.length === 0) {
    // The cutting seed normally records the shell fabric; a studio without one still gets something to cost.
    await fabrics.save(fabrics.create({ studioId, name: 'Cotton poplin, indigo', composition: '100 % cotton', widthMm: 1500, shrinkagePercent: 2, shrinkageLengthPercent: 2, shrinkageWidthPercent: 2, pricePerMetreMinor: 65000, priceMinor: 65000, priceUnit: 'metre', supplierId: saved.mill, maxPlies: 40 }));
  } else {
    // Fabrics without a supplier or price are bought from the mill at its list price.
    for (const f of existing) {
      const patch: Partial<FabricEntity> = {};
      if (f.supplierId === null) patch.supplierId = saved.mill;
      if (!f.pricePerMetreMinor) Object.assign(patch, { pricePerMetreMinor: 65000, priceMinor: 65000, priceUnit: 'metre' });
      if (Object.keys(patch).length) await fabrics.update({ id: f.id }, patch);
    }
  }
  const trims = ds.getRepository(TrimEntity);
  await trims.save(DEMO_BOM.map((t) => trims.create({ ...t, studioId, styleId, supplierId: saved.trims })));
  await ds.getRepository(CostingSettingsEntity).save({ ...DEMO_COSTING_SETTINGS, studioId, styleId });
}
