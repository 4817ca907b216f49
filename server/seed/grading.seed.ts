import { demoSizeChart, draftShirtDress, gradeStyle, measurementsForSize, SHIRT_DRESS_STYLE, type BodyMeasurements, type EaseSpec, type GradeRule, type Piece, type PointOfMeasure } from '@grading';
import { mm } from '@shared/units/units';
import { createGradingSetRepository } from '../modules/grading/grading-set.repository';
import type { SeedContext } from './seed-context';

/**
 * Garment ease and tolerance per point of measure for the demo shirt dress (mm). Ease from the style's drafting
 * constants; tolerances are common practice for a woven dress (±10 mm on girths, ±5 mm on widths and lengths).
 */
export const DEMO_EASES: Partial<Record<PointOfMeasure, EaseSpec>> = {
  bust: { easeMm: mm(SHIRT_DRESS_STYLE.bustEaseMm), toleranceMm: mm(10) },
  waist: { easeMm: mm(SHIRT_DRESS_STYLE.waistEaseMm), toleranceMm: mm(10) },
  hip: { easeMm: mm(SHIRT_DRESS_STYLE.hipEaseMm), toleranceMm: mm(10) },
  'shoulder-width': { easeMm: mm(10), toleranceMm: mm(5) },
  'across-back': { easeMm: mm(15), toleranceMm: mm(5) },
  'waist-to-knee': { easeMm: mm(0), toleranceMm: mm(5) },
};

let cached: { pieces: Piece[]; rules: Record<string, GradeRule[]> } | null = null;

/** The demo pieces (drafted at the base size) and their trued grade rules; computed once per process. */
export function demoGrading(baseSize = 'M'): { pieces: Piece[]; rules: Record<string, GradeRule[]> } {
  if (cached) return cached;
  const chart = demoSizeChart();
  const pieces = draftShirtDress(measurementsForSize(chart, baseSize) as BodyMeasurements);
  cached = { pieces, rules: gradeStyle(pieces, chart, baseSize, (m) => draftShirtDress(m)).rules };
  return cached;
}

/** Demo data of the grading area for Tamarind Row Studio: the demo style's chart, pieces, rules and eases. */
export async function seedGrading(ctx: SeedContext): Promise<void> {
  const { pieces, rules } = demoGrading('M');
  await createGradingSetRepository(ctx.ds).save(ctx.studioId, ctx.styleId, {
    sizeChart: demoSizeChart(),
    pieces,
    gradeRules: rules,
    eases: DEMO_EASES,
  });
}
