import { polygonArea, polygonPerimeter, polygonSignedArea } from '@shared/geometry/polygon';
import type { Point } from '@shared/geometry/types';

/** Length units a pattern file can be drawn in. */
export type PatternUnit = 'mm' | 'cm' | 'in';

/** Millimetres in one unit. */
export const MM_PER_UNIT: Record<PatternUnit, number> = { mm: 1, cm: 10, in: 25.4 };

/** Largest distance (mm) between a chord and the curve it stands for, for arcs, splines, ellipses and Béziers. */
export const IMPORT_CHORD_TOLERANCE_MM = 0.05;

/** Line and arc ends closer than this (mm) are taken as the same point when chaining them into an outline. */
export const IMPORT_ENDPOINT_TOLERANCE_MM = 0.05;

/** One piece read from a pattern file. Millimetres, y up, outline counter-clockwise and implicitly closed. */
export interface ImportedPiece {
  name: string;
  size?: string;
  quantity?: number;
  material?: string;
  outline: Point[];
  grainLine?: { from: Point; to: Point };
  /** Notch positions on (or next to) the outline. */
  notches?: Point[];
  drillHoles?: Point[];
  internalLines?: Point[][];
  areaMm2: number;
  perimeterMm: number;
}

/** Something in the file that could not be read: which entity or element, and why. */
export interface ImportProblem {
  entity: string;
  reason: string;
}

/** What a reader gives back. `units` is 'unknown' when neither the file nor the caller said; then `pieces` is empty. */
export interface PatternImportResult {
  pieces: ImportedPiece[];
  problems: ImportProblem[];
  units: PatternUnit | 'unknown';
  unitsFrom: 'file' | 'caller' | 'none';
}

/** Options every reader takes. `units` applies only when the file does not state its own. */
export interface PatternReadOptions {
  units?: PatternUnit;
  chordToleranceMm?: number;
}

/** Points of an arc of a circle from angle a0 sweeping `sweep` radians (signed), within `tol` of the true curve. */
export function arcPoints(c: Point, r: number, a0: number, sweep: number, tol: number): Point[] {
  const step = r > tol ? 2 * Math.acos(1 - tol / r) : Math.PI / 2;
  const n = Math.max(1, Math.ceil(Math.abs(sweep) / step));
  const out: Point[] = [];
  for (let k = 0; k <= n; k++) {
    const a = a0 + (sweep * k) / n;
    out.push({ x: c.x + r * Math.cos(a), y: c.y + r * Math.sin(a) });
  }
  return out;
}

/** Drop consecutive duplicates and a closing point equal to the first. */
export function cleanRing(points: Point[], eps = 1e-9): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (!last || Math.hypot(p.x - last.x, p.y - last.y) > eps) out.push(p);
  }
  while (out.length > 1 && Math.hypot(out[0].x - out[out.length - 1].x, out[0].y - out[out.length - 1].y) <= eps) out.pop();
  return out;
}

/** Finish a piece: counter-clockwise outline, area and perimeter. */
export function finishPiece(p: Omit<ImportedPiece, 'areaMm2' | 'perimeterMm'>): ImportedPiece {
  const ring = cleanRing(p.outline);
  const outline = polygonSignedArea(ring) < 0 ? [...ring].reverse() : ring;
  return { ...p, outline, areaMm2: polygonArea(outline), perimeterMm: polygonPerimeter(outline) };
}

/** Chain open polylines end to end (either direction) within `tol`. Returns closed rings and what stayed open. */
export function chainPaths(paths: Point[][], tol: number): { closed: Point[][]; open: Point[][] } {
  const pool = paths.filter((p) => p.length >= 2).map((p) => [...p]);
  const closed: Point[][] = [];
  const open: Point[][] = [];
  const d = (a: Point, b: Point) => Math.hypot(a.x - b.x, a.y - b.y);
  while (pool.length) {
    let chain = pool.shift()!;
    for (;;) {
      if (chain.length > 2 && d(chain[0], chain[chain.length - 1]) <= tol) break;
      const end = chain[chain.length - 1];
      let found = -1;
      let reverse = false;
      for (let i = 0; i < pool.length; i++) {
        if (d(pool[i][0], end) <= tol) { found = i; break; }
        if (d(pool[i][pool[i].length - 1], end) <= tol) { found = i; reverse = true; break; }
      }
      if (found < 0) break;
      const next = pool.splice(found, 1)[0];
      chain = chain.concat((reverse ? [...next].reverse() : next).slice(1));
    }
    if (chain.length > 2 && d(chain[0], chain[chain.length - 1]) <= tol) closed.push(chain.slice(0, -1));
    else open.push(chain);
  }
  return { closed, open };
}

/** `Key: value` annotation texts (piece name, size, quantity, material) into piece fields. */
export function readAnnotations(texts: string[]): Pick<ImportedPiece, 'size' | 'quantity' | 'material'> & { name?: string } {
  const out: Pick<ImportedPiece, 'size' | 'quantity' | 'material'> & { name?: string } = {};
  for (const raw of texts) {
    for (const line of raw.split(/\\P|\n/)) {
      const m = /^\s*([A-Za-z ]+?)\s*:\s*(.+?)\s*$/.exec(line);
      if (!m) continue;
      const key = m[1].toLowerCase();
      if (key === 'piece name' || key === 'name') out.name = m[2];
      else if (key === 'size') out.size = m[2];
      else if (key === 'quantity' || key === 'qty') { const q = Number(m[2]); if (Number.isInteger(q) && q > 0) out.quantity = q; }
      else if (key === 'material') out.material = m[2];
      else if (key === 'category') out.material ??= m[2];
    }
  }
  return out;
}
