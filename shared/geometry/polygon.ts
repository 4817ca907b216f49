import type { BBox, Polygon } from './types';

/**
 * Signed area by the shoelace formula: positive for counter-clockwise rings in a y-up frame.
 * Empty or degenerate (fewer than 3 points, collinear) rings give 0.
 */
export function polygonSignedArea(ring: Polygon): number {
  let sum = 0;
  for (let i = 0, n = ring.length; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    sum += a.x * b.y - b.x * a.y;
  }
  return sum / 2;
}

/** Unsigned area; independent of winding and start vertex. */
export function polygonArea(ring: Polygon): number {
  return Math.abs(polygonSignedArea(ring));
}

/** Perimeter including the closing edge. */
export function polygonPerimeter(ring: Polygon): number {
  let sum = 0;
  for (let i = 0, n = ring.length; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    sum += Math.hypot(b.x - a.x, b.y - a.y);
  }
  return sum;
}

/** Bounding box; an empty ring gives an inverted box (min = +Infinity). */
export function polygonBBox(ring: Polygon): BBox {
  const box = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const p of ring) {
    if (p.x < box.minX) box.minX = p.x;
    if (p.y < box.minY) box.minY = p.y;
    if (p.x > box.maxX) box.maxX = p.x;
    if (p.y > box.maxY) box.maxY = p.y;
  }
  return box;
}

/** The same ring wound counter-clockwise (returns a copy). */
export function polygonToCounterClockwise(ring: Polygon): Polygon {
  return polygonSignedArea(ring) < 0 ? [...ring].reverse() : [...ring];
}

/** Rotate about the origin by `degrees` (counter-clockwise in a y-up frame). */
export function polygonRotate(ring: Polygon, degrees: number): Polygon {
  const r = (degrees * Math.PI) / 180;
  // Exact values for quarter turns keep benchmark coordinates free of 1e-16 noise.
  const q = ((degrees % 360) + 360) % 360;
  const cos = q === 0 ? 1 : q === 90 ? 0 : q === 180 ? -1 : q === 270 ? 0 : Math.cos(r);
  const sin = q === 0 ? 0 : q === 90 ? 1 : q === 180 ? 0 : q === 270 ? -1 : Math.sin(r);
  return ring.map((p) => ({ x: p.x * cos - p.y * sin, y: p.x * sin + p.y * cos }));
}

/** Translate by (dx, dy). */
export function polygonTranslate(ring: Polygon, dx: number, dy: number): Polygon {
  return ring.map((p) => ({ x: p.x + dx, y: p.y + dy }));
}

/** Mirror across the y axis (x → −x) and restore the original winding. */
export function polygonMirrorX(ring: Polygon): Polygon {
  return ring.map((p) => ({ x: -p.x, y: p.y })).reverse();
}

/** Bounding boxes overlap with positive area (touching edges do not count). */
export function bboxOverlaps(a: BBox, b: BBox, tolerance = 0): boolean {
  return (
    a.minX < b.maxX - tolerance &&
    b.minX < a.maxX - tolerance &&
    a.minY < b.maxY - tolerance &&
    b.minY < a.maxY - tolerance
  );
}
