import { cubicBezierFlatten } from '@shared/geometry/bezier';
import type { Point } from '@shared/geometry/types';

/** A flared hem leaves the side seam square for this long before it curves to the centre (1 in; common practice). */
export const HEM_SQUARE_RUN_MM = 25.4;

/**
 * A flared hem squared to the side seam. `centreHem` is the hem at the centre line (the hem leaves it square to
 * the centre, horizontally), `hip` the side seam's hip point and `flareTo` a point the straight side seam passes
 * through at hem level. The side seam below the hip is made as long as the centre line below the hip level (so the
 * hem hangs level once the flare falls), the last inch of hem is square to it, and a cubic joins that to the
 * centre. Returns the hem polyline from centre to side (both included); its last point is the side hem point.
 * Coordinates in mm, y up, side at larger x than the centre.
 */
export function squaredHemPath(centreHem: Point, hip: Point, flareTo: Point): Point[] {
  const d = { x: flareTo.x - hip.x, y: flareTo.y - hip.y };
  const l = Math.hypot(d.x, d.y);
  const drop = hip.y - centreHem.y;
  const sideHem = { x: hip.x + (d.x / l) * drop, y: hip.y + (d.y / l) * drop };
  // Direction of travel along the hem at the side: the side seam direction turned a right angle.
  const square = { x: -d.y / l, y: d.x / l };
  const bend = { x: sideHem.x - square.x * HEM_SQUARE_RUN_MM, y: sideHem.y - square.y * HEM_SQUARE_RUN_MM };
  const k = (bend.x - centreHem.x) / 3;
  const curve = cubicBezierFlatten(centreHem, { x: centreHem.x + k, y: centreHem.y }, { x: bend.x - square.x * k, y: bend.y - square.y * k }, bend);
  return [...curve, sideHem];
}
