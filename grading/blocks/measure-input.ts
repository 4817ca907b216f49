import type { Millimetres } from '@shared/units/units';
import type { PointOfMeasure } from '../size-charts/size-chart';

/** One size's body measurements in mm, keyed by point of measure. */
export type BodyMeasurements = Partial<Record<PointOfMeasure, Millimetres | number>>;

/** The measurement or a RangeError naming what the block needs. */
export function need(m: BodyMeasurements, key: PointOfMeasure): number {
  const v = m[key];
  if (v === undefined || !Number.isFinite(v) || v <= 0) throw new RangeError(`measurements.${key}: the block needs this measurement (a positive number of mm)`);
  return v;
}

/** Default seam allowances (mm): 10 mm seams, 30 mm hems. Common practice (sewcalcs.pages.dev "1–1.5 cm for
 * seams, 2–4 cm for hems", web article). */
export const DEFAULT_SEAM_MM = 10;
export const DEFAULT_HEM_MM = 30;
