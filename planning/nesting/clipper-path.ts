import ClipperLib from 'clipper-lib';
import type { Path, Paths } from 'clipper-lib';
import type { Point, Polygon } from '@shared/geometry/types';

/**
 * Clipper works on integers and is exact below ±4.7e7 (its fast 53-bit range; its 128-bit "full
 * range" produced broken Minkowski unions in our tests). A no-fit polygon reaches twice the
 * largest coordinate, so scaled coordinates stay below 2e7.
 */
const SAFE_INT_RANGE = 2e7;

/**
 * Integer scale for outlines with coordinates up to `maxAbs` in magnitude: a power of ten, so
 * decimal input (integer benchmark grids, millimetres to a few decimals) scales exactly and NFPs of
 * exactly fitting pieces touch exactly.
 */
export function clipperScaleFor(maxAbs: number): number {
  return 10 ** Math.floor(Math.log10(SAFE_INT_RANGE / Math.max(maxAbs, 1e-9)));
}

/** Polygon → Clipper path at `scale` (rounded to integers). */
export function toClipperPath(ring: Polygon, scale: number): Path {
  return ring.map((p) => ({ X: Math.round(p.x * scale), Y: Math.round(p.y * scale) }));
}

/** Clipper path → polygon in the caller's units. */
export function fromClipperPath(path: Path, scale: number): Polygon {
  return path.map((p) => ({ x: p.X / scale, y: p.Y / scale }));
}

/** Drop a repeated closing vertex (JSON rings repeat the first point at the end). */
export function openRing(ring: Polygon): Polygon {
  const n = ring.length;
  if (n > 1 && ring[0].x === ring[n - 1].x && ring[0].y === ring[n - 1].y) return ring.slice(0, -1);
  return ring;
}

/**
 * Outward offset of a simple polygon by `delta` (≥ 0, caller units) with mitred corners (miter
 * limit 2, so a sharp corner grows by at most 2·delta). delta = 0 returns the ring unchanged. The
 * result contains the input; for a self-intersecting input Clipper's non-zero union is offset.
 */
export function polygonOffsetOutward(ring: Polygon, delta: number, scale: number): Polygon {
  if (delta <= 0) return ring;
  const co = new ClipperLib.ClipperOffset(2, 0.25);
  co.AddPath(toClipperPath(ring, scale), ClipperLib.JoinType.jtMiter, ClipperLib.EndType.etClosedPolygon);
  const out: Paths = [];
  co.Execute(out, delta * scale);
  let best: Path = out[0] ?? [];
  for (const p of out) if (Math.abs(ClipperLib.Clipper.Area(p)) > Math.abs(ClipperLib.Clipper.Area(best))) best = p;
  return fromClipperPath(best, scale);
}

