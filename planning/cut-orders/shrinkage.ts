import type { Point } from '@shared/geometry/types';

/**
 * A fabric's expected shrinkage in washing or pressing, percent of the unwashed dimension, per direction:
 * lengthwise (warp, along the grain) and widthwise (weft, across it).
 */
export interface Shrinkage {
  lengthwisePercent: number;
  widthwisePercent: number;
}

/** No shrinkage: pieces are cut as drafted. */
export const NO_SHRINKAGE: Shrinkage = { lengthwisePercent: 0, widthwisePercent: 0 };

/**
 * How much longer a dimension is cut so that it measures as drafted after shrinking: 1 ÷ (1 − s).
 *
 * Convention: shrinkage s = (L₀ − L₁) ÷ L₀, a share of the original (unwashed) length L₀, as the
 * dimensional-change test methods express it (AATCC 135, ISO 5077 / ISO 6330, from memory); the
 * compensated pattern dimension is then L ÷ (1 − s) (foralltex.com shrinkage guide and apparel.wiki,
 * quoted in ../shared/reference/production-and-costing.md §4). The shortcut L × (1 + s) some
 * yardage sheets use is smaller and leaves the garment short. Throws RangeError unless 0 ≤ percent < 100.
 */
export function shrinkageFactor(percent: number): number {
  if (!(percent >= 0 && percent < 100)) throw new RangeError(`shrinkage must be at least 0 % and below 100 %, got ${percent}`);
  return 1 / (1 - percent / 100);
}

/**
 * A cutting outline grown for shrinkage, in the marker's frame (grain along x): x scaled by the
 * lengthwise factor, y by the widthwise one, about the piece origin. Winding and vertex order are kept;
 * an empty outline stays empty.
 */
export function compensateForShrinkage(outline: Point[], shrinkage: Shrinkage): Point[] {
  const fx = shrinkageFactor(shrinkage.lengthwisePercent);
  const fy = shrinkageFactor(shrinkage.widthwisePercent);
  return outline.map((p) => ({ x: p.x * fx, y: p.y * fy }));
}

/**
 * Factor on a piece area (and so on an area-based consumption estimate) when both directions are
 * compensated: 1 ÷ ((1 − s_length)(1 − s_width)).
 */
export function shrinkageAreaFactor(shrinkage: Shrinkage): number {
  return shrinkageFactor(shrinkage.lengthwisePercent) * shrinkageFactor(shrinkage.widthwisePercent);
}
