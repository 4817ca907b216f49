import type { Point } from '@shared/geometry/types';
import { lineIntersection } from '@shared/geometry/polyline';

/**
 * Sharpen the corners of a square seen in a photo: each contour point (pixels) goes to the nearest side of
 * the rough 4-corner approximation `quad`; points near the corners (the outer `trim` fraction of each side)
 * are skipped because blur rounds them; a straight line is fitted to each side (total least squares) and
 * adjacent lines are intersected. Returns the corners in `quad`'s order, or `quad` itself for a side with
 * fewer than 3 points left or parallel neighbouring lines.
 */
export function quadRefineCorners(contour: readonly Point[], quad: readonly Point[], trim = 0.15): Point[] {
  if (quad.length !== 4) return [...quad];
  const sides: Point[][] = [[], [], [], []];
  for (const p of contour) {
    let best = 0, bestD = Infinity, bestT = 0;
    for (let s = 0; s < 4; s++) {
      const a = quad[s], b = quad[(s + 1) % 4];
      const dx = b.x - a.x, dy = b.y - a.y, len2 = dx * dx + dy * dy || 1;
      const t = ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2;
      const tc = Math.max(0, Math.min(1, t));
      const d = Math.hypot(p.x - (a.x + tc * dx), p.y - (a.y + tc * dy));
      if (d < bestD) { bestD = d; best = s; bestT = t; }
    }
    if (bestT > trim && bestT < 1 - trim) sides[best].push(p);
  }
  const lines = sides.map((pts) => {
    if (pts.length < 3) return null;
    const cx = pts.reduce((s, p) => s + p.x, 0) / pts.length, cy = pts.reduce((s, p) => s + p.y, 0) / pts.length;
    let sxx = 0, syy = 0, sxy = 0;
    for (const p of pts) { sxx += (p.x - cx) ** 2; syy += (p.y - cy) ** 2; sxy += (p.x - cx) * (p.y - cy); }
    const angle = 0.5 * Math.atan2(2 * sxy, sxx - syy);
    return { a: { x: cx, y: cy }, b: { x: cx + Math.cos(angle), y: cy + Math.sin(angle) } };
  });
  if (lines.some((l) => !l)) return [...quad];
  const out: Point[] = [];
  for (let k = 0; k < 4; k++) {
    const prev = lines[(k + 3) % 4]!, cur = lines[k]!;
    const p = lineIntersection(prev.a, prev.b, cur.a, cur.b);
    if (!p) return [...quad];
    out.push(p);
  }
  return out;
}