/** Area of the intersection of two simple polygons (non-zero fill), via Clipper, caller units². */
export function polygonIntersectionArea(a: Polygon, b: Polygon, scale: number): number {
  const c = new ClipperLib.Clipper();
  c.AddPath(toClipperPath(a, scale), ClipperLib.PolyType.ptSubject, true);
  c.AddPath(toClipperPath(b, scale), ClipperLib.PolyType.ptClip, true);
  const out: Paths = [];
  c.Execute(ClipperLib.ClipType.ctIntersection, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  let area = 0;
  for (const p of out) area += ClipperLib.Clipper.Area(p);
  return Math.abs(area) / (scale * scale);
}

/**
 * From `TREE_UNION_FROM` edge pairs up (curved garment outlines; no benchmark piece has more than 15 vertices,
 * so 225 pairs at most), the quads are united in groups of `UNION_GROUP`, then pairwise up a tree, instead of
 * in one Clipper pass: each partial union drops the edges buried inside it, so the sweep meets far fewer
 * crossings. Measured with `npx tsx tests/bench/nesting/nfpcmp.ts` (NFPs of each piece of the demo styles'
 * 2-garment markers with itself and its next two, one pass against the tree): the lined dress's unsimplified
 * contrast peplum 868.8 s → 5.7 s, its self pieces 1.74 s → 0.35 s, the shirt dress's 4.06 s → 0.66 s. Each
 * level rounds its crossing points to the grid (the two results differed by up to 4e-8 of the NFP's area), so
 * the result is grown by `TREE_MARGIN` grid steps (a few tenths of a micrometre on a garment) and always
 * contains the true NFP: pieces may then end that far apart, never overlapping.
 */
const UNION_GROUP = 32;
const TREE_UNION_FROM = 256;
/** Holes smaller than this (in grid cells) left by the tree union are dropped (dropping one only grows the NFP). */
const SPECK = 4;
const TREE_MARGIN = 4;

/** Union of closed integer paths, all wound alike (non-zero rule), by one Clipper pass. */
function unite(paths: Paths): Paths {
  const c = new ClipperLib.Clipper();
  c.AddPaths(paths, ClipperLib.PolyType.ptSubject, true);
  const out: Paths = [];
  c.Execute(ClipperLib.ClipType.ctUnion, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return out;
}

/**
 * No-fit polygon NFP(A, B) = A ⊕ (−B): the reference positions of B (A fixed at the origin) where
 * the interiors overlap. Returned as rings in caller units; holes (pockets where B fits inside a
 * concavity of A) come out as extra rings, so "inside" is decided by the even-odd rule.
 * Clipper's Minkowski sweep covers the positions where the outlines cross and costs one quad per
 * (edge of A, edge of B) pair, so callers keep vertex counts low (simplify-outline.ts); the two
 * translated copies fill the cases where one piece would sit wholly inside the other.
 */
export function polygonNoFitRings(a: Polygon, b: Polygon, scale: number, byTree = true): Polygon[] {
  const pa = toClipperPath(a, scale);
  const negB = toClipperPath(b.map((p: Point) => ({ x: -p.x, y: -p.y })), scale);
  const quads = ClipperLib.Clipper.Minkowski(negB, pa, true, true);
  const fillA = pa.map((p) => ({ X: p.X + negB[0].X, Y: p.Y + negB[0].Y }));
  const fillB = negB.map((p) => ({ X: p.X + pa[0].X, Y: p.Y + pa[0].Y }));
  // Wound like Clipper's quads (and its outputs), so under the non-zero rule a copy never cancels a quad or
  // the other copy where they overlap, whatever the winding of the input outlines.
  for (const fill of [fillA, fillB]) if (!ClipperLib.Clipper.Orientation(fill)) fill.reverse();
  if (!byTree || quads.length < TREE_UNION_FROM) return unite([...quads, fillA, fillB]).filter((p) => p.length >= 3).map((p) => fromClipperPath(p, scale));
  let groups: Paths[] = [];
  for (let k = 0; k < quads.length; k += UNION_GROUP) groups.push(unite(quads.slice(k, k + UNION_GROUP)));
  groups.push([fillA, fillB]);
  while (groups.length > 1) {
    const next: Paths[] = [];
    for (let k = 0; k < groups.length; k += 2) next.push(k + 1 < groups.length ? unite([...groups[k], ...groups[k + 1]]) : groups[k]);
    groups = next;
  }
  // Rounding at the inner levels can leave specks of hole (half a grid cell) inside the NFP; a hole of a few
  // grid cells is no room for a piece, and dropping it only makes the NFP larger (safe).
  const rings = groups[0].filter((p) => p.length >= 3);
  const outer = Math.sign(rings.reduce((m, p) => (Math.abs(ClipperLib.Clipper.Area(p)) > Math.abs(m) ? ClipperLib.Clipper.Area(p) : m), 0));
  const kept = rings.filter((p) => ClipperLib.Clipper.Area(p) * outer >= 0 || Math.abs(ClipperLib.Clipper.Area(p)) >= SPECK);
  // Grown by TREE_MARGIN grid steps, so the rounding of the inner levels never cuts into the true NFP.
  const co = new ClipperLib.ClipperOffset(2, 0.25);
  for (const p of kept) co.AddPath(p, ClipperLib.JoinType.jtMiter, ClipperLib.EndType.etClosedPolygon);
  const grown: Paths = [];
  co.Execute(grown, TREE_MARGIN);
  return grown.filter((p) => p.length >= 3).map((p) => fromClipperPath(p, scale));
}
