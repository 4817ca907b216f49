import { subDays, format } from 'date-fns';
import { demoSizeChart, draftStyle, gradeStyle, measurementsForSize, type BlockSpec, type BodyMeasurements, type DraftedPiece, type EaseSpec, type GradeRule, type PointOfMeasure } from '@grading';
import { mm } from '@shared/units/units';
import { presetComposition } from '../../shared/schemas/style-composition';
import { CostingSettingsEntity, FabricEntity, RollEntity, StyleEntity, SupplierEntity, TrimEntity } from '../entities';
import { createGradingSetRepository } from '../modules/grading/grading-set.repository';
import { DEMO_COSTING_SETTINGS } from './costing.seed';
import { DEMO_FABRIC } from './cutting.seed';
import type { SeedContext } from './seed-context';

/** The second demo style: our own lined, fitted dress (the "Lined fitted dress" preset). */
export const LINED_DRESS_STYLE = {
  code: 'SR-202',
  name: 'Jacaranda lined fitted dress',
  description:
    'Lined, fitted dress: bodice with waist darts, 7 in V-neck and centre-back zip, long sleeves with shoulder pads, a gathered circle peplum in contrast organza, straight skirt, neck facings.',
  sizeRun: ['XS', 'S', 'M', 'L', 'XL'],
  baseSize: 'M',
};

/** Its contrast, lining and interfacing qualities: our own invented names, sorted after the demo shell fabric. */
export const LINED_DRESS_FABRICS = {
  contrast: { name: 'Tausi silk organza', composition: '100% silk', widthMm: 1400, shrinkagePercent: 1, shrinkageLengthPercent: 1, shrinkageWidthPercent: 1, isDirectional: false, pricePerMetreMinor: 120_000, priceMinor: 120_000, priceUnit: 'metre' as const, maxPlies: 20 },
  lining: { name: 'Usiku viscose lining', composition: '100% viscose', widthMm: 1400, shrinkagePercent: 2, shrinkageLengthPercent: 2, shrinkageWidthPercent: 2, isDirectional: false, pricePerMetreMinor: 32_000, priceMinor: 32_000, priceUnit: 'metre' as const, maxPlies: 40 },
  interfacing: { name: 'Vazi fusible interfacing', composition: 'polyester, fusible', widthMm: 900, shrinkagePercent: 0, shrinkageLengthPercent: 0, shrinkageWidthPercent: 0, isDirectional: false, pricePerMetreMinor: 18_000, priceMinor: 18_000, priceUnit: 'metre' as const, maxPlies: 40 },
} as const;

/** Trims per garment (KES minor units); quantities our own, from the style description. */
export const LINED_DRESS_TRIMS = [
  { name: 'Invisible zip 22 in (56 cm)', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 6000, inStock: 20 },
  { name: 'Shoulder pads, set-in, ½ in', unit: 'pair', quantityPerGarment: 1, unitPriceMinor: 9000, inStock: 10 },
  { name: 'Sewing thread, 5000 m cone', unit: 'cone', quantityPerGarment: 0.06, unitPriceMinor: 35000, inStock: 1 },
  { name: 'Care label', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 400, inStock: 0 },
  { name: 'Size label', unit: 'pcs', quantityPerGarment: 1, unitPriceMinor: 250, inStock: 0 },
];

/** Ease of the fitted blocks' defaults (CWU costume text ch. 16, as the fitted bodice and straight skirt use). */
const EASES: Partial<Record<PointOfMeasure, EaseSpec>> = {
  bust: { easeMm: mm(50.8), toleranceMm: mm(10) },
  waist: { easeMm: mm(25.4), toleranceMm: mm(10) },
  hip: { easeMm: mm(50.8), toleranceMm: mm(10) },
};

let cached: { pieces: DraftedPiece[]; rules: Record<string, GradeRule[]> } | null = null;

/** The lined dress's pieces at the base size and their proposed rules; computed once per process. */
export function linedDressGrading(): { pieces: DraftedPiece[]; rules: Record<string, GradeRule[]> } {
  if (cached) return cached;
  const chart = demoSizeChart();
  const c = presetComposition('lined-fitted-dress');
  const pieces = draftStyle(measurementsForSize(chart, LINED_DRESS_STYLE.baseSize) as BodyMeasurements, { preset: c.preset, blocks: c.blocks as BlockSpec[] });
  cached = { pieces, rules: gradeStyle(pieces, chart, LINED_DRESS_STYLE.baseSize, (m) => draftStyle(m, { preset: c.preset, blocks: c.blocks as BlockSpec[] })).rules };
  return cached;
}

/**
 * The second demo style with its composition, the demo size chart, graded pieces, a fabric for each material
 * (self is the shirt dress's poplin), two rolls of each new fabric, its trims and costing settings. Runs after the
 * costing seed (it uses the trims supplier and leaves the shirt dress's figures as they were).
 */
export async function seedLinedDress(ctx: SeedContext): Promise<void> {
  const { ds, studioId } = ctx;
  const fabrics = ds.getRepository(FabricEntity);
  const self = await fabrics.findOneBy({ studioId, name: DEMO_FABRIC.name });
  const suppliers = await ds.getRepository(SupplierEntity).find({ where: { studioId }, order: { id: 'ASC' } });
  const mill = suppliers[0]?.id ?? null, notions = suppliers[1]?.id ?? mill;
  const links: Record<string, number> = self ? { self: self.id } : {};
  const received = format(subDays(ctx.today, 4), 'yyyy-MM-dd');
  for (const [material, f] of Object.entries(LINED_DRESS_FABRICS)) {
    const saved = await fabrics.save(fabrics.create({ ...f, studioId, supplierId: mill }));
    links[material] = saved.id;
    await ds.getRepository(RollEntity).save([1, 2].map((k) => ({
      studioId, fabricId: saved.id, label: `${f.name.slice(0, 3).toUpperCase()}-020${k}`, lengthMm: 25_000, widthMm: f.widthMm + 20,
      shadeLot: 'Lot A', receivedDate: received, remainingMm: 25_000, isRemnant: false,
    })));
  }
  const style = await ds.getRepository(StyleEntity).save({
    studioId, ...LINED_DRESS_STYLE, status: 'sampling', composition: presetComposition('lined-fitted-dress'), materialFabrics: links,
  });
  const { pieces, rules } = linedDressGrading();
  await createGradingSetRepository(ds).save(studioId, style.id, { sizeChart: demoSizeChart(), pieces, gradeRules: rules, eases: EASES });
  const trims = ds.getRepository(TrimEntity);
  await trims.save(LINED_DRESS_TRIMS.map((t) => trims.create({ ...t, studioId, styleId: style.id, supplierId: notions })));
  await ds.getRepository(CostingSettingsEntity).save({ ...DEMO_COSTING_SETTINGS, studioId, styleId: style.id });
}
