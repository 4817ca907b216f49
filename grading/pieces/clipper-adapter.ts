import ClipperLib from 'clipper-lib';
import type { Point, Polygon } from '@shared/geometry/types';

/** Clipper works on integers; 1000 units per mm keeps 1 µm resolution, far below cutting accuracy. */
const SCALE = 1000;

const toPath = (ring: Polygon) => ring.map((p) => ({ X: Math.round(p.x * SCALE), Y: Math.round(p.y * SCALE) }));
const fromPath = (path: { X: number; Y: number }[]): Point[] => path.map((p) => ({ x: p.X / SCALE, y: p.Y / SCALE }));

/**
 * Resolve self-overlaps of a counter-clockwise ring by a positive-fill union: loops that wind the same way merge,
 * reversed loops (where offset lines crossed) drop. Returns the outer rings, largest area first.
 */
export function clipperSimplify(ring: Polygon): Polygon[] {
  const c = new ClipperLib.Clipper();
  c.AddPath(toPath(ring), ClipperLib.PolyType.ptSubject, true);
  const out: { X: number; Y: number }[][] = [];
  c.Execute(ClipperLib.ClipType.ctUnion, out, ClipperLib.PolyFillType.pftPositive, ClipperLib.PolyFillType.pftPositive);
  return out
    .filter((p) => ClipperLib.Clipper.Area(p) > 0)
    .sort((a, b) => ClipperLib.Clipper.Area(b) - ClipperLib.Clipper.Area(a))
    .map(fromPath);
}

/** Uniform offset of a closed ring by `deltaMm` (positive grows), mitred joins limited to `miterLimit` × delta. */
export function clipperOffset(ring: Polygon, deltaMm: number, miterLimit = 4): Polygon[] {
  const o = new ClipperLib.ClipperOffset(miterLimit, 0.05 * SCALE);
  o.AddPath(toPath(ring), ClipperLib.JoinType.jtMiter, ClipperLib.EndType.etClosedPolygon);
  const out: { X: number; Y: number }[][] = [];
  o.Execute(out, deltaMm * SCALE);
  return out.map(fromPath);
}

/** Band of half-width `widthMm` around an open polyline (square-cut ends), as rings. */
export function clipperOpenBand(path: Point[], widthMm: number): Polygon[] {
  const o = new ClipperLib.ClipperOffset(4, 0.05 * SCALE);
  o.AddPath(toPath(path), ClipperLib.JoinType.jtRound, ClipperLib.EndType.etOpenButt);
  const out: { X: number; Y: number }[][] = [];
  o.Execute(out, widthMm * SCALE);
  return out.map(fromPath);
}

/** Intersection of two sets of rings (non-zero fill), outer rings largest first. */
export function clipperIntersect(a: Polygon[], b: Polygon[]): Polygon[] {
  const c = new ClipperLib.Clipper();
  c.AddPaths(a.map(toPath), ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(b.map(toPath), ClipperLib.PolyType.ptClip, true);
  const out: { X: number; Y: number }[][] = [];
  c.Execute(ClipperLib.ClipType.ctIntersection, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return out
    .filter((p) => ClipperLib.Clipper.Area(p) > 0)
    .sort((x, y) => ClipperLib.Clipper.Area(y) - ClipperLib.Clipper.Area(x))
    .map(fromPath);
}

/** Union of rings (non-zero fill); outer rings only, largest area first. */
export function clipperUnion(rings: Polygon[]): Polygon[] {
  const c = new ClipperLib.Clipper();
  c.AddPaths(rings.map(toPath), ClipperLib.PolyType.ptSubject, true);
  const raw: { X: number; Y: number }[][] = [];
  c.Execute(ClipperLib.ClipType.ctUnion, raw, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  // Clean removes the zero-width spikes a union can leave where band edges touch (2 µm distance).
  const out = ClipperLib.Clipper.CleanPolygons(raw, 2);
  return out
    .filter((p) => ClipperLib.Clipper.Area(p) > 0)
    .sort((a, b) => ClipperLib.Clipper.Area(b) - ClipperLib.Clipper.Area(a))
    .map(fromPath);
}
