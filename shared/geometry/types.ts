/** A 2-D point. Units are those of the caller (millimetres for pattern pieces). */
export interface Point {
  x: number;
  y: number;
}

/** A closed ring of points; the closing edge from the last point back to the first is implied. */
export type Polygon = Point[];

/** Axis-aligned bounding box. */
export interface BBox {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Default tolerance for geometric comparisons, in millimetres. */
export const GEOMETRY_EPSILON_MM = 1e-6;
