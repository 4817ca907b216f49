import { mm, type Millimetres } from '@shared/units/units';

/**
 * Points of measure on the body (all girths and lengths in mm). Girths are full circumferences;
 * lengths are measured as named (front waist length: high shoulder point over the bust to the waist).
 */
export const POINTS_OF_MEASURE = [
  'bust', 'under-bust', 'upper-chest', 'waist', 'waist-straight', 'high-hip', 'hip',
  'neck-base', 'mid-neck', 'head', 'shoulder-girth',
  'back-waist-length', 'front-waist-length', 'armhole-depth', 'shoulder-width', 'across-back', 'across-front',
  'bust-point-height', 'bust-point-span', 'arm-length', 'upper-arm', 'wrist',
  'waist-to-hip', 'waist-to-knee', 'waist-to-floor',
] as const;

/** One point of measure (a key of {@link POINTS_OF_MEASURE}). */
export type PointOfMeasure = (typeof POINTS_OF_MEASURE)[number];

/** A size chart: ordered sizes and, per point of measure, one body value per size (same order), in mm. */
export interface SizeChart {
  name: string;
  sizes: string[];
  values: Partial<Record<PointOfMeasure, Millimetres[]>>;
}

/** Grades: for each point of measure, the change from size i to size i + 1 (length = sizes − 1), in mm. */
export type SizeGrades = Partial<Record<PointOfMeasure, Millimetres[]>>;

/** Whether a string is a known point of measure. */
export function isPointOfMeasure(key: string): key is PointOfMeasure {
  return (POINTS_OF_MEASURE as readonly string[]).includes(key);
}

/**
 * Grade between neighbouring sizes: grades[pom][i] = value[i + 1] − value[i] (mm). Grades are kept per step
 * because published tables do not use a fixed grade (ASTM D5585-11e1 bust grade runs 5/8 in to 2 in).
 * A chart with one size gives empty arrays.
 */
export function computeGrades(chart: SizeChart): SizeGrades {
  const out: SizeGrades = {};
  for (const [pom, vals] of Object.entries(chart.values) as [PointOfMeasure, Millimetres[]][]) {
    out[pom] = vals.slice(1).map((v, i) => mm(v - vals[i]));
  }
  return out;
}

/** Index of `size` in the chart; throws RangeError for an unknown size. */
export function sizeIndex(chart: { sizes: readonly string[] }, size: string): number {
  const i = chart.sizes.indexOf(size);
  if (i < 0) throw new RangeError(`unknown size "${size}" (chart has ${chart.sizes.join(', ')})`);
  return i;
}

/** The body measurements of one size as a record (mm); points of measure the chart lacks are absent. */
export function measurementsForSize(chart: SizeChart, size: string): Partial<Record<PointOfMeasure, Millimetres>> {
  const i = sizeIndex(chart, size);
  const out: Partial<Record<PointOfMeasure, Millimetres>> = {};
  for (const [pom, vals] of Object.entries(chart.values) as [PointOfMeasure, Millimetres[]][]) out[pom] = vals[i];
  return out;
}
