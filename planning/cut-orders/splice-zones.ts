import type { Point } from '@shared/geometry/types';
import { mm, type Millimetres } from '@shared/units';

/**
 * A place a marker lets a ply be joined: the old roll's end must reach `far`, the new roll starts at
 * `near`, and every piece lies wholly behind `far` or wholly ahead of `near`, so no piece is cut across
 * a join. `far − near` is the overlap. Both in mm from the marker's start (x).
 */
export interface SpliceZone {
  near: Millimetres;
  far: Millimetres;
}

/**
 * The splice zones a marker can mark, for an overlap the cutter needs (Vilumsone-Nemes, *Industrial
 * Cutting of Textile Materials*, p. 41: two splice lines per splice area, 10–20 cm optimal). A zone
 * starting at `near` is valid when no piece starts before `near` and ends after `near + overlap`; of
 * each run of valid starts the latest is marked, since it uses the most of the old roll. Zones at the
 * very start or end of the marker are left out (nothing to join). Sorted by `near`; a marker with one
 * piece longer than itself minus the overlap everywhere has none.
 *
 * `placed`: every placed piece's cutting outline in marker coordinates (x along the length).
 */
export function markerSpliceZones(placed: Point[][], length: Millimetres | number, overlap: Millimetres | number): SpliceZone[] {
  if (!(overlap >= 0) || !(length > overlap)) return [];
  // Piece i forbids a join starting in the open interval (minX, maxX − overlap).
  const blocked = placed
    .filter((ring) => ring.length > 0)
    .map((ring) => {
      const xs = ring.map((q) => q.x);
      return [Math.min(...xs), Math.max(...xs) - overlap] as const;
    })
    .filter(([a, b]) => b > a)
    .sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  const merged: [number, number][] = [];
  for (const [a, b] of blocked) {
    const last = merged[merged.length - 1];
    if (last && a < last[1]) last[1] = Math.max(last[1], b);
    else merged.push([a, b]);
  }
  // Valid starts are [0, L − overlap] less the open blocked intervals; mark the end of each valid run.
  const end = length - overlap;
  const marks: number[] = [];
  let cursor = 0;
  for (const [a, b] of merged) {
    if (a >= cursor && a > 0 && a < end) marks.push(a);
    cursor = Math.max(cursor, b);
  }
  return marks.filter((n, i) => i === 0 || n > marks[i - 1]).map((n) => ({ near: mm(n), far: mm(n + overlap) }));
}
